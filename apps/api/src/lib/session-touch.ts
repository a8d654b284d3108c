import type { Store } from 'express-session';

type TouchFn = NonNullable<Store['touch']>;

/**
 * Limits how often `store.touch` (which refreshes a session's expiry in MariaDB) runs per session id, so a
 * signed-in member or a visitor reading pages does not cost one UPDATE per request. A session touched less than
 * `minIntervalMs` ago in this process is left as is; with a 14-day lifetime, a 10-minute interval shortens the
 * sliding expiry by at most those 10 minutes. Remembers at most `maxTracked` ids (oldest forgotten first).
 */
export function throttleSessionTouch(
  store: Store,
  minIntervalMs: number,
  { maxTracked = 50_000, now = () => Date.now() } = {},
): Store {
  const original = store.touch?.bind(store);
  if (!original) return store;
  const lastTouch = new Map<string, number>();
  const touch: TouchFn = (sid, session, callback) => {
    const at = now();
    const prev = lastTouch.get(sid);
    if (prev !== undefined && at - prev < minIntervalMs) {
      callback?.();
      return;
    }
    lastTouch.delete(sid);
    lastTouch.set(sid, at);
    if (lastTouch.size > maxTracked) {
      const oldest = lastTouch.keys().next();
      if (!oldest.done) lastTouch.delete(oldest.value);
    }
    original(sid, session, callback);
  };
  store.touch = touch;
  return store;
}
