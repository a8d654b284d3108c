const WORD = /[\p{L}\p{N}]+/gu;

function bag(text: string): Map<string, number> {
  const m = new Map<string, number>();
  for (const w of text.toLowerCase().match(WORD) ?? []) m.set(w, (m.get(w) ?? 0) + 1);
  return m;
}

/**
 * How much of a text an edit changed, 0–1: the larger of words removed and words added, over the longer
 * version's word count (word order is ignored). 0 for identical texts, 1 for a full rewrite.
 */
export function editRatio(before: string, after: string): number {
  const a = bag(before);
  const b = bag(after);
  let removed = 0;
  let added = 0;
  let lenA = 0;
  let lenB = 0;
  for (const [w, n] of a) {
    lenA += n;
    removed += Math.max(0, n - (b.get(w) ?? 0));
  }
  for (const [w, n] of b) {
    lenB += n;
    added += Math.max(0, n - (a.get(w) ?? 0));
  }
  const longer = Math.max(lenA, lenB);
  return longer === 0 ? 0 : Math.max(removed, added) / longer;
}
