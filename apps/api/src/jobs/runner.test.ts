import { readdirSync } from 'node:fs';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { Transporter } from 'nodemailer';
import { createLogger } from '../logger';
import { testDb, testEnv } from '../testing/test-app';
import type { Job, JobContext } from './job';
import { JOBS } from './registry';
import { startJobs } from './runner';

const isJob = (v: unknown): v is Job =>
  typeof v === 'object' && v !== null && 'name' in v && 'tick' in v && 'everyMs' in v;

function context(): JobContext {
  return {
    env: testEnv(),
    sequelize: testDb().sequelize,
    logger: createLogger('silent'),
    transport: {} as Transporter,
  };
}

beforeEach(() => {
  vi.useFakeTimers();
});
afterEach(() => {
  vi.restoreAllMocks();
  vi.useRealTimers();
});

describe('JOBS', () => {
  it('registers every job declared in a jobs/*.job.ts file, once each', async () => {
    const files = readdirSync(import.meta.dirname).filter((f) => f.endsWith('.job.ts'));
    expect(files.length).toBeGreaterThanOrEqual(5);
    const declared: Job[] = [];
    for (const f of files) {
      const mod = (await import(/* @vite-ignore */ `./${f}`)) as Record<string, unknown>;
      const jobs = Object.values(mod).filter(isJob);
      expect(jobs, `${f} exports one job`).toHaveLength(1);
      declared.push(...jobs);
    }
    expect(new Set(JOBS).size).toBe(JOBS.length);
    expect([...JOBS].sort((a, b) => a.name.localeCompare(b.name))).toEqual(
      declared.sort((a, b) => a.name.localeCompare(b.name)),
    );
  });
});

describe('startJobs', () => {
  it('runs every registered job after its first delay and again after its interval, and stop ends them all', async () => {
    const ctx = context();
    const ticks = JOBS.map((job) => vi.spyOn(job, 'tick').mockResolvedValue(undefined));
    const running = startJobs(JOBS, ctx);
    expect(running.names.sort()).toEqual(JOBS.map((j) => j.name).sort());
    expect(vi.getTimerCount()).toBe(JOBS.length);

    await vi.advanceTimersByTimeAsync(Math.min(...JOBS.map((j) => j.firstAfterMs)) - 1);
    for (const tick of ticks) expect(tick).not.toHaveBeenCalled();
    await vi.advanceTimersByTimeAsync(Math.max(...JOBS.map((j) => j.firstAfterMs)));
    for (const [i, tick] of ticks.entries()) {
      expect(tick, JOBS[i]?.name).toHaveBeenCalled();
      expect(tick, JOBS[i]?.name).toHaveBeenCalledWith(ctx, expect.any(Function));
    }

    const longest = Math.max(...JOBS.map((j) => j.everyMs(ctx.env)));
    await vi.advanceTimersByTimeAsync(longest);
    for (const [i, tick] of ticks.entries())
      expect(tick.mock.calls.length, JOBS[i]?.name).toBeGreaterThanOrEqual(2);

    running.stop();
    expect(vi.getTimerCount()).toBe(0);
    const before = ticks.map((t) => t.mock.calls.length);
    await vi.advanceTimersByTimeAsync(10 * longest);
    expect(ticks.map((t) => t.mock.calls.length)).toEqual(before);
  });

  it('never overlaps two rounds of one job, and tells a round under way that it was stopped', async () => {
    let finish: () => void = () => undefined;
    let seenStopped: boolean | undefined;
    const slow: Job = {
      name: 'slow',
      everyMs: () => 100,
      firstAfterMs: 10,
      tick: vi.fn(async (_ctx: JobContext, isStopped: () => boolean) => {
        await new Promise<void>((resolve) => {
          finish = resolve;
        });
        seenStopped = isStopped();
      }),
    };
    const running = startJobs([slow], context());
    await vi.advanceTimersByTimeAsync(1_000);
    expect(slow.tick).toHaveBeenCalledTimes(1);
    running.stop();
    finish();
    await vi.advanceTimersByTimeAsync(1_000);
    expect(seenStopped).toBe(true);
    expect(slow.tick).toHaveBeenCalledTimes(1);
    expect(vi.getTimerCount()).toBe(0);
  });

  it('logs a round that throws and runs the job again next time', async () => {
    const ctx = context();
    const error = vi.spyOn(ctx.logger, 'error');
    const tick = vi.fn().mockRejectedValueOnce(new Error('down')).mockResolvedValue(undefined);
    const failing: Job = { name: 'failing', everyMs: () => 50, firstAfterMs: 0, tick };
    const running = startJobs([failing], ctx);
    await vi.advanceTimersByTimeAsync(60);
    running.stop();
    expect(tick).toHaveBeenCalledTimes(2);
    expect(error).toHaveBeenCalledWith(
      expect.objectContaining({ job: 'failing' }),
      'timed job failed',
    );
  });

  it('refuses two jobs with one name', () => {
    const job: Job = { name: 'twice', everyMs: () => 1, firstAfterMs: 1, tick: vi.fn() };
    expect(() => startJobs([job, { ...job }], context())).toThrow(/twice/);
    expect(vi.getTimerCount()).toBe(0);
  });
});
