import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { ListingPhoto } from '../models';
import { chainListing, exchangeFixture, grantPaidUp } from '../testing/exchange';
import { buildUser } from '../testing/builders';
import { client, createTestApp, resetDb, type Client } from '../testing/test-app';

const uploadDir = mkdtempSync(join(tmpdir(), 'rw-multipart-'));
const built = createTestApp({ UPLOAD_DIR: uploadDir });
afterAll(() => {
  built.close();
  rmSync(uploadDir, { recursive: true, force: true });
});

let c: Client;
let listingId = 0;
beforeEach(async () => {
  await resetDb();
  const harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
  const user = await buildUser();
  await grantPaidUp(user);
  c = await client(built.app);
  await c.signIn(user.email);
  listingId = (await c.post('/api/listings', chainListing(harborId))).body.data.id as number;
});

const B = 'rwboundary42';
const part = (field: string) =>
  `--${B}\r\nContent-Disposition: form-data; name="${field}"; filename="a.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`;

const bodies = (field: string): Array<[string, string, string]> => [
  [
    'cut off before the closing boundary',
    `multipart/form-data; boundary=${B}`,
    `${part(field)}\xff\xd8\xff`,
  ],
  ['without a boundary parameter', 'multipart/form-data', `${part(field)}abc\r\n--${B}--\r\n`],
  [
    'with a broken part header',
    `multipart/form-data; boundary=${B}`,
    `--${B}\r\nno header here\r\n`,
  ],
];

describe('a malformed or truncated multipart body answers 400 with the field', () => {
  for (const [route, field] of [
    ['listing photos', 'photos'],
    ['editor images', 'image'],
  ] as const)
    for (const [label, type, payload] of bodies(field))
      it(`${route}: a body ${label}`, async () => {
        const url =
          field === 'photos' ? `/api/listings/${listingId}/photos` : '/api/uploads/images';
        const res = await c.agent
          .post(url)
          .set('X-CSRF-Token', c.token)
          .set('Content-Type', type)
          .send(Buffer.from(payload, 'latin1'));
        expect(res.status).toBe(400);
        expect(res.body.error.code).toBe('VALIDATION_FAILED');
        expect(res.body.error.fields[field]).toMatch(/incomplete or malformed/);
        expect(await ListingPhoto.count()).toBe(0);
        expect(
          readdirSync(uploadDir, { recursive: true }).filter((f) => String(f).endsWith('.webp')),
        ).toEqual([]);
      });
});
