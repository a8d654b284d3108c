import { loadEnv } from '../src/config/env';
import { createSequelize } from '../src/db';
import { migrateUp } from '../src/migrator';
import { initModels } from '../src/models';
import { enlargeDemo } from './bench-enlarge';
import { seedDemo } from '../seeders/demo';

// Benchmark data set (scripts/bench-api.mjs): migrations, the demo club, then invented members, listings and
// posts up to benchmark size. Safe to run again: it only adds what is missing.
const env = loadEnv();
const sequelize = createSequelize(env);
initModels(sequelize);
await migrateUp(sequelize);
const started = performance.now();
await seedDemo(sequelize, env.BCRYPT_COST);
const added = await enlargeDemo(env.BCRYPT_COST);
console.log(
  `[seed-bench] added ${added.members} members, ${added.listings} listings, ${added.posts} posts, ${added.comments} comments in ${((performance.now() - started) / 1000).toFixed(1)} s`,
);
await sequelize.close();
