import type { Browser, Page } from 'playwright-core';
import { expect } from 'vitest';
import { paths } from '../../apps/web/src/config/paths';
import { baseUrl, signIn } from './browser';

/** The demo accounts (apps/api/seeders/demo.ts), one per role. */
export const PEOPLE = [
  { who: 'visitor', email: null },
  { who: 'member', email: 'maren@larkspit.example' },
  { who: 'seller', email: 'idris@larkspit.example' },
  { who: 'moderator', email: 'moderator@larkspit.example' },
  { who: 'treasurer', email: 'treasurer@larkspit.example' },
  { who: 'admin', email: 'admin@larkspit.example' },
] as const;

export type PathKey = keyof typeof paths;

export async function data<T>(page: Page, url: string): Promise<T> {
  const res = await page.request.get(`${baseUrl()}${url}`);
  expect(res.status(), url).toBe(200);
  return ((await res.json()) as { data: T }).data;
}

/** Waits until the screen has a heading (or an error message) and nothing in <main> is still spinning. */
export async function settle(page: Page) {
  await page
    .waitForFunction(
      () =>
        document.querySelector('main h1, main h2, main [role=alert]') !== null &&
        document.querySelector('main .animate-spin') === null,
      undefined,
      { timeout: 8000 },
    )
    .catch(() => undefined);
}

/**
 * One concrete URL per route in config/paths.ts, ids taken from the seeded member's own rows (Maren's boat,
 * plan, post and listing; the first post, listing, thread and open storm watch). Saves her an everyday plan
 * from the boat page when she has none.
 */
export async function demoUrls(browser: Browser): Promise<Record<PathKey, string>> {
  const page = await browser.newPage();
  await signIn(page, 'maren@larkspit.example');
  const boats = await data<Array<{ id: number }>>(page, '/api/boats');
  const boatId = boats[0]?.id;
  expect(boatId, 'the member has a seeded boat').toBeDefined();
  let plans = await data<Array<{ id: number }>>(page, '/api/tackle-plans');
  if (plans.length === 0) {
    await page.goto(`${baseUrl()}/boats/${boatId}`);
    await page
      .getByRole('region', { name: 'Everyday: 30 kn' })
      .getByRole('button', { name: 'Save as plan' })
      .click();
    await page.waitForURL(/\/tackle-plans\/\d+$/, { timeout: 15000 });
    plans = await data<Array<{ id: number }>>(page, '/api/tackle-plans');
  }
  const myPosts = await data<Array<{ id: number; status: string }>>(page, '/api/posts/mine');
  const posts = await data<Array<{ id: number }>>(page, '/api/posts');
  const myListings = await data<Array<{ id: number; status: string }>>(page, '/api/listings/mine');
  const listings = await data<Array<{ id: number }>>(page, '/api/listings');
  const threads = await data<Array<{ id: number }>>(page, '/api/threads');
  const watches = await data<Array<{ id: number; status: string }>>(page, '/api/storm-watches');
  const watchId = (watches.find((w) => w.status === 'open') ?? watches[0])?.id;
  await page.close();
  const need = (label: string, id: number | undefined) => {
    expect(id, `seeded ${label}`).toBeDefined();
    return id as number;
  };
  return {
    home: paths.home.href(),
    signIn: paths.signIn.href(),
    signUp: paths.signUp.href(),
    verifyEmail: `${paths.verifyEmail.href()}?token=not-a-real-token`,
    resetPassword: paths.resetPassword.href(),
    account: paths.account.href(),
    notices: paths.notices.href(),
    stopDigest: paths.stopDigest.href('1.not-a-real-stop-token'),
    adminUsers: paths.adminUsers.href(),
    adminTopics: paths.adminTopics.href(),
    adminClub: paths.adminClub.href(),
    knowledge: paths.knowledge.href(),
    postNew: paths.postNew.href(),
    post: paths.post.href(need('post', posts[0]?.id)),
    postEdit: paths.postEdit.href(need('own post', myPosts[0]?.id)),
    moderation: paths.moderation.href(),
    moderationLog: paths.moderationLog.href(),
    calculators: paths.calculators.href(),
    boats: paths.boats.href(),
    boat: paths.boat.href(need('boat', boatId)),
    tacklePlan: paths.tacklePlan.href(need('tackle plan', plans[0]?.id)),
    dues: paths.dues.href(),
    duesPaid: paths.duesPaid.href(),
    treasury: paths.treasury.href(),
    treasuryRoster: paths.treasuryRoster.href(),
    membershipPlans: paths.membershipPlans.href(),
    exchange: paths.exchange.href(),
    exchangeMine: paths.exchangeMine.href(),
    listingNew: paths.listingNew.href(),
    listing: paths.listing.href(need('listing', listings[0]?.id)),
    listingEdit: paths.listingEdit.href(
      need('own listing', (myListings.find((l) => l.status === 'active') ?? myListings[0])?.id),
    ),
    messages: paths.messages.href(),
    conversation: paths.conversation.href(need('conversation', threads[0]?.id)),
    storm: paths.storm.href(),
    stormNew: paths.stormNew.href(),
    stormChecklist: paths.stormChecklist.href(),
    stormWatch: paths.stormWatch.href(need('storm watch', watchId)),
    stormBoard: paths.stormBoard.href(need('storm watch', watchId)),
    stormBoat: paths.stormBoat.href(need('storm watch', watchId), need('boat', boatId)),
  };
}
