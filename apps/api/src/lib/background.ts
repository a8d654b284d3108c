/**
 * Work that runs after the answer has gone out, so the answer's timing says nothing about what the work found
 * (e.g. whether an address has an account). Failures are logged; tests await `settleBackground()`.
 */
const pending = new Set<Promise<void>>();

export function inBackground(work: () => Promise<unknown>, onError: (err: unknown) => void): void {
  const p: Promise<void> = Promise.resolve()
    .then(work)
    .then(
      () => undefined,
      (err: unknown) => onError(err),
    )
    .finally(() => pending.delete(p));
  pending.add(p);
}

/** Resolves once every background job started so far (and any they started) has finished. */
export async function settleBackground(): Promise<void> {
  while (pending.size) await Promise.allSettled([...pending]);
}
