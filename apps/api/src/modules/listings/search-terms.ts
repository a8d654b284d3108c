/**
 * The exchange's one tokenizer: listing text is indexed and search queries are read through `searchTerms`, so a
 * size, a grade or a length written any of the usual ways ends up as the same term on both sides.
 *
 * - Sizes: "8mm", "8 mm", "8 millimetres" → `8mm`; "0.8 cm" → `8mm`; "5/16", "5/16 in", `5/16"`, "0.3125 in" →
 *   `5/16in`; "1 1/8", "1-1/8 in", "1.125 in" → `1-1/8in` (a bare fraction is read as inches: trade sizes are
 *   written that way). Inch values that are not a whole number of 64ths stay decimal (`0.3in`).
 * - Chain grades: "grade 43", "G43", "g 43", "gr. 43" → `g43`. The short marks stamped on links map to their grade
 *   (common practice, from memory: "G4" high test → `g43`, "G7" → `g70`, "G8" → `g80`, "G10" → `g100`, "G3" →
 *   `g30`); "grade 40", the older name of high-test chain, → `g43` (from memory).
 * - Lengths: "30m", "30 m", "30 metres" → `30m`; "100 ft", "100'" → `100ft`. In a query a length is a *minimum
 *   length* (see `parseQuery`), not a word to match.
 * - Masses: "60 kg" → `60kg`, "10 lb" → `10lb`.
 * - Everything else: runs of letters and digits, lower-cased (MiniSearch's default term processing).
 */
import MiniSearch from 'minisearch';

export type SearchTermKind = 'word' | 'size' | 'grade' | 'length' | 'mass' | 'number';

export interface SearchTerm {
  kind: SearchTermKind;
  text: string;
  /** For a length: the length in metres. */
  metres?: number;
}

const processTerm = MiniSearch.getDefault('processTerm') as (term: string) => string | null;

/** Metres per foot (exact by definition, NIST SP 811 B.8). */
const M_PER_FT = 0.3048;

const GRADE_OF: Readonly<Record<string, string>> = {
  '30': 'g30',
  '3': 'g30',
  '43': 'g43',
  '40': 'g43',
  '4': 'g43',
  '70': 'g70',
  '7': 'g70',
  '80': 'g80',
  '8': 'g80',
  '100': 'g100',
  '10': 'g100',
};

const INCH = String.raw`inches|inch|in(?![\p{L}\p{N}])|"|″|”`;
const UNIT = [
  String.raw`millimetres|millimeters|millimetre|millimeter|mm`,
  String.raw`centimetres|centimeters|centimetre|centimeter|cm`,
  String.raw`metres|meters|metre|meter|m`,
  String.raw`feet|foot|ft|'|′`,
  INCH,
  String.raw`kilograms|kilogram|kilos|kilo|kg`,
  String.raw`pounds|pound|lbs|lb`,
].join('|');

const TOKEN = new RegExp(
  [
    // An inch fraction, mixed ("1 1/8", "1-1/8") or plain ("5/16"), with an optional inch mark.
    String.raw`(?<whole>\d+[ -])?(?<num>\d+)\/(?<den>\d+)(?:\s*(?<fin>${INCH}))?`,
    // A number, with a unit when one follows.
    String.raw`(?<value>\d+(?:\.\d+)?)(?:\s*(?<unit>${UNIT})(?![\p{L}\p{N}]))?`,
    // A chain grade.
    String.raw`(?<![\p{L}\p{N}])(?:grade|gr\.?|g)\s*-?\s*(?<grade>\d{1,3})(?![\p{L}\p{N}])`,
    // Any other run of letters and digits.
    String.raw`[\p{L}\p{N}]+`,
  ].join('|'),
  'giu',
);

const round = (v: number, places = 3) => Number(v.toFixed(places));
/** Numbers from here up are no measure anyone lists (and print in exponent form), so they stay digits. */
const TOO_LARGE = 1e15;
/** Digits as written, without leading zeros ("007" → "7"). */
const digitText = (digits: string) => digits.replace(/^0+(?=\d)/, '');
const numText = (v: number) => String(round(v));
const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

/** An inch size as its canonical term: `5/16in`, `1-1/8in`, `2in`, or decimal when not a 64th. */
export function inchTerm(valueIn: number): string {
  const isSixtyFourth = (v: number) => Math.abs(v * 64 - Math.round(v * 64)) <= 1e-6;
  // Not a 64th: the value as its decimal form is written (3 places), so that form reads back as the same term;
  // it may round to a 64th (9.7503 → 9.75 → 9-3/4in).
  const value = isSixtyFourth(valueIn) ? valueIn : round(valueIn);
  const sixtyFourths = value * 64;
  if (!isSixtyFourth(value)) return `${numText(value)}in`;
  const total = Math.round(sixtyFourths);
  const whole = Math.floor(total / 64);
  const rest = total % 64;
  if (rest === 0) return `${whole}in`;
  const d = gcd(rest, 64);
  const fraction = `${rest / d}/${64 / d}`;
  return whole === 0 ? `${fraction}in` : `${whole}-${fraction}in`;
}

function unitTerm(value: number, unit: string): SearchTerm {
  const u = unit.toLowerCase();
  if (/^(mm|millim)/.test(u)) return { kind: 'size', text: `${numText(value)}mm` };
  if (/^(cm|centim)/.test(u)) return { kind: 'size', text: `${numText(value * 10)}mm` };
  if (/^(m|metre|meter)/.test(u) && !/^mm/.test(u))
    return { kind: 'length', text: `${numText(value)}m`, metres: value };
  if (/^(ft|feet|foot|'|′)/.test(u))
    return { kind: 'length', text: `${numText(value)}ft`, metres: value * M_PER_FT };
  if (/^(kg|kilo)/.test(u)) return { kind: 'mass', text: `${numText(value)}kg` };
  if (/^(lb|pound)/.test(u)) return { kind: 'mass', text: `${numText(value)}lb` };
  return { kind: 'size', text: inchTerm(value) };
}

/** The terms of a text (a listing's fields or a query), in order. */
export function searchTerms(text: string): SearchTerm[] {
  const out: SearchTerm[] = [];
  for (const m of text.normalize('NFKC').matchAll(TOKEN)) {
    const g = m.groups ?? {};
    if (g.num !== undefined && g.den !== undefined) {
      const den = Number(g.den);
      const whole = g.whole === undefined ? 0 : Number(g.whole.trim().replace('-', ''));
      const inches = den > 0 ? whole + Number(g.num) / den : Number.NaN;
      if (inches < TOO_LARGE) {
        out.push({ kind: 'size', text: inchTerm(inches) });
        continue;
      }
      // "5/0" or an absurd size: not a size; keep the numbers.
      for (const n of m[0].match(/\d+/g) ?? []) out.push({ kind: 'number', text: digitText(n) });
      continue;
    }
    if (g.value !== undefined) {
      const value = Number(g.value);
      if (value >= TOO_LARGE) {
        // Past what a size or a length can be (and where numbers print as 4.3e+21): the digits as written.
        out.push({ kind: 'number', text: digitText(g.value) });
        continue;
      }
      out.push(
        g.unit === undefined ? { kind: 'number', text: numText(value) } : unitTerm(value, g.unit),
      );
      continue;
    }
    if (g.grade !== undefined) {
      const grade = GRADE_OF[String(Number(g.grade))];
      if (grade) {
        out.push({ kind: 'grade', text: grade });
        continue;
      }
      // "G12": not a chain grade, so it is just a word.
      const word = processTerm(m[0].replace(/[\s.-]+/g, ''));
      if (word) out.push({ kind: 'word', text: word });
      continue;
    }
    // A grade mark glued to what comes before ("0G3") is matched as a word; read on its own it is a grade, so it
    // is a grade here too (each term reads back as itself).
    const glued = /^(?:grade|gr|g)(\d{1,3})$/i.exec(m[0]);
    const gluedGrade = glued?.[1] === undefined ? undefined : GRADE_OF[String(Number(glued[1]))];
    if (gluedGrade) {
      out.push({ kind: 'grade', text: gluedGrade });
      continue;
    }
    const word = processTerm(m[0]);
    if (word) out.push({ kind: /^\d+$/.test(word) ? 'number' : 'word', text: word });
  }
  return out;
}

/** The terms of a text as strings: what the index stores for a listing field. */
export const termsOf = (text: string): string[] => searchTerms(text).map((t) => t.text);

export interface ParsedQuery {
  /** Terms every hit must match (words, sizes, grades, masses, numbers), in query order. */
  terms: SearchTerm[];
  /** The longest length named in the query, m: hits must state a length at least this long. */
  minLengthM?: number;
}

/**
 * A search query: its lengths ("30 m", "100 ft") become a minimum length, so "g43 chain 30m" finds grade 43 chain
 * of 30 m or longer; every other term must match.
 */
export function parseQuery(q: string): ParsedQuery {
  const terms: SearchTerm[] = [];
  let minLengthM: number | undefined;
  for (const t of searchTerms(q)) {
    if (t.kind === 'length' && t.metres !== undefined)
      minLengthM = Math.max(minLengthM ?? 0, t.metres);
    else terms.push(t);
  }
  return minLengthM === undefined ? { terms } : { terms, minLengthM: round(minLengthM, 4) };
}
