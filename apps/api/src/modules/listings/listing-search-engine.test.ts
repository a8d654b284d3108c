import fc from 'fast-check';
import MiniSearch from 'minisearch';
import { describe, expect, it } from 'vitest';
import { ListingSearchEngine, termsOf } from './listing-search-engine';

interface Doc {
  id: number;
  title: string;
  body: string;
}

const prefix = (t: string) => t.length > 2 && !/\d/.test(t);
const fuzzy = (t: string) => (t.length < 5 || /\d/.test(t) ? 0 : 1);
const engine = () =>
  new ListingSearchEngine<Doc>({
    fields: { title: 3, body: 1 },
    text: (d, f) => (f === 'title' ? d.title : d.body),
    prefix,
    fuzzy,
  });
// The reference: MiniSearch's own search with the same fields, boosts, prefix and fuzzy rules, ANDed.
const reference = (docs: Doc[]) => {
  const ms = new MiniSearch<Doc>({
    fields: ['title', 'body'],
    searchOptions: {
      boost: { title: 3 },
      prefix,
      fuzzy: (t) => (fuzzy(t) === 0 ? false : fuzzy(t)),
      combineWith: 'AND',
    },
  });
  ms.addAll(docs);
  return ms;
};

const WORDS = [
  'chain',
  'chains',
  'grade',
  '43',
  'nylon',
  'rode',
  'plow',
  'anchor',
  'ancor',
  'spare',
];
const text = fc
  .array(fc.constantFrom(...WORDS), { minLength: 1, maxLength: 6 })
  .map((w) => w.join(' '));
const corpus = fc
  .array(fc.record({ title: text, body: text }), { minLength: 1, maxLength: 30 })
  .map((xs) => xs.map((x, i) => ({ id: i + 1, ...x })));
const groups = (q: string) => termsOf(q).map((w) => [w]);
// Scores equal but for floating-point rounding (the two engines add the same terms in another order) count as a
// tie, broken by id, so a near-tie never orders the two lists differently.
const ranked = (hits: Array<{ id: number; score: number }>) =>
  [...hits].sort((a, b) =>
    Math.abs(b.score - a.score) > 1e-9 * Math.max(1, Math.abs(a.score))
      ? b.score - a.score
      : a.id - b.id,
  );

describe('ListingSearchEngine', () => {
  it('finds the same documents with the same scores as MiniSearch on random corpora', () => {
    fc.assert(
      fc.property(
        corpus,
        fc.constantFrom(...WORDS, 'chain grade', 'nylon rode', 'chian'),
        (docs, q) => {
          const e = engine();
          for (const d of docs) e.upsert(d);
          const ours = ranked(
            e.search(groups(q), () => true).map((h) => ({ id: h.doc.id, score: h.score })),
          );
          const theirs = ranked(reference(docs).search(q));
          expect(ours.map((h) => h.id)).toEqual(theirs.map((h) => h.id));
          // MiniSearch multiplies an ANDed score by the number of query words that matched.
          const words = termsOf(q).length;
          ours.forEach((h, i) => expect(h.score * words).toBeCloseTo(theirs[i]?.score ?? NaN, 6));
        },
      ),
      { numRuns: 150 },
    );
  });

  it('forgets removed and replaced documents, also after compaction', () => {
    const e = engine();
    for (let id = 1; id <= 2500; id += 1) e.upsert({ id, title: `chain ${id}`, body: 'spare' });
    e.upsert({ id: 7, title: 'plow anchor', body: 'spare' });
    expect(e.search([['chain']], () => true)).toHaveLength(2499);
    expect(e.search([['plow']], () => true).map((h) => h.doc.id)).toEqual([7]);
    for (let id = 1; id <= 2000; id += 1) if (id !== 7) e.remove(id);
    expect(e.size).toBe(501);
    expect(e.search([['chain']], () => true)).toHaveLength(500);
    expect(e.search([['spare'], ['anchr']], () => true).map((h) => h.doc.id)).toEqual([7]);
    expect(e.all().map((d) => d.id)).toContain(2500);
    expect(e.get(1)).toBeUndefined();
  });

  it('applies the filter only to documents matching every word', () => {
    const e = engine();
    e.upsert({ id: 1, title: 'grade 43 chain', body: '' });
    e.upsert({ id: 2, title: 'nylon rode', body: 'chain splice' });
    const seen: number[] = [];
    const hits = e.search([['chain'], ['43']], (d) => {
      seen.push(d.id);
      return true;
    });
    expect(hits.map((h) => h.doc.id)).toEqual([1]);
    expect(seen).toEqual([1]);
    expect(e.search([['chain'], ['anchor']], () => true)).toEqual([]);
  });
});
