import type { Job, JobContext } from './job';

export interface RunningJobs {
  /** Names of the jobs started. */
  names: string[];
  /** Cancels every pending round; a round under way finishes, and no job runs again. */
  stop: () => void;
}

/**
 * Starts each job on its own timer (first round after `firstAfterMs`, then `everyMs` after each round ends) and
 * returns the one stop function for all of them. Timers are unref'd, so they never keep a process alive.
 */
export function startJobs(jobs: readonly Job[], ctx: JobContext): RunningJobs {
  const names = new Set<string>();
  for (const job of jobs) {
    if (names.has(job.name)) throw new Error(`Two timed jobs are named ${job.name}`);
    names.add(job.name);
  }
  let stopped = false;
  const isStopped = () => stopped;
  const timers = new Map<string, NodeJS.Timeout>();
  const schedule = (job: Job, delayMs: number) => {
    const timer = setTimeout(() => {
      timers.delete(job.name);
      void job
        .tick(ctx, isStopped)
        .catch((err: unknown) => ctx.logger.error({ err, job: job.name }, 'timed job failed'))
        .finally(() => {
          if (!stopped) schedule(job, job.everyMs(ctx.env));
        });
    }, delayMs);
    timer.unref();
    timers.set(job.name, timer);
  };
  for (const job of jobs) schedule(job, job.firstAfterMs);
  return {
    names: [...names],
    stop: () => {
      stopped = true;
      for (const timer of timers.values()) clearTimeout(timer);
      timers.clear();
    },
  };
}
