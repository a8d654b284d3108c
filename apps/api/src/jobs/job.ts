import type { Transporter } from 'nodemailer';
import type { Sequelize } from 'sequelize';
import type { Env } from '../config/env';
import type { Logger } from '../logger';

/** What every timed job gets: the parsed config, the database, the logger and the mail transport. */
export interface JobContext {
  env: Env;
  sequelize: Sequelize;
  logger: Logger;
  transport: Transporter;
}

/**
 * A timed job: the runner (`jobs/runner.ts`) waits `firstAfterMs`, runs `tick`, and after each round waits
 * `everyMs` before the next one. Rounds of one job never overlap. `tick` logs and swallows its own errors (a
 * failed round is retried next time); jobs that must run once per cluster take a lease inside `tick`.
 */
export interface Job {
  /** Unique; also the `job_leases` name where the job takes one. */
  name: string;
  /** Pause between the end of one round and the start of the next, in ms. */
  everyMs: (env: Env) => number;
  /** Delay before the first round after start, in ms. */
  firstAfterMs: number;
  tick: (ctx: JobContext, isStopped: () => boolean) => Promise<void>;
}
