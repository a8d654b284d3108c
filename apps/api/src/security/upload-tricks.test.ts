import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { crc32, deflateRawSync, deflateSync, gzipSync } from 'node:zlib';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ListingPhoto } from '../models';
import {
  chainListing,
  exchangeFixture,
  grantPaidUp,
  postPhotos,
  testJpeg,
} from '../testing/exchange';
import { buildUser } from '../testing/builders';
import { client, createTestApp, resetDb, type Client } from '../testing/test-app';

// Hostile files, all generated here (no binaries in the repository), sent to both upload routes.
const uploadDir = mkdtempSync(join(tmpdir(), 'rw-upload-tricks-'));
const built = createTestApp({ UPLOAD_DIR: uploadDir });
afterAll(() => {
  built.close();
  rmSync(uploadDir, { recursive: true, force: true });
});

const files = () => readdirSync(uploadDir, { recursive: true }).map(String).sort();

/** One PNG chunk: length, type, data, CRC-32 of type + data (PNG specification, section 5.3). */
function chunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}

/** A well-formed PNG header declaring `w`×`h` RGB pixels, with `idat` as the (zlib) image data. */
function pngDeclaring(w: number, h: number, idat: Buffer): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(w, 0);
  ihdr.writeUInt32BE(h, 4);
  ihdr.writeUInt8(8, 8); // bit depth
  ihdr.writeUInt8(2, 9); // colour type: truecolour
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', idat),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** A one-entry ZIP archive (PKWARE APPNOTE 4.3: local header, central directory, end record), deflated. */
function zipOf(name: string, content: Buffer): Buffer {
  const packed = deflateRawSync(content);
  const fname = Buffer.from(name);
  const crc = crc32(content);
  const local = Buffer.alloc(30);
  local.writeUInt32LE(0x04034b50, 0);
  local.writeUInt16LE(20, 4);
  local.writeUInt16LE(8, 8); // deflate
  local.writeUInt32LE(crc, 14);
  local.writeUInt32LE(packed.length, 18);
  local.writeUInt32LE(content.length, 22);
  local.writeUInt16LE(fname.length, 26);
  const central = Buffer.alloc(46);
  central.writeUInt32LE(0x02014b50, 0);
  central.writeUInt16LE(20, 4);
  central.writeUInt16LE(20, 6);
  central.writeUInt16LE(8, 10);
  central.writeUInt32LE(crc, 16);
  central.writeUInt32LE(packed.length, 20);
  central.writeUInt32LE(content.length, 24);
  central.writeUInt16LE(fname.length, 28);
  const centralOffset = local.length + fname.length + packed.length;
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(1, 8);
  end.writeUInt16LE(1, 10);
  end.writeUInt32LE(central.length + fname.length, 12);
  end.writeUInt32LE(centralOffset, 16);
  return Buffer.concat([local, fname, packed, central, fname, end]);
}

const HTML = Buffer.from('<html><body><script>alert(document.cookie)</script></body></html>');

interface Trick {
  name: string;
  file: string;
  make: () => Promise<Buffer> | Buffer;
  status: number;
  message: RegExp;
}

const TRICKS: Trick[] = [
  {
    name: 'polyglot: a JPEG signature followed by HTML and script',
    file: 'holiday.jpg',
    make: () => Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10]), HTML]),
    status: 400,
    message: /could not be read/,
  },
  {
    name: 'SVG with script renamed .png',
    file: 'chain.png',
    make: () =>
      Buffer.from(
        '<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"><script>alert(2)</script></svg>',
      ),
    status: 415,
    message: /JPEG, PNG or WebP/,
  },
  {
    name: 'HTML page renamed .webp',
    file: 'anchor.webp',
    make: () => HTML,
    status: 415,
    message: /JPEG, PNG or WebP/,
  },
  {
    name: 'small PNG declaring 50000×50000 pixels',
    file: 'huge.png',
    make: () => pngDeclaring(50_000, 50_000, deflateSync(Buffer.alloc(1024))),
    status: 400,
    message: /dimensions are too large/,
  },
  {
    name: 'decompression bomb: PNG whose image data inflates to ~123 MB (6400×6400)',
    file: 'bomb.png',
    make: () =>
      pngDeclaring(6400, 6400, deflateSync(Buffer.alloc((6400 * 3 + 1) * 6400), { level: 9 })),
    status: 400,
    message: /dimensions are too large/,
  },
  {
    name: 'decompression bomb: 64 MB of zeros gzipped and named .jpg',
    file: 'photo.jpg',
    make: () => gzipSync(Buffer.alloc(64 * 1024 * 1024), { level: 9 }),
    status: 415,
    message: /JPEG, PNG or WebP/,
  },
  {
    name: 'ZIP archive renamed .jpg',
    file: 'bow-roller.jpg',
    make: () => zipOf('payload.html', HTML),
    status: 415,
    message: /JPEG, PNG or WebP/,
  },
  {
    name: 'truncated JPEG (valid start, cut in the pixel data)',
    file: 'cut.jpg',
    make: async () => {
      const full = await testJpeg();
      return full.subarray(0, Math.floor(full.length / 3));
    },
    status: 400,
    message: /could not be (read|processed)/,
  },
];

let member: Client;
let listingId = 0;

beforeAll(async () => {
  await resetDb();
  const harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
  const user = await buildUser();
  await grantPaidUp(user);
  member = await client(built.app);
  await member.signIn(user.email);
  const listing = await member.post('/api/listings', chainListing(harborId));
  expect(listing.status).toBe(201);
  listingId = listing.body.data.id as number;
});

describe.each(TRICKS)('upload trick: $name', ({ file, make, status, message }) => {
  it('POST /api/uploads/images rejects it naming the field "image" and leaves no file', async () => {
    const before = files();
    const res = await member.agent
      .post('/api/uploads/images')
      .set('X-CSRF-Token', member.token)
      .attach('image', await make(), { filename: file, contentType: 'image/png' });
    expect(res.status).toBe(status);
    expect(res.body.error.fields.image).toMatch(message);
    expect(JSON.stringify(res.body)).not.toMatch(/\bat .+\.(ts|js):\d+/);
    expect(files()).toEqual(before);
  });

  it('POST /api/listings/:id/photos rejects it beside a good photo, naming "photos", storing nothing', async () => {
    const before = files();
    const rows = await ListingPhoto.count();
    const res = await postPhotos(member, listingId, [
      [await testJpeg(), 'good.jpg'],
      [await make(), file],
    ]);
    expect(res.status).toBe(status);
    expect(res.body.error.fields.photos).toMatch(/^Photo 2: /);
    expect(res.body.error.fields.photos).toMatch(message);
    expect(files()).toEqual(before);
    expect(await ListingPhoto.count()).toBe(rows);
  });
});

describe('a real JPEG with HTML appended after its end marker', () => {
  it('is accepted only as re-encoded WebP pixels: none of the appended bytes are stored or served', async () => {
    const polyglot = Buffer.concat([await testJpeg(), HTML]);
    expect((await sharp(polyglot).metadata()).format).toBe('jpeg');
    const res = await member.agent
      .post('/api/uploads/images')
      .set('X-CSRF-Token', member.token)
      .attach('image', polyglot, 'mixed.jpg');
    expect(res.status).toBe(201);
    const served = await member.agent.get(res.body.data.url as string).buffer(true);
    expect(served.headers['content-type']).toBe('image/webp');
    expect(served.headers['x-content-type-options']).toBe('nosniff');
    const body = served.body as Buffer;
    expect((await sharp(body).metadata()).format).toBe('webp');
    expect(body.includes(Buffer.from('<script'))).toBe(false);
    expect(body.includes(Buffer.from('<html'))).toBe(false);
  });
});
