import { loadEnv } from '../config/env';
import { createSequelize } from '../db';
import { migrateUp } from '../migrator';
import { initModels } from '../models';
import { DEMO_PASSWORD, DEMO_USERS, seedDemo } from '../../seeders/demo';

// Seeds the demo club when the database holds no users; prints the sign-ins either way.
const env = loadEnv();
const sequelize = createSequelize(env);
initModels(sequelize);
await migrateUp(sequelize);
const seeded = await seedDemo(sequelize, env.BCRYPT_COST);
console.log(
  seeded ? '[seed] demo club created' : '[seed] database already has users; demo seed skipped',
);
console.log(`[seed] demo sign-ins (password for all: ${DEMO_PASSWORD}):`);
for (const u of DEMO_USERS) console.log(`   ${u.email.padEnd(32)} ${u.roles.join(', ')}`);
await sequelize.close();
