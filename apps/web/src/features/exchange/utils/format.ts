import { CHAIN_GRADE_LABELS, chainGradeWords, inchFractionLabel } from '@app/calc';
import { formatMoney } from '@app/shared/locale';
import type { ListingCategory, ListingCondition } from '@app/shared';
import { LISTING_CATEGORY_LABELS, LISTING_CONDITION_LABELS } from '@app/shared/values';

/** Money in minor units as the club's region writes it (and with the currency's own digits). */
export const formatPrice = (priceCents: number, currency: string): string =>
  formatMoney(priceCents, currency);

/** Trade sizes as fractions (5/16 in, never 0.3125 in); a size that is no 16th of an inch stays decimal. */
const inch = (v: number) =>
  Math.abs(v * 16 - Math.round(v * 16)) < 1e-6 ? inchFractionLabel(v) : `${v} in`;
const num = (v: unknown) => (typeof v === 'number' ? v : undefined);
const str = (v: unknown) => (typeof v === 'string' ? v.replace(/-/g, ' ') : undefined);
/** "G43" → "43 (high test)": the row is already labelled "Grade". */
const gradeValue = (v: unknown) => {
  if (typeof v !== 'string') return undefined;
  const label = CHAIN_GRADE_LABELS[v as keyof typeof CHAIN_GRADE_LABELS] as string | undefined;
  const name = label?.replace(/^Grade \d+\s*/, '');
  return `${v.replace(/^G/, '')}${name ? ` (${name})` : ''}`;
};
/** "G43" → "grade 43", for text that has no label beside it. */
const gradeWords = (v: unknown) =>
  typeof v !== 'string'
    ? undefined
    : v in CHAIN_GRADE_LABELS
      ? chainGradeWords(v as keyof typeof CHAIN_GRADE_LABELS)
      : v.replace(/^G(?=\d)/i, 'grade ');

export interface SpecRow {
  label: string;
  /** The value beside its label (a table row). */
  value: string;
  /** The same fact on its own, for a card line: "grade 43", "40 m", "galvanising good". */
  short: string;
}

/** The specs of a listing as labelled rows, each with a short form for cards. */
export function specDetails(category: ListingCategory, specs: Record<string, unknown>): SpecRow[] {
  const rows: Array<[string, string | undefined, string | undefined]> = [];
  const tradeSizeIn = num(specs.tradeSizeIn);
  const nominalMm = num(specs.nominalMm);
  const size =
    tradeSizeIn !== undefined
      ? inch(tradeSizeIn)
      : nominalMm !== undefined
        ? `${nominalMm} mm`
        : undefined;
  const length = (v: unknown) => `${num(v) ?? '?'} m`;
  const galvanizing = str(specs.galvanizing);
  switch (category) {
    case 'anchor':
      rows.push(
        ['Type', str(specs.anchorType), str(specs.anchorType)],
        ['Mass', `${num(specs.massKg) ?? '?'} kg`, `${num(specs.massKg) ?? '?'} kg`],
      );
      break;
    case 'chain':
      rows.push(
        ['Grade', gradeValue(specs.grade), gradeWords(specs.grade)],
        ['Size', size, size],
        ['Length', length(specs.lengthM), length(specs.lengthM)],
        ['Galvanising', galvanizing, galvanizing && `galvanising ${galvanizing}`],
      );
      break;
    case 'rode':
      rows.push(
        ['Material', str(specs.material), str(specs.material)],
        ['Construction', str(specs.construction), str(specs.construction)],
        ['Diameter', `${num(specs.diameterMm) ?? '?'} mm`, `${num(specs.diameterMm) ?? '?'} mm`],
        ['Length', length(specs.lengthM), length(specs.lengthM)],
      );
      break;
    case 'connector': {
      const wllN = num(specs.wllN);
      const nominalIn = num(specs.nominalIn);
      const wll = wllN !== undefined ? `${(wllN / 1000).toFixed(1)} kN` : undefined;
      const sizeIn = nominalIn !== undefined ? inch(nominalIn) : undefined;
      rows.push(
        ['Kind', str(specs.kind), str(specs.kind)],
        ['Size', sizeIn, sizeIn],
        ['Rated working load', wll, wll && `WLL ${wll}`],
      );
      break;
    }
    case 'snubber':
      rows.push(
        ['Material', str(specs.material), str(specs.material)],
        ['Diameter', `${num(specs.diameterMm) ?? '?'} mm`, `${num(specs.diameterMm) ?? '?'} mm`],
        ['Length', length(specs.lengthM), length(specs.lengthM)],
        [
          'Bridle',
          specs.bridle === true ? 'yes' : 'no',
          specs.bridle === true ? 'bridle' : 'single',
        ],
      );
      break;
    case 'windlass': {
      const chain = [gradeWords(specs.grade), size].filter(Boolean).join(', ') || undefined;
      rows.push(
        ['Part', str(specs.part), str(specs.part)],
        ['Chain', chain, chain && `for ${chain} chain`],
      );
      break;
    }
    case 'mooring': {
      const massKg = num(specs.massKg);
      const mass = massKg !== undefined ? `${massKg} kg` : undefined;
      rows.push(['Item', str(specs.item), str(specs.item)], ['Mass', mass, mass]);
      break;
    }
    default:
      break;
  }
  return rows
    .filter((r): r is [string, string, string | undefined] => r[1] !== undefined)
    .map(([label, value, short]) => ({ label, value, short: short ?? value }));
}

/** The specs of a listing as label–value pairs for a table. */
export const specRows = (
  category: ListingCategory,
  specs: Record<string, unknown>,
): Array<[string, string]> => specDetails(category, specs).map((r) => [r.label, r.value]);

export const categoryLabel = (c: ListingCategory) => LISTING_CATEGORY_LABELS[c];
export const conditionLabel = (c: ListingCondition) => LISTING_CONDITION_LABELS[c];
