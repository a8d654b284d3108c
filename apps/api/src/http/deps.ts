import type { Sequelize } from 'sequelize';
import type { Env } from '../config/env';
import type { Logger } from '../logger';

/** What building the app needs: the parsed config, the database and the logger. */
export interface AppDeps {
  env: Env;
  sequelize: Sequelize;
  logger: Logger;
}
