import bcrypt from 'bcryptjs';
import type { Sequelize } from 'sequelize';
import type { Role } from '@app/shared';
import { Boat, ClubSetting, Harbor, User, UserRole } from '../src/models';
import { AREA_SEEDERS } from './index';

// An invented club in an invented harbour. Every name here is made up for the demo.
export const DEMO_CLUB_NAME = 'Larkspit Sound Cruising Club';
export const DEMO_HARBORS = [
  { name: 'Larkspit Harbour', slug: 'larkspit-harbour' },
  { name: 'Brindle Basin', slug: 'brindle-basin' },
  { name: 'Otterhythe Quay', slug: 'otterhythe-quay' },
];
export const DEMO_PASSWORD = 'harbour-demo-2026';

export interface DemoUser {
  email: string;
  displayName: string;
  roles: Role[];
}
export const DEMO_USERS: DemoUser[] = [
  { email: 'admin@larkspit.example', displayName: 'Wren Halyard', roles: ['member', 'admin'] },
  {
    email: 'moderator@larkspit.example',
    displayName: 'Oona Brightwater',
    roles: ['member', 'moderator'],
  },
  {
    email: 'treasurer@larkspit.example',
    displayName: 'Tobin Ledgerwood',
    roles: ['member', 'treasurer'],
  },
  { email: 'maren@larkspit.example', displayName: 'Maren Tiller', roles: ['member'] },
  { email: 'idris@larkspit.example', displayName: 'Idris Fairlead', roles: ['member'] },
  { email: 'saoirse@larkspit.example', displayName: 'Saoirse Gunwale', roles: ['member'] },
  { email: 'bram@larkspit.example', displayName: 'Bram Cleatson', roles: ['member'] },
  // Behind on dues like Maren, but no other test pays for her: the home-page member path does.
  { email: 'oriel@larkspit.example', displayName: 'Oriel Kedgewick', roles: ['member'] },
];

/** Invented boats of several sizes (SI units), keyed by owner e-mail. */
export const DEMO_BOATS = [
  {
    owner: 'maren@larkspit.example',
    name: 'Marram',
    hull: 'sail',
    loaM: 9.1,
    beamM: 3.2,
    displacementKg: 4300,
    draftM: 1.5,
    bowHeightM: 1.1,
    gypsy: { grade: 'G43', tradeSizeIn: 0.3125 },
    harbor: 0,
  },
  {
    owner: 'idris@larkspit.example',
    name: 'Slow Tern',
    hull: 'power',
    loaM: 12.2,
    beamM: 4.1,
    displacementKg: 11000,
    draftM: 1.1,
    bowHeightM: 1.6,
    gypsy: { grade: 'G43', tradeSizeIn: 0.375 },
    harbor: 1,
  },
  {
    owner: 'saoirse@larkspit.example',
    name: 'Two Gulls',
    hull: 'multihull',
    loaM: 13.4,
    beamM: 7.2,
    displacementKg: 9500,
    draftM: 1.2,
    bowHeightM: 1.3,
    gypsy: null,
    harbor: 2,
  },
  {
    owner: 'bram@larkspit.example',
    name: 'Greywake',
    hull: 'sail',
    loaM: 7.3,
    beamM: 2.6,
    displacementKg: 2100,
    draftM: 1.3,
    bowHeightM: 0.9,
    gypsy: null,
    harbor: 0,
  },
  {
    owner: 'admin@larkspit.example',
    name: 'Puffin Errand',
    hull: 'sail',
    loaM: 11.3,
    beamM: 3.7,
    displacementKg: 8200,
    draftM: 1.7,
    bowHeightM: 1.3,
    gypsy: { grade: 'G43', tradeSizeIn: 0.375 },
    harbor: 0,
  },
  {
    owner: 'oriel@larkspit.example',
    name: 'Saltcress',
    hull: 'sail',
    loaM: 10.4,
    beamM: 3.4,
    displacementKg: 5600,
    draftM: 1.6,
    bowHeightM: 1.2,
    gypsy: { grade: 'G43', tradeSizeIn: 0.3125 },
    harbor: 0,
  },
] as const;

/** Creates the demo club when the database has no users. Returns false (and changes nothing) otherwise. */
export async function seedDemo(sequelize: Sequelize, bcryptCost: number): Promise<boolean> {
  if ((await User.count()) > 0) return false;
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, bcryptCost);
  await sequelize.transaction(async (transaction) => {
    await ClubSetting.upsert({ key: 'clubName', value: DEMO_CLUB_NAME }, { transaction });
    await ClubSetting.upsert({ key: 'listingRequiresPaidUp', value: true }, { transaction });
    const harbors = [];
    for (const h of DEMO_HARBORS) harbors.push(await Harbor.create(h, { transaction }));
    const users = new Map<string, User>();
    const joined = new Date('2019-04-01T00:00:00Z').getTime();
    for (const [i, u] of DEMO_USERS.entries()) {
      const createdAt = new Date(joined + i * 97 * 86_400_000);
      const user = await User.create(
        {
          email: u.email,
          displayName: u.displayName,
          passwordHash,
          emailVerifiedAt: createdAt,
          createdAt,
        },
        { transaction },
      );
      users.set(u.email, user);
      for (const role of u.roles)
        await UserRole.create({ userId: user.id, role, grantedById: null }, { transaction });
      for (const b of DEMO_BOATS.filter((x) => x.owner === u.email)) {
        const { owner: _owner, harbor, gypsy, ...rest } = b;
        await Boat.create(
          {
            ...rest,
            ownerId: user.id,
            gypsy: gypsy ? { ...gypsy } : null,
            homeHarborId: harbors[harbor]?.id ?? null,
          },
          { transaction },
        );
      }
    }
    for (const [, seeder] of AREA_SEEDERS)
      await seeder({ sequelize, transaction, users, harbors, now: new Date() });
  });
  return true;
}
