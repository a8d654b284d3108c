import type { Sequelize, Transaction } from 'sequelize';
import type { Harbor, User } from '../src/models';

/** What the base demo seed hands to each area's seeder. */
export interface SeedContext {
  sequelize: Sequelize;
  transaction: Transaction;
  /** Demo users by e-mail. */
  users: Map<string, User>;
  harbors: Harbor[];
  /** A fixed "today" for the demo, so seeded dates make sense on any run day. */
  now: Date;
}

export type AreaSeeder = (ctx: SeedContext) => Promise<void>;
