import { formatMoney } from '@app/shared/locale';
import {
  LISTING_CATEGORY_LABELS,
  LISTING_CONDITION_LABELS,
  type ListingCategory,
  type ListingCondition,
} from '@app/shared';

/** Money in minor units as the club's region writes it (and with the currency's own digits). */
export const formatPrice = (priceCents: number, currency: string): string =>
  formatMoney(priceCents, currency);

const FRACTIONS: Record<number, string> = {
  0.1875: '3/16',
  0.25: '1/4',
  0.3125: '5/16',
  0.375: '3/8',
  0.4375: '7/16',
  0.5: '1/2',
  0.625: '5/8',
  0.75: '3/4',
  0.875: '7/8',
};
const inch = (v: number) => `${FRACTIONS[v] ?? String(v)} in`;
const num = (v: unknown) => (typeof v === 'number' ? v : undefined);
const str = (v: unknown) => (typeof v === 'string' ? v.replace(/-/g, ' ') : undefined);

/** The specs of a listing as label–value pairs for a table or a card. */
export function specRows(
  category: ListingCategory,
  specs: Record<string, unknown>,
): Array<[string, string]> {
  const rows: Array<[string, string | undefined]> = [];
  const tradeSizeIn = num(specs.tradeSizeIn);
  const nominalMm = num(specs.nominalMm);
  const size =
    tradeSizeIn !== undefined
      ? inch(tradeSizeIn)
      : nominalMm !== undefined
        ? `${nominalMm} mm`
        : undefined;
  switch (category) {
    case 'anchor':
      rows.push(['Type', str(specs.anchorType)], ['Mass', `${num(specs.massKg) ?? '?'} kg`]);
      break;
    case 'chain':
      rows.push(
        ['Grade', str(specs.grade)?.replace('G', 'Grade ')],
        ['Size', size],
        ['Length', `${num(specs.lengthM) ?? '?'} m`],
        ['Galvanising', str(specs.galvanizing)],
      );
      break;
    case 'rode':
      rows.push(
        ['Material', str(specs.material)],
        ['Construction', str(specs.construction)],
        ['Diameter', `${num(specs.diameterMm) ?? '?'} mm`],
        ['Length', `${num(specs.lengthM) ?? '?'} m`],
      );
      break;
    case 'connector': {
      const wllN = num(specs.wllN);
      const nominalIn = num(specs.nominalIn);
      rows.push(
        ['Kind', str(specs.kind)],
        ['Size', nominalIn !== undefined ? inch(nominalIn) : undefined],
        ['Rated working load', wllN !== undefined ? `${(wllN / 1000).toFixed(1)} kN` : undefined],
      );
      break;
    }
    case 'snubber':
      rows.push(
        ['Material', str(specs.material)],
        ['Diameter', `${num(specs.diameterMm) ?? '?'} mm`],
        ['Length', `${num(specs.lengthM) ?? '?'} m`],
        ['Bridle', specs.bridle === true ? 'yes' : 'no'],
      );
      break;
    case 'windlass':
      rows.push(
        ['Part', str(specs.part)],
        ['Chain', [str(specs.grade), size].filter(Boolean).join(' ') || undefined],
      );
      break;
    case 'mooring': {
      const massKg = num(specs.massKg);
      rows.push(
        ['Item', str(specs.item)],
        ['Mass', massKg !== undefined ? `${massKg} kg` : undefined],
      );
      break;
    }
    default:
      break;
  }
  return rows.filter((r): r is [string, string] => r[1] !== undefined);
}

export const categoryLabel = (c: ListingCategory) => LISTING_CATEGORY_LABELS[c];
export const conditionLabel = (c: ListingCondition) => LISTING_CONDITION_LABELS[c];
