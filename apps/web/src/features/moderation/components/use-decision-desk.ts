import { UNDO_WINDOW_MS } from '@app/shared/values';
import { useEffect, useState, type CSSProperties, type MouseEvent } from 'react';
import { useModerate, useUndoDecision, type ModerationAction } from '../api/decide';

/** A decision made on this page: what it was called, its id for Undo, and the card's height when decided. */
interface Decided {
  done: string;
  title: string;
  decisionId: number | null;
  at: number;
  height: number | null;
  /** Undone on this page: the card shows its buttons again, in the same place. */
  undone: boolean;
}

/**
 * The decisions made on one screen. An item being decided, or decided, stays where it is (with the height it
 * had) until the moderator leaves the page, so the next item's buttons never move under the pointer; the
 * decided card says what happened and offers Undo for `UNDO_WINDOW_MS`.
 */
export function useDecisionDesk() {
  const moderate = useModerate();
  const undoing = useUndoDecision();
  const [decided, setDecided] = useState<ReadonlyMap<string, Decided>>(new Map());
  const [pending, setPending] = useState<ReadonlySet<string>>(new Set());
  const [said, setSaid] = useState('');
  const [now, setNow] = useState(() => Date.now());

  const hasUndoable = [...decided.values()].some(
    (d) => !d.undone && d.decisionId !== null && now - d.at < UNDO_WINDOW_MS,
  );
  useEffect(() => {
    if (!hasUndoable) return;
    const timer = window.setInterval(() => setNow(Date.now()), 15_000);
    return () => window.clearInterval(timer);
  }, [hasUndoable]);

  /** Sends `action` for the item `key`; `done` is what the card says afterwards ("Published"). */
  const decide = async (
    key: string,
    title: string,
    done: string,
    action: ModerationAction,
    height: number | null,
  ) => {
    setPending((p) => new Set(p).add(key));
    undoing.reset();
    try {
      const res = await moderate.mutateAsync(action);
      const at = Date.now();
      setNow(at);
      setDecided((m) =>
        new Map(m).set(key, {
          done,
          title,
          decisionId: res?.decisionId ?? null,
          at,
          height,
          undone: false,
        }),
      );
      setSaid(`${done}: “${title}”.`);
    } catch {
      // The error shows in the desk's alert.
    } finally {
      setPending((p) => {
        const next = new Set(p);
        next.delete(key);
        return next;
      });
    }
  };

  const undo = async (key: string) => {
    const d = decided.get(key);
    if (!d?.decisionId || d.undone) return;
    moderate.reset();
    try {
      await undoing.mutateAsync(d.decisionId);
      setDecided((m) => new Map(m).set(key, { ...d, undone: true }));
      setSaid(`Undone: “${d.title}” is waiting again.`);
    } catch {
      // Shown in the alert (409 when someone acted since or the window passed).
    }
  };

  /** Keys to keep on screen even when the refreshed queue no longer holds them. */
  const kept = new Set([...pending, ...decided.keys()]);
  const error = moderate.error ?? undoing.error;

  return {
    decide,
    undo,
    kept,
    isPending: (key: string) => pending.has(key),
    decidedOf: (key: string) => {
      const d = decided.get(key);
      return d && !d.undone ? d : undefined;
    },
    canUndo: (d: Decided) => d.decisionId !== null && now - d.at < UNDO_WINDOW_MS,
    isUndoing: undoing.isPending,
    error,
    said,
  };
}

export type DecisionDesk = ReturnType<typeof useDecisionDesk>;

/** The height of the card a button sits in, so a decided card keeps it. */
export const cardHeight = (e: MouseEvent | null) =>
  (e?.currentTarget instanceof Element
    ? e.currentTarget.closest('li')
    : null
  )?.getBoundingClientRect().height ?? null;

/** The style that keeps a decided card as tall as it was. */
export const keptHeight = (d: Decided | undefined): CSSProperties | undefined =>
  d?.height ? { minHeight: d.height } : undefined;

/**
 * Keeps items in the order first seen; an item that left `items` stays while its key is in `kept`, new items
 * join at the end. Call during render with the current items; it answers the list to show.
 */
export function useKeptInPlace<T>(items: T[], keyOf: (t: T) => string, kept: ReadonlySet<string>) {
  const [shown, setShown] = useState(items);
  const [lastItems, setLastItems] = useState(items);
  const [lastKept, setLastKept] = useState(kept.size);
  if (items !== lastItems || kept.size !== lastKept) {
    const fresh = new Map(items.map((i) => [keyOf(i), i]));
    const next: T[] = [];
    const seen = new Set<string>();
    for (const old of shown) {
      const k = keyOf(old);
      const now = fresh.get(k);
      if (now) next.push(now);
      else if (kept.has(k)) next.push(old);
      else continue;
      seen.add(k);
    }
    for (const i of items) if (!seen.has(keyOf(i))) next.push(i);
    setShown(next);
    setLastItems(items);
    setLastKept(kept.size);
  }
  return shown;
}
