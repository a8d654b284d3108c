import bcrypt from 'bcryptjs';
import { listingInputSchema, type ListingCategory } from '@app/shared';
import { loadEnv } from '../src/config/env';
import { createSequelize } from '../src/db';
import { migrateUp } from '../src/migrator';
import { Harbor, initModels, Listing, User } from '../src/models';
import { sizeMmOf } from '../src/modules/listings/listing-specs';

// Growth run data (scripts/bench-listings.mjs): grows its own database to the active-listing count given as the
// first argument with bulk inserts (5,000 rows a statement). Invented benchmark data only: every harbour, seller,
// size and price is made up, and nothing here is advice.
const target = Number(process.argv[2]);
if (!Number.isInteger(target) || target <= 0)
  throw new Error('usage: growth-seed.ts <active listings>');
const env = loadEnv();
const sequelize = createSequelize(env);
initModels(sequelize);
await migrateUp(sequelize);

let s = 11;
const next = () => (s = (s * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
const pick = <T>(xs: readonly T[]): T => xs[Math.floor(next() * xs.length)] as T;
const int = (lo: number, hi: number) => lo + Math.floor(next() * (hi - lo + 1));

if ((await Harbor.count()) === 0)
  for (const [i, name] of [
    'Growth North Basin',
    'Growth South Pontoons',
    'Growth Outer Moles',
  ].entries())
    await Harbor.create({ name, slug: `growth-${i}` });
const harbors = await Harbor.findAll();
if ((await User.count()) === 0) {
  const passwordHash = await bcrypt.hash('growth-bench-only', 4);
  await User.bulkCreate(
    Array.from({ length: 200 }, (_, i) => ({
      email: `growth-seller-${i}@growth.example`,
      displayName: `Growth Seller ${i}`,
      passwordHash,
      emailVerifiedAt: new Date(),
    })),
  );
}
const sellerIds = (await User.findAll({ attributes: ['id'] })).map((u) => u.id);

const NOTES = [
  'Stowed dry.',
  'Spare from a refit.',
  'Marked every ten metres.',
  'Light surface rust.',
];
function gear(i: number): {
  category: ListingCategory;
  title: string;
  specs: Record<string, unknown>;
} {
  switch (i % 4) {
    case 0: {
      const size = pick([0.25, 0.3125, 0.375, 0.5]);
      const len = int(10, 90);
      return {
        category: 'chain',
        title: `Grade 43 chain ${size} in, ${len} m`,
        specs: { grade: 'G43', tradeSizeIn: size, lengthM: len, galvanizing: 'good' },
      };
    }
    case 1: {
      const type = pick(['plow', 'claw', 'fluke', 'scoop', 'grapnel'] as const);
      const kg = int(4, 45);
      return {
        category: 'anchor',
        title: `${type} anchor ${kg} kg`,
        specs: { anchorType: type, massKg: kg },
      };
    }
    case 2: {
      const d = pick([10, 12, 14, 16, 18]);
      const len = int(20, 100);
      return {
        category: 'rode',
        title: `Nylon rode ${d} mm, ${len} m`,
        specs: { material: 'nylon', construction: 'three-strand', diameterMm: d, lengthM: len },
      };
    }
    default:
      return {
        category: 'connector',
        title: `Forged shackle ${pick(['3/8', '1/2', '5/16'])} in`,
        specs: { kind: 'shackle', nominalIn: pick([0.3125, 0.375, 0.5]) },
      };
  }
}

const started = performance.now();
const now = Date.now();
let have = await Listing.count({ where: { status: 'active' } });
const from = have;
while (have < target) {
  const n = Math.min(5000, target - have);
  await Listing.bulkCreate(
    Array.from({ length: n }, (_, k) => {
      const i = have + k;
      const input = listingInputSchema.parse({
        ...gear(i),
        description: `${pick(NOTES)} ${pick(NOTES)} Lot ${i}.`,
        condition: pick(['new', 'good', 'fair'] as const),
        priceCents: 500 + int(0, 60_000),
        currency: 'EUR',
        harborId: pick(harbors).id,
      });
      const specs = input.specs as Record<string, unknown>;
      return {
        ...input,
        specs,
        sellerId: pick(sellerIds),
        status: 'active' as const,
        sizeMm: sizeMmOf(input.category, specs),
        publishedAt: new Date(now - i * 30_000),
        expiresAt: new Date(now + 30 * 86_400_000),
        soldAt: null,
        soldThreadId: null,
        hiddenAt: null,
        hiddenReason: null,
      };
    }),
  );
  have += n;
}
console.log(
  `[growth-seed] ${from} → ${have} active listings in ${((performance.now() - started) / 1000).toFixed(1)} s`,
);
await sequelize.close();
