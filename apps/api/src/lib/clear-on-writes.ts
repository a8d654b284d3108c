const WRITE_HOOKS = [
  'afterCreate',
  'afterUpdate',
  'afterSave',
  'afterDestroy',
  'afterUpsert',
  'afterBulkCreate',
  'afterBulkUpdate',
  'afterBulkDestroy',
] as const;

/** The two hook methods every model has; the union of model classes is too wide for TypeScript to call them. */
interface HookTarget {
  removeHook(hook: string, name: string): unknown;
  addHook(hook: string, name: string, fn: (...args: unknown[]) => void): unknown;
}

interface WriteOptions {
  transaction?: { afterCommit(fn: () => void): void } | null;
}

/**
 * Calls `clear` after any write to any of `models`, for per-process read caches, and once more after the commit
 * when the write is part of a transaction: a hook runs before the commit, so a read in between still sees the old
 * row (a post or listing just hidden) and would keep it for the cache's lifetime. Sequelize passes the write's
 * options as a hook's last argument. The hooks are named, so building the app again (tests do) replaces them
 * instead of stacking copies.
 */
export function clearOnWrites(models: readonly unknown[], name: string, clear: () => void) {
  const onWrite = (...hookArgs: unknown[]) => {
    clear();
    (hookArgs.at(-1) as WriteOptions | undefined)?.transaction?.afterCommit(clear);
  };
  for (const model of models as HookTarget[])
    for (const hook of WRITE_HOOKS) {
      model.removeHook(hook, name);
      model.addHook(hook, name, onWrite);
    }
}
