import { seedDues } from './dues';
import { seedKnowledge } from './knowledge';
import { seedExchange } from './exchange';
import { seedHome } from './home';
import { seedStorm } from './storm';
import type { AreaSeeder } from './seed-context';

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
