import type { Sequelize, Transaction } from 'sequelize';
import type { Harbor, User } from '../src/models';
import { seedDues } from './dues';
import { seedKnowledge } from './knowledge';
import { seedExchange } from './exchange';
import { seedHome } from './home';
import { seedStorm } from './storm';

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

/**
 * Each area's demo data, run in order inside the demo transaction after users, harbours and boats exist.
 * Add one line per area (knowledge, exchange, dues …); keep each seeder in its own file.
 */
export const AREA_SEEDERS: Array<[name: string, seeder: AreaSeeder]> = [
  ['dues', seedDues],
  ['knowledge', seedKnowledge],
  ['exchange', seedExchange],
  ['storm', seedStorm],
  ['home', seedHome],
];
