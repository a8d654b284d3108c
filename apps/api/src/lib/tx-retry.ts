import type { Sequelize, Transaction, TransactionOptions } from 'sequelize';

/** ER_LOCK_DEADLOCK (also how Galera reports a certification conflict at COMMIT) and ER_LOCK_WAIT_TIMEOUT. */
const RETRYABLE_ERRNO = new Set([1213, 1205]);

/** True for errors after which the whole transaction may simply run again. */
export function isRetryableTxError(err: unknown): boolean {
  const e = err as
    { parent?: { errno?: number }; original?: { errno?: number }; errno?: number } | undefined;
  const errno = e?.parent?.errno ?? e?.original?.errno ?? e?.errno;
  return typeof errno === 'number' && RETRYABLE_ERRNO.has(errno);
}

export interface RetryOptions {
  /** Attempts in all, the first included (default 4). */
  attempts?: number;
  /** Upper bound of the random pause before attempt n, times n (default 40 ms). */
  backoffMs?: number;
  onRetry?: (err: unknown, attempt: number) => void;
}

/** Runs `attempt` again (up to `attempts` times in all, with a short random pause) while it fails with a deadlock. */
export async function retryOnDeadlock<T>(
  attempt: () => Promise<T>,
  { attempts = 4, backoffMs = 40, onRetry }: RetryOptions = {},
): Promise<T> {
  for (let n = 1; ; n++) {
    try {
      return await attempt();
    } catch (err) {
      if (n >= attempts || !isRetryableTxError(err)) throw err;
      onRetry?.(err, n);
      await new Promise((r) => setTimeout(r, Math.random() * backoffMs * n));
    }
  }
}

type TxCallback<T> = (t: Transaction) => PromiseLike<T>;

/**
 * Makes every managed transaction of `sequelize` (`sequelize.transaction(async (t) => …)`) run again from the start
 * when it ends in a deadlock or, on Galera, a certification conflict. Nested calls (`{ transaction }` given) and
 * unmanaged transactions are left alone: only the outermost callback can be replayed. Callbacks must therefore keep
 * side effects outside the database (HTTP calls, files) out of the transaction, as enqueueEmail already does.
 */
export function installTransactionRetry(
  sequelize: Sequelize,
  options: RetryOptions = {},
): Sequelize {
  const original = sequelize.transaction.bind(sequelize) as (
    a?: TransactionOptions | TxCallback<unknown>,
    b?: TxCallback<unknown>,
  ) => Promise<unknown>;
  const patched = (a?: TransactionOptions | TxCallback<unknown>, b?: TxCallback<unknown>) => {
    if (typeof a === 'function') return retryOnDeadlock(() => original(a), options);
    if (typeof b === 'function' && !a?.transaction)
      return retryOnDeadlock(() => original(a, b), options);
    return original(a, b);
  };
  (sequelize as unknown as { transaction: typeof patched }).transaction = patched;
  return sequelize;
}
