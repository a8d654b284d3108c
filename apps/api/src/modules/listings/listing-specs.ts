import {
  ANCHOR_TYPE_LABELS,
  CHAIN_GRADE_LABELS,
  CalcInputError,
  MM_PER_IN,
  chainSpec,
  chainSpecMetric,
  inchFractionLabel,
  ropeSpec,
  shackleSpec,
} from '@app/calc';
import type { z } from 'zod';
import {
  LISTING_CATEGORY_LABELS,
  type ListingCategory,
  type ListingCondition,
  type listingInputSchema,
} from '@app/shared';
import { invalid } from '../../errors/app-error';

export type ParsedListing = z.output<typeof listingInputSchema>;

/** What a listing can carry, reduced to the figure "fits my boat" compares. */
export type ListingRating =
  | { kind: 'wll'; wllN: number; basis: string; gypsy?: GypsySize }
  | { kind: 'break'; minBreakN: number; basis: string }
  | { kind: 'anchor'; anchorType: keyof typeof ANCHOR_TYPE_LABELS; massKg: number }
  | { kind: 'none'; basis: string };

export interface GypsySize {
  grade: string;
  tradeSizeIn?: number;
  nominalMm?: number;
}

type Specs = Record<string, unknown>;
const n = (v: unknown): number | undefined => (typeof v === 'number' ? v : undefined);
const s = (v: unknown): string | undefined => (typeof v === 'string' ? v : undefined);

const chainLabel = (grade: string, tradeSizeIn?: number, nominalMm?: number) =>
  `${CHAIN_GRADE_LABELS[grade as keyof typeof CHAIN_GRADE_LABELS] ?? grade} ${
    tradeSizeIn !== undefined ? inchFractionLabel(tradeSizeIn) : `${nominalMm ?? '?'} mm`
  }`;

/** Runs a calc function, turning its input error into a 400 on `specs.<field>`. */
function checked<T>(fn: () => T, field: string): T {
  try {
    return fn();
  } catch (err) {
    if (err instanceof CalcInputError) throw invalid({ [`specs.${field}`]: err.message });
    throw err;
  }
}

/**
 * Checks specs against the rating tables the exchange relies on (chain sizes of the 49 CFR 393.108 table or the
 * metric formula's range, shackle sizes of the RR-C-271 table). Throws VALIDATION_FAILED naming `specs.<field>`.
 */
export function checkSpecs(input: ParsedListing): void {
  if (input.category === 'chain') {
    const { grade, tradeSizeIn, nominalMm } = input.specs;
    if (tradeSizeIn !== undefined) checked(() => chainSpec({ grade, tradeSizeIn }), 'tradeSizeIn');
    else if (nominalMm !== undefined)
      checked(() => chainSpecMetric({ grade, nominalMm, extrapolate: true }), 'nominalMm');
  }
  if (input.category === 'connector' && input.specs.kind === 'shackle') {
    const { nominalIn } = input.specs;
    if (nominalIn !== undefined) checked(() => shackleSpec({ nominalIn }), 'nominalIn');
  }
  if (input.category === 'rode' || input.category === 'snubber') {
    const { diameterMm } = input.specs;
    checked(
      () =>
        ropeSpec({
          material: input.specs.material,
          construction: input.category === 'rode' ? input.specs.construction : 'three-strand',
          diameterMm,
          extrapolate: true,
        }),
      'diameterMm',
    );
  }
}

/** Nominal size in mm for the size filter: chain and gypsy size, rope diameter, shackle size; null otherwise. */
export function sizeMmOf(category: ListingCategory, specs: Specs): number | null {
  switch (category) {
    case 'chain':
    case 'windlass': {
      const inch = n(specs.tradeSizeIn);
      return inch !== undefined ? inch * MM_PER_IN : (n(specs.nominalMm) ?? null);
    }
    case 'rode':
    case 'snubber':
      return n(specs.diameterMm) ?? null;
    case 'connector': {
      const inch = n(specs.nominalIn);
      return inch !== undefined ? inch * MM_PER_IN : null;
    }
    default:
      return null;
  }
}

/** Why gear sold as spares only is never flagged as fitting a boat. */
export const FOR_PARTS_BASIS =
  'Sold as spares only: not rated for use, so it is never shown as fitting a boat.';

/**
 * The rating "fits my boat" compares, from @app/calc's tables (or the seller's stated WLL for other connectors).
 * Gear sold as spares only has none: its strength is unknown whatever its size.
 */
export function ratingOf(
  category: ListingCategory,
  specs: Specs,
  condition: ListingCondition,
): ListingRating {
  if (condition === 'for-parts') return { kind: 'none', basis: FOR_PARTS_BASIS };
  try {
    if (category === 'chain') {
      const grade = s(specs.grade) as keyof typeof CHAIN_GRADE_LABELS;
      const tradeSizeIn = n(specs.tradeSizeIn);
      const nominalMm = n(specs.nominalMm);
      const spec =
        tradeSizeIn !== undefined
          ? chainSpec({ grade, tradeSizeIn })
          : chainSpecMetric({ grade, nominalMm: nominalMm ?? 0, extrapolate: true });
      return {
        kind: 'wll',
        wllN: spec.wllN,
        basis: `${chainLabel(grade, tradeSizeIn, nominalMm)} working load limit (${tradeSizeIn !== undefined ? '49 CFR 393.108 chain table' : 'metric grade formula'})`,
        gypsy: { grade, ...(tradeSizeIn !== undefined ? { tradeSizeIn } : { nominalMm }) },
      };
    }
    if (category === 'connector') {
      const wllN = n(specs.wllN);
      if (wllN !== undefined)
        return { kind: 'wll', wllN, basis: "the seller's stated working load limit" };
      const nominalIn = n(specs.nominalIn);
      if (s(specs.kind) === 'shackle' && nominalIn !== undefined)
        return {
          kind: 'wll',
          wllN: shackleSpec({ nominalIn }).wllN,
          basis: `${inchFractionLabel(nominalIn)} forged shackle working load limit (RR-C-271 table)`,
        };
      return { kind: 'none', basis: 'No size or rated working load given: check the marking.' };
    }
    if (category === 'rode' || category === 'snubber') {
      const material = s(specs.material) === 'polyester' ? 'polyester' : 'nylon';
      const construction =
        s(specs.construction) === 'double-braid' ? 'double-braid' : 'three-strand';
      const diameterMm = n(specs.diameterMm) ?? 0;
      const spec = ropeSpec({ material, construction, diameterMm, wet: true, extrapolate: true });
      return {
        kind: 'break',
        minBreakN: spec.minBreakN,
        basis: `${diameterMm} mm ${material} ${construction} wet breaking strength (rope tables)`,
      };
    }
    if (category === 'anchor') {
      const anchorType = s(specs.anchorType) as keyof typeof ANCHOR_TYPE_LABELS;
      return { kind: 'anchor', anchorType, massKg: n(specs.massKg) ?? 0 };
    }
  } catch (err) {
    if (!(err instanceof RangeError)) throw err;
  }
  return { kind: 'none', basis: 'This kind of gear has no load rating to compare.' };
}

/** Words the search index holds for the specs: labels, sizes in both unit systems, grade names. */
export function specsText(category: ListingCategory, specs: Specs): string {
  const parts: string[] = [LISTING_CATEGORY_LABELS[category], category];
  const size = sizeMmOf(category, specs);
  if (size !== null) parts.push(`${Math.round(size * 10) / 10} mm`);
  for (const [key, value] of Object.entries(specs)) {
    if (typeof value === 'string') parts.push(value.replace(/-/g, ' '));
    if (key === 'grade' && typeof value === 'string')
      parts.push(
        CHAIN_GRADE_LABELS[value as keyof typeof CHAIN_GRADE_LABELS] ?? '',
        value.replace('G', 'grade '),
      );
    if ((key === 'tradeSizeIn' || key === 'nominalIn') && typeof value === 'number')
      parts.push(inchFractionLabel(value), `${value} in`);
    if (key === 'anchorType' && typeof value === 'string')
      parts.push(ANCHOR_TYPE_LABELS[value as keyof typeof ANCHOR_TYPE_LABELS] ?? '');
    if (key === 'massKg' && typeof value === 'number') parts.push(`${value} kg`);
    if (key === 'lengthM' && typeof value === 'number') parts.push(`${value} m`);
  }
  return parts.filter(Boolean).join(' ');
}
