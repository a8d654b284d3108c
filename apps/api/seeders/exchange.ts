import sharp from 'sharp';
import type { ListingCategory, ListingCondition } from '@app/shared';
import { loadEnv } from '../src/config/env';
import { Listing, ListingMessage, ListingPhoto, ListingThread, SavedSearch } from '../src/models';
import { sizeMmOf } from '../src/modules/listings/listing-specs';
import { processImage } from '../src/modules/uploads/image';
import {
  configureStorage,
  DEFAULT_UPLOAD_DIR,
  getStorage,
  localDiskStorage,
  newKey,
  thumbKey,
} from '../src/modules/uploads/storage';
import type { AreaSeeder } from './seed-context';

// Invented gear for the invented club. Prices, sizes and descriptions are demo data only.
type Item = [ListingCategory, string, string, Record<string, unknown>, ListingCondition, number];
const ITEMS: Item[] = [
  [
    'chain',
    'Grade 43 chain, 3/8 inch, 45 m',
    'Hot-dip galvanised high-test chain, end links marked every 10 m.',
    { grade: 'G43', tradeSizeIn: 0.375, lengthM: 45, galvanizing: 'good' },
    'good',
    32000,
  ],
  [
    'chain',
    'High-test chain 5/16 inch, 30 m',
    'Came off a 9 m sloop; fits a 5/16 gypsy. A little rust at the bitter end.',
    { grade: 'G43', tradeSizeIn: 0.3125, lengthM: 30, galvanizing: 'patchy' },
    'fair',
    14000,
  ],
  [
    'chain',
    'Proof coil chain 1/4 inch, 20 m',
    'Light chain for a dinghy or kedge leader.',
    { grade: 'G30', tradeSizeIn: 0.25, lengthM: 20, galvanizing: 'good' },
    'good',
    5500,
  ],
  [
    'chain',
    'Metric chain 8 mm, 50 m',
    'Calibrated 8 mm chain, regalvanised last winter.',
    { grade: 'G30', nominalMm: 8, lengthM: 50, galvanizing: 'as-new' },
    'like-new',
    26000,
  ],
  [
    'chain',
    'Metric chain 10 mm, 60 m',
    'Heavy chain for a 12 m boat; selling after a windlass change.',
    { grade: 'G43', nominalMm: 10, lengthM: 60, galvanizing: 'good' },
    'good',
    42000,
  ],
  [
    'chain',
    'Grade 70 chain 3/8 inch, 15 m',
    'Short length of transport-grade chain, good as a storm leader.',
    { grade: 'G70', tradeSizeIn: 0.375, lengthM: 15, galvanizing: 'as-new' },
    'new',
    16000,
  ],
  [
    'chain',
    'Old 1/2 inch chain, 25 m',
    'Needs regalvanising; priced to match.',
    { grade: 'G30', tradeSizeIn: 0.5, lengthM: 25, galvanizing: 'needs-regalvanizing' },
    'for-parts',
    6000,
  ],
  [
    'anchor',
    'Plow anchor 16 kg',
    'Classic plow, sets well in sand and mud. Bow roller marks only.',
    { anchorType: 'plow', massKg: 16 },
    'good',
    18000,
  ],
  [
    'anchor',
    'Plow anchor 25 kg',
    'Oversized working anchor from a 10 m cutter.',
    { anchorType: 'plow', massKg: 25 },
    'like-new',
    29000,
  ],
  [
    'anchor',
    'Claw anchor 10 kg',
    'Compact claw, good kedge.',
    { anchorType: 'claw', massKg: 10 },
    'good',
    7500,
  ],
  [
    'anchor',
    'Claw anchor 20 kg',
    'Stows well on most rollers.',
    { anchorType: 'claw', massKg: 20 },
    'fair',
    12000,
  ],
  [
    'anchor',
    'Fluke anchor 7 kg',
    'Light fluke anchor, folds flat for a locker.',
    { anchorType: 'fluke', massKg: 7 },
    'good',
    6000,
  ],
  [
    'anchor',
    'Scoop anchor with roll-bar, 20 kg',
    'Self-righting scoop; the bar needs checking against your pulpit.',
    { anchorType: 'scoop', massKg: 20 },
    'like-new',
    38000,
  ],
  [
    'anchor',
    'Scoop anchor 33 kg',
    'Big scoop for a heavy cruiser.',
    { anchorType: 'scoop', massKg: 33 },
    'good',
    52000,
  ],
  [
    'anchor',
    'Folding grapnel 4 kg',
    'For the tender or for rock.',
    { anchorType: 'grapnel', massKg: 4 },
    'good',
    2500,
  ],
  [
    'anchor',
    'Fisherman anchor 30 kg',
    'Traditional fisherman for weed and kelp, stock folds.',
    { anchorType: 'fisherman', massKg: 30 },
    'fair',
    21000,
  ],
  [
    'rode',
    'Nylon three-strand rode 16 mm, 60 m',
    'Spliced thimble one end, whipped the other.',
    { material: 'nylon', construction: 'three-strand', diameterMm: 16, lengthM: 60 },
    'good',
    15000,
  ],
  [
    'rode',
    'Nylon double-braid 14 mm, 50 m',
    'Soft braid, easy on the hands.',
    { material: 'nylon', construction: 'double-braid', diameterMm: 14, lengthM: 50 },
    'like-new',
    17000,
  ],
  [
    'rode',
    'Nylon three-strand 12 mm, 40 m',
    'Kedge rode, lightly used.',
    { material: 'nylon', construction: 'three-strand', diameterMm: 12, lengthM: 40 },
    'good',
    6500,
  ],
  [
    'rode',
    'Polyester rode 18 mm, 80 m',
    'Low-stretch line, suits a second anchor on a big boat.',
    { material: 'polyester', construction: 'three-strand', diameterMm: 18, lengthM: 80 },
    'fair',
    19000,
  ],
  [
    'rode',
    'Nylon three-strand 20 mm, 100 m',
    'Storm rode, never used in anger.',
    { material: 'nylon', construction: 'three-strand', diameterMm: 20, lengthM: 100 },
    'new',
    39000,
  ],
  [
    'rode',
    'Thin nylon line 10 mm, 30 m',
    'Dinghy anchor line.',
    { material: 'nylon', construction: 'three-strand', diameterMm: 10, lengthM: 30 },
    'good',
    2500,
  ],
  [
    'connector',
    'Forged shackles 3/8 inch, set of four',
    'Galvanised bow shackles, pins moused once.',
    { kind: 'shackle', nominalIn: 0.375 },
    'good',
    2800,
  ],
  [
    'connector',
    'Forged shackle 1/2 inch',
    'Screw-pin anchor shackle, rated size.',
    { kind: 'shackle', nominalIn: 0.5 },
    'like-new',
    1500,
  ],
  [
    'connector',
    'Forged shackle 5/16 inch',
    'Spare for a 1/4 inch chain.',
    { kind: 'shackle', nominalIn: 0.3125 },
    'new',
    900,
  ],
  [
    'connector',
    'Stainless swivel, rated 20 kN',
    'Marked working load 20 kN; comes with its shackle.',
    { kind: 'swivel', wllN: 20000 },
    'good',
    4500,
  ],
  [
    'connector',
    'Unmarked swivel',
    'No rating marked; sold as-is for a mooring or a dinghy.',
    { kind: 'swivel' },
    'fair',
    800,
  ],
  [
    'snubber',
    'Nylon snubber 14 mm, 6 m, with chain hook',
    'Three-strand nylon, spliced to a chain hook.',
    { material: 'nylon', diameterMm: 14, lengthM: 6, bridle: false },
    'good',
    4500,
  ],
  [
    'snubber',
    'Bridle for a multihull, 16 mm',
    'Two 8 m legs with a ring.',
    { material: 'nylon', diameterMm: 16, lengthM: 16, bridle: true },
    'like-new',
    9500,
  ],
  [
    'snubber',
    'Short snubber 12 mm, 4 m',
    'For a small boat, chafe guard included.',
    { material: 'nylon', diameterMm: 12, lengthM: 4, bridle: false },
    'good',
    2500,
  ],
  [
    'windlass',
    'Vertical windlass, 12 V, 8 mm gypsy',
    'Works; motor recently serviced. Control switch included.',
    { part: 'windlass', grade: 'G30', nominalMm: 8 },
    'good',
    45000,
  ],
  [
    'windlass',
    'Spare gypsy for 3/8 inch high-test chain',
    'Fits several horizontal windlasses; check the bore.',
    { part: 'gypsy', grade: 'G43', tradeSizeIn: 0.375 },
    'like-new',
    9000,
  ],
  [
    'mooring',
    'Mooring buoy, 60 cm',
    'Hard buoy with a through-rod.',
    { item: 'buoy' },
    'fair',
    4000,
  ],
  [
    'mooring',
    'Concrete sinker, about 250 kg',
    'Collect from the yard with a crane.',
    { item: 'sinker', massKg: 250 },
    'good',
    8000,
  ],
  [
    'mooring',
    'Mooring pennant pair, 18 mm',
    'Chafe sleeves on both.',
    { item: 'pennant' },
    'good',
    3500,
  ],
  [
    'other',
    'Anchor chain marker set',
    'Coloured inserts for marking the chain every 5 m.',
    {},
    'new',
    1200,
  ],
  ['other', 'Chain hook and mousing wire kit', 'Odds and ends from a refit.', {}, 'good', 900],
  ['other', 'Anchor riding sail', 'Steadies a boat that sails at anchor.', {}, 'fair', 6000],
  [
    'chain',
    'Grade 43 chain 3/8 inch, 30 m (sold)',
    'Sold to a club member.',
    { grade: 'G43', tradeSizeIn: 0.375, lengthM: 30, galvanizing: 'good' },
    'good',
    20000,
  ],
  [
    'anchor',
    'Claw anchor 15 kg (expired)',
    'Listed last season.',
    { anchorType: 'claw', massKg: 15 },
    'good',
    9000,
  ],
];

const COLOURS = ['#1f4e5f', '#7a3e2b', '#2f5d3a', '#4b3f72', '#6b6b2a', '#20535c', '#5c2d3f'];

/** A generated photo: a solid colour with simple shapes (chain-link ellipses, or a mark per category). */
async function photo(category: ListingCategory, seed: number): Promise<Buffer> {
  const bg = COLOURS[seed % COLOURS.length] ?? '#1f4e5f';
  const shapes =
    category === 'chain' || category === 'connector'
      ? Array.from(
          { length: 5 },
          (_, i) =>
            `<ellipse cx="${120 + i * 90}" cy="${240 + (i % 2) * 20}" rx="60" ry="32" fill="none" stroke="#e8e2d0" stroke-width="16"/>`,
        ).join('')
      : category === 'anchor'
        ? '<path d="M320 90 v240 M220 300 q100 110 200 0 M270 130 h100" stroke="#e8e2d0" stroke-width="22" fill="none" stroke-linecap="round"/><circle cx="320" cy="80" r="22" fill="none" stroke="#e8e2d0" stroke-width="14"/>'
        : `<circle cx="320" cy="240" r="${90 + (seed % 4) * 15}" fill="none" stroke="#e8e2d0" stroke-width="18"/><circle cx="320" cy="240" r="30" fill="#e8e2d0"/>`;
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="640" height="480"><rect width="640" height="480" fill="${bg}"/>${shapes}</svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 85 }).toBuffer();
}

const SELLERS = [
  'maren@larkspit.example',
  'idris@larkspit.example',
  'saoirse@larkspit.example',
  'bram@larkspit.example',
  'admin@larkspit.example',
  'treasurer@larkspit.example',
];
const DAY_MS = 86_400_000;

/** About 40 invented listings across the three harbours, with generated photos, one thread and one saved search. */
export const seedExchange: AreaSeeder = async ({ transaction, users, harbors, now }) => {
  const env = loadEnv();
  configureStorage(localDiskStorage(env.UPLOAD_DIR ?? DEFAULT_UPLOAD_DIR));
  const storage = getStorage();
  const created: Listing[] = [];
  for (const [i, [category, title, description, specs, condition, priceCents]] of ITEMS.entries()) {
    const seller = users.get(SELLERS[i % SELLERS.length] ?? '');
    const harbor = harbors[i % harbors.length];
    if (!seller || !harbor) continue;
    const sold = title.endsWith('(sold)');
    const expired = title.endsWith('(expired)');
    const publishedAt = new Date(
      now.getTime() - (expired ? 70 : (i * 37) % 50) * DAY_MS - i * 3_600_000,
    );
    const listing = await Listing.create(
      {
        sellerId: seller.id,
        category,
        title: title.replace(/ \((sold|expired)\)$/, ''),
        description,
        specs,
        condition,
        priceCents,
        currency: 'EUR',
        harborId: harbor.id,
        status: sold ? 'sold' : expired ? 'expired' : 'active',
        sizeMm: sizeMmOf(category, specs),
        publishedAt,
        expiresAt: new Date(publishedAt.getTime() + 60 * DAY_MS),
        soldAt: sold ? new Date(now.getTime() - 2 * DAY_MS) : null,
        soldThreadId: null,
        hiddenAt: null,
        hiddenReason: null,
      },
      { transaction },
    );
    created.push(listing);
    const count = 1 + (i % 3 === 0 ? 1 : 0);
    for (let p = 0; p < count; p += 1) {
      const img = await processImage(await photo(category, i + p));
      const key = newKey('listings');
      await storage.put(key, img.full, img.mime);
      await storage.put(thumbKey(key), img.thumb, img.mime);
      await ListingPhoto.create(
        {
          listingId: listing.id,
          storageKey: key,
          thumbKey: thumbKey(key),
          width: img.width,
          height: img.height,
          position: p,
        },
        { transaction },
      );
    }
  }
  const first = created[0];
  const buyer = users.get('bram@larkspit.example');
  if (first && buyer && first.sellerId !== buyer.id) {
    const at = new Date(now.getTime() - DAY_MS);
    const thread = await ListingThread.create(
      {
        listingId: first.id,
        buyerId: buyer.id,
        sellerId: first.sellerId,
        lastMessageAt: at,
        buyerReadAt: at,
        sellerReadAt: null,
      },
      { transaction },
    );
    await ListingMessage.create(
      {
        threadId: thread.id,
        senderId: buyer.id,
        body: 'Is the chain still available? I could look at it on Saturday at the fuel pontoon.',
      },
      { transaction },
    );
  }
  const watcher = users.get('saoirse@larkspit.example');
  if (watcher)
    await SavedSearch.create(
      {
        userId: watcher.id,
        name: '3/8 inch grade 43 chain',
        criteria: { q: 'grade 43', category: 'chain', sizeMinMm: 9, sizeMaxMm: 10 },
      },
      { transaction },
    );
};
