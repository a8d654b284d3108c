import sharp from 'sharp';
import type { ListingInput } from '@app/shared';
import { Harbor, Membership, MembershipPlan, type User } from '../models';
import { setSetting } from '../modules/club/club.service';
import type { Client } from './test-app';
import { rebuildListingIndex } from '../modules/listings/listing-index';

let planSeq = 0;

/** Makes `user` paid up through the dues tables (a plan and a membership paid through next year). */
export async function grantPaidUp(user: User, joinedOn = '2024-03-01') {
  planSeq += 1;
  const plan = await MembershipPlan.create({
    code: `test-${planSeq}-${Date.now()}`,
    name: 'Test plan',
    amountMinor: 5000,
    currency: 'EUR',
    proration: 'none',
  });
  const through = new Date(Date.now() + 365 * 86_400_000).toISOString().slice(0, 10);
  await Membership.create({ userId: user.id, planId: plan.id, joinedOn, paidThrough: through });
}

/** Two invented harbours, the paid-up policy on, and an empty search index. */
export async function exchangeFixture() {
  const harbors = [
    await Harbor.create({ name: 'Test Harbour North', slug: 'test-north' }),
    await Harbor.create({ name: 'Test Harbour South', slug: 'test-south' }),
  ];
  await setSetting('listingRequiresPaidUp', true);
  await rebuildListingIndex();
  return { harbors };
}

/** A valid chain listing body (3/8 in grade 43, 30 m). */
export const chainListing = (harborId: number, over: Partial<ListingInput> = {}): ListingInput =>
  ({
    category: 'chain',
    title: 'Grade 43 chain, 3/8 inch, 30 m',
    description: 'Galvanised high-test chain, regalvanised two seasons ago.',
    condition: 'good',
    priceCents: 18000,
    currency: 'EUR',
    harborId,
    specs: { grade: 'G43', tradeSizeIn: 0.375, lengthM: 30, galvanizing: 'good' },
    ...over,
  }) as ListingInput;

/** A small JPEG with EXIF, generated (no downloaded images). */
export const testJpeg = (colour = '#1f6f8b') =>
  sharp({ create: { width: 320, height: 240, channels: 3, background: colour } })
    .withExif({ IFD0: { Make: 'Test' } })
    .jpeg()
    .toBuffer();

/** POST multipart photos with the CSRF token. */
export function postPhotos(c: Client, listingId: number, files: Array<[Buffer, string]>) {
  let req = c.agent.post(`/api/listings/${listingId}/photos`).set('X-CSRF-Token', c.token);
  for (const [buf, name] of files) req = req.attach('photos', buf, name);
  return req;
}
