import { MemoryStore, type SessionData } from 'express-session';
import { describe, expect, it, vi } from 'vitest';
import { throttleSessionTouch } from './session-touch';

const data = { cookie: { originalMaxAge: 1000 } } as unknown as SessionData;

function setup(intervalMs: number, maxTracked?: number) {
  const store = new MemoryStore();
  const spy = vi.fn((_sid: string, _s: SessionData, cb?: () => void) => cb?.());
  store.touch = spy;
  let clock = 0;
  throttleSessionTouch(store, intervalMs, {
    now: () => clock,
    ...(maxTracked ? { maxTracked } : {}),
  });
  const touch = (sid: string) =>
    new Promise<void>((resolve) => store.touch?.(sid, data, () => resolve()));
  return { spy, touch, advance: (ms: number) => (clock += ms) };
}

describe('throttleSessionTouch', () => {
  it('passes the first touch of a session to the store', async () => {
    const { spy, touch } = setup(600_000);
    await touch('a');
    expect(spy).toHaveBeenCalledTimes(1);
    expect(spy.mock.calls[0]?.[0]).toBe('a');
  });

  it('skips touches of the same session within the interval but still calls back', async () => {
    const { spy, touch, advance } = setup(600_000);
    await touch('a');
    advance(599_999);
    await touch('a');
    await touch('a');
    expect(spy).toHaveBeenCalledTimes(1);
  });

  it('touches again once the interval has passed', async () => {
    const { spy, touch, advance } = setup(600_000);
    await touch('a');
    advance(600_000);
    await touch('a');
    expect(spy).toHaveBeenCalledTimes(2);
  });

  it('keeps sessions apart', async () => {
    const { spy, touch } = setup(600_000);
    await touch('a');
    await touch('b');
    await touch('a');
    expect(spy.mock.calls.map((c) => c[0])).toEqual(['a', 'b']);
  });

  it('forgets the oldest session beyond maxTracked, so memory stays bounded', async () => {
    const { spy, touch } = setup(600_000, 2);
    await touch('a');
    await touch('b');
    await touch('c'); // 'a' is forgotten
    await touch('a');
    await touch('c');
    expect(spy.mock.calls.map((c) => c[0])).toEqual(['a', 'b', 'c', 'a']);
  });
});
