import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';

/**
 * bcrypt limits a password to its first 72 bytes. Longer ones are refused at sign-up, reset and change
 * (`passwordSchema`); at sign-in a longer one never matches, so no stored hash accepts a truncated variant.
 */
export const BCRYPT_MAX_BYTES = 72;
export const passwordBytes = (password: string) => Buffer.byteLength(password, 'utf8');

let pool: Piscina | undefined;
const workers = () =>
  (pool ??= new Piscina({
    filename: new URL('./password-worker.mjs', import.meta.url).href,
    // One core stays free for the event loop; sign-ins queue here instead of stalling other requests.
    maxThreads: Math.max(1, availableParallelism() - 1),
    minThreads: 1,
    idleTimeout: 60_000,
  }));

/**
 * bcrypt (bcryptjs) off the main thread, in a worker pool: a burst of sign-ins costs the other routes nothing but
 * the spare cores. One object so tests can count calls.
 */
export const passwords = {
  hash(password: string, cost: number): Promise<string> {
    return workers().run({ password, cost }, { name: 'hash' }) as Promise<string>;
  },
  async compare(password: string, hash: string): Promise<boolean> {
    const ok = (await workers().run({ password, hash }, { name: 'compare' })) as boolean;
    return ok && passwordBytes(password) <= BCRYPT_MAX_BYTES;
  },
};

/** Stops the worker threads (server shutdown). */
export async function closePasswordPool() {
  const p = pool;
  pool = undefined;
  await p?.destroy();
}
