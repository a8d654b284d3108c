import { loadEnv } from '../config/env';
import { createSequelize } from '../db';
import { migrateUp } from '../migrator';

const sequelize = createSequelize(loadEnv());
const applied = await migrateUp(sequelize);
console.log(
  applied.length ? `[migrate] applied ${applied.join(', ')}` : '[migrate] schema is up to date',
);
await sequelize.close();
