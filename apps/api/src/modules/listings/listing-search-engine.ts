import MiniSearch from 'minisearch';
import SearchableMap from 'minisearch/SearchableMap';

/**
 * The listing full-text index: MiniSearch's tokenizer and its radix tree (`SearchableMap`, which does the prefix
 * and fuzzy term lookups) over flat posting arrays, scored with MiniSearch's own BM25 and match weights.
 *
 * Why not `MiniSearch#search` itself: it builds a result object, a match map and a terms list for every posting
 * it visits and sorts every hit, which cost 4–12 ms per common word on 10,000 listings (profiled: 60 % of the time
 * in `termResults` and `search`). Here a posting costs an array read and a float add, the words are ANDed with
 * a stamp per slot, and facet filters run only on documents that matched every word.
 */
export interface EngineOptions<D> {
  /** Field name → weight (MiniSearch `boost`). */
  fields: Record<string, number>;
  text: (doc: D, field: string) => string;
  /** Prefix expansion for a query word (MiniSearch `prefix`). */
  prefix: (term: string) => boolean;
  /** Largest edit distance for a query word, 0 for none (MiniSearch `fuzzy`). */
  fuzzy: (term: string) => number;
  /**
   * The terms of a field's text (default: MiniSearch's tokenizer, `termsOf`). Queries arrive as term groups, so
   * the caller reads them with the same function.
   */
  terms?: (text: string) => string[];
}

export interface EngineHit<D> {
  doc: D;
  score: number;
}

const tokenize = MiniSearch.getDefault('tokenize') as (text: string) => string[];
const processTerm = MiniSearch.getDefault('processTerm') as (term: string) => string | null;
// MiniSearch's defaults (minisearch/dist/es/index.js: defaultBM25params, defaultSearchOptions.weights).
const BM25 = { k: 1.2, b: 0.7, d: 0.5 };
const WEIGHT = { fuzzy: 0.45, prefix: 0.375 };

/** The words of a text, as MiniSearch indexes and queries them (the default `terms`). */
export function termsOf(text: string): string[] {
  const out: string[] = [];
  for (const t of tokenize(text)) {
    const p = processTerm(t);
    if (p) out.push(p);
  }
  return out;
}

interface Posting {
  slots: number[];
  freqs: number[];
  /** Live documents holding the term in this field (BM25 document frequency). */
  live: number;
}

export class ListingSearchEngine<D extends { id: number }> {
  private readonly fieldNames: string[];
  private readonly boosts: number[];
  private terms = new SearchableMap<number>();
  private termCount = 0;
  /** postings[termId * fieldCount + field] */
  private postings: (Posting | undefined)[] = [];
  private slotDoc: (D | undefined)[] = [];
  /**
   * Per slot and field, the field's length (lengths[slot * fieldCount + field]), and whether the slot holds a live
   * document: typed arrays, so the postings loop reads contiguous memory instead of a small array per document
   * (at 100,000 listings those scattered reads cost most of a search).
   */
  private lengths = new Uint32Array(0);
  private alive = new Uint8Array(0);
  private slotTerms: number[][] = [];
  private slotOf = new Map<number, number>();
  private lengthSum: number[];
  private stamp = new Int32Array(0);
  private score = new Float64Array(0);
  private generation = 0;
  private dead = 0;
  private live: D[] | null = null;

  constructor(private readonly opts: EngineOptions<D>) {
    this.fieldNames = Object.keys(opts.fields);
    this.boosts = this.fieldNames.map((f) => opts.fields[f] ?? 1);
    this.lengthSum = this.fieldNames.map(() => 0);
  }

  get size() {
    return this.slotOf.size;
  }

  has(id: number) {
    return this.slotOf.has(id);
  }

  get(id: number): D | undefined {
    const slot = this.slotOf.get(id);
    return slot === undefined ? undefined : this.slotDoc[slot];
  }

  /** Every live document, oldest slot first (kept until the next write). */
  all(): readonly D[] {
    this.live ??= this.slotDoc.filter((d): d is D => d !== undefined);
    return this.live;
  }

  /** Adds `doc`, replacing any document with the same id. */
  upsert(doc: D) {
    this.remove(doc.id);
    this.live = null;
    const slot = this.slotDoc.length;
    const fieldCount = this.fieldNames.length;
    const lengths: number[] = [];
    const held: number[] = [];
    this.fieldNames.forEach((field, f) => {
      const words = (this.opts.terms ?? termsOf)(this.opts.text(doc, field));
      const counts = new Map<string, number>();
      for (const w of words) counts.set(w, (counts.get(w) ?? 0) + 1);
      lengths.push(counts.size); // MiniSearch's field length: distinct words
      this.lengthSum[f] = (this.lengthSum[f] ?? 0) + counts.size;
      for (const [word, freq] of counts) {
        let termId = this.terms.get(word);
        if (termId === undefined) {
          termId = this.termCount; // not `terms.size`, which walks the whole tree after each insert
          this.termCount += 1;
          this.terms.set(word, termId);
        }
        const key = termId * fieldCount + f;
        let p = this.postings[key];
        if (!p) this.postings[key] = p = { slots: [], freqs: [], live: 0 };
        p.slots.push(slot);
        p.freqs.push(freq);
        p.live += 1;
        held.push(key);
      }
    });
    this.slotDoc.push(doc);
    this.reserve(slot + 1);
    this.lengths.set(lengths, slot * fieldCount);
    this.alive[slot] = 1;
    this.slotTerms.push(held);
    this.slotOf.set(doc.id, slot);
  }

  /** Removes the document `id` if present; its postings stay as dead slots until the next compaction. */
  remove(id: number) {
    const slot = this.slotOf.get(id);
    if (slot === undefined) return;
    this.slotOf.delete(id);
    this.live = null;
    this.slotDoc[slot] = undefined;
    this.alive[slot] = 0;
    for (const key of this.slotTerms[slot] ?? []) {
      const p = this.postings[key];
      if (p) p.live -= 1;
    }
    const fieldCount = this.fieldNames.length;
    for (let f = 0; f < fieldCount; f += 1)
      this.lengthSum[f] = (this.lengthSum[f] ?? 0) - (this.lengths[slot * fieldCount + f] ?? 0);
    this.slotTerms[slot] = [];
    this.dead += 1;
    if (this.dead > 1000 && this.dead > this.slotOf.size) this.compact();
  }

  private compact() {
    const docs = [...this.all()];
    this.terms = new SearchableMap<number>();
    this.termCount = 0;
    this.postings = [];
    this.slotDoc = [];
    this.lengths = new Uint32Array(0);
    this.alive = new Uint8Array(0);
    this.slotTerms = [];
    this.slotOf = new Map();
    this.lengthSum = this.fieldNames.map(() => 0);
    this.dead = 0;
    for (const d of docs) this.upsert(d);
  }

  /** Grows the per-slot arrays (doubling) to hold at least `slots` slots. */
  private reserve(slots: number) {
    if (this.alive.length >= slots) return;
    const size = Math.max(1024, slots * 2);
    const alive = new Uint8Array(size);
    alive.set(this.alive);
    const lengths = new Uint32Array(size * this.fieldNames.length);
    lengths.set(this.lengths);
    this.alive = alive;
    this.lengths = lengths;
  }

  /** Index terms a query word reaches, with MiniSearch's weight for exact, prefix and fuzzy matches. */
  private expand(word: string, into: Map<number, number>) {
    const add = (termId: number, weight: number) => {
      if (weight > (into.get(termId) ?? 0)) into.set(termId, weight);
    };
    const exact = this.terms.get(word);
    if (exact !== undefined) add(exact, 1);
    const prefixed = new Set<string>();
    if (this.opts.prefix(word))
      for (const [term, termId] of this.terms.atPrefix(word)) {
        const distance = term.length - word.length;
        if (!distance) continue;
        prefixed.add(term);
        add(termId, (WEIGHT.prefix * term.length) / (term.length + 0.3 * distance));
      }
    const maxDistance = this.opts.fuzzy(word);
    if (maxDistance > 0)
      for (const [term, [termId, distance]] of this.terms.fuzzyGet(word, maxDistance)) {
        if (!distance || prefixed.has(term)) continue;
        add(termId, (WEIGHT.fuzzy * term.length) / (term.length + distance));
      }
  }

  /**
   * Documents matching every query group (a group matches when any of its words does), best first, that pass
   * `keep`. Each inner array is one group: a typed word, or a word and its alternative spellings.
   */
  search(groups: string[][], keep: (doc: D) => boolean): EngineHit<D>[] {
    const expansions = groups.map((words) => {
      const into = new Map<number, number>();
      for (const w of words) this.expand(w, into);
      return into;
    });
    if (expansions.length === 0 || expansions.some((e) => e.size === 0)) return [];
    const slotCount = this.slotDoc.length;
    if (this.stamp.length < slotCount) {
      this.stamp = new Int32Array(Math.max(slotCount, 1024) * 2);
      this.score = new Float64Array(this.stamp.length);
      this.generation = 0;
    }
    if (this.generation > 2 ** 30) {
      this.stamp.fill(0);
      this.generation = 0;
    }
    const base = this.generation + 1;
    this.generation += expansions.length + 1;
    const { stamp, score, alive, lengths } = this;
    const fieldCount = this.fieldNames.length;
    const docCount = this.slotOf.size;
    const avg = this.lengthSum.map((s) => (docCount ? s / docCount : 1) || 1);
    const { k, b, d } = BM25;
    const last: number[] = [];
    expansions.forEach((terms, g) => {
      const want = base + g - 1; // stamp a slot must carry to still match every earlier group
      const mine = base + g;
      const isLast = g === expansions.length - 1;
      for (const [termId, weight] of terms)
        for (let f = 0; f < fieldCount; f += 1) {
          const p = this.postings[termId * fieldCount + f];
          if (!p || p.live === 0) continue;
          const idf = Math.log(1 + (docCount - p.live + 0.5) / (p.live + 0.5));
          const factor = weight * (this.boosts[f] ?? 1) * idf;
          const norm = avg[f] ?? 1;
          const { slots, freqs } = p;
          for (let i = 0; i < slots.length; i += 1) {
            const s = slots[i] as number;
            const st = stamp[s] as number;
            if (st !== mine) {
              if (g > 0 ? st !== want : false) continue;
              if (alive[s] === 0) continue;
              if (g === 0) score[s] = 0;
              stamp[s] = mine;
              if (isLast) last.push(s);
            }
            const tf = freqs[i] as number;
            const len = (lengths[s * fieldCount + f] as number) || 1;
            score[s] =
              (score[s] as number) +
              factor * (d + (tf * (k + 1)) / (tf + k * (1 - b + (b * len) / norm)));
          }
        }
    });
    const hits: EngineHit<D>[] = [];
    for (const s of last) {
      const doc = this.slotDoc[s];
      if (doc && keep(doc)) hits.push({ doc, score: score[s] as number });
    }
    return hits;
  }
}
