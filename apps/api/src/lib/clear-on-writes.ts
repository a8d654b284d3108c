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
  addHook(hook: string, name: string, fn: () => void): unknown;
}

/**
 * Calls `clear` after any write to any of `models`, for per-process read caches. The hooks are named, so
 * building the app again (tests do) replaces them instead of stacking copies.
 */
export function clearOnWrites(models: readonly unknown[], name: string, clear: () => void) {
  for (const model of models as HookTarget[])
    for (const hook of WRITE_HOOKS) {
      model.removeHook(hook, name);
      model.addHook(hook, name, clear);
    }
}
