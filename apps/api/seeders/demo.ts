import bcrypt from 'bcryptjs';
import type { Sequelize } from 'sequelize';
import type { Role } from '@app/shared';
import { ClubSetting, Harbor, User, UserRole } from '../src/models';

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
  { email: 'moderator@larkspit.example', displayName: 'Oona Brightwater', roles: ['member', 'moderator'] },
  { email: 'treasurer@larkspit.example', displayName: 'Tobin Ledgerwood', roles: ['member', 'treasurer'] },
  { email: 'maren@larkspit.example', displayName: 'Maren Tiller', roles: ['member'] },
  { email: 'idris@larkspit.example', displayName: 'Idris Fairlead', roles: ['member'] },
  { email: 'saoirse@larkspit.example', displayName: 'Saoirse Gunwale', roles: ['member'] },
  { email: 'bram@larkspit.example', displayName: 'Bram Cleatson', roles: ['member'] },
];

/** Creates the demo club when the database has no users. Returns false (and changes nothing) otherwise. */
export async function seedDemo(sequelize: Sequelize, bcryptCost: number): Promise<boolean> {
  if ((await User.count()) > 0) return false;
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, bcryptCost);
  await sequelize.transaction(async (transaction) => {
    await ClubSetting.upsert({ key: 'clubName', value: DEMO_CLUB_NAME }, { transaction });
    await ClubSetting.upsert({ key: 'listingRequiresPaidUp', value: true }, { transaction });
    for (const h of DEMO_HARBORS) await Harbor.create(h, { transaction });
    const joined = new Date('2019-04-01T00:00:00Z').getTime();
    for (const [i, u] of DEMO_USERS.entries()) {
      const createdAt = new Date(joined + i * 97 * 86_400_000);
      const user = await User.create({ email: u.email, displayName: u.displayName, passwordHash, emailVerifiedAt: createdAt, createdAt }, { transaction });
      for (const role of u.roles) await UserRole.create({ userId: user.id, role, grantedById: null }, { transaction });
    }
  });
  return true;
}
