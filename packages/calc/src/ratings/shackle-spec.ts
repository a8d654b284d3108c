import { CalcInputError } from '../errors';
import { indexOfClose } from '../internal/interpolate';
import { requireNumber, requireObject } from '../internal/validate';
import { cautionList } from '../cautions';
import { SHACKLE_DESIGN_FACTOR, SHACKLE_ROWS, SHACKLE_SIZES_IN } from '../tables/shackle-rrc';
import { inchFractionLabel } from '../units/format';
import { N_PER_SHORT_TON } from '../units/units';

/** Input of {@link shackleSpec}. */
export interface ShackleSpecInput {
  /** Nominal size, inches; a row of the shackle table (3/16–1 in). */
  nominalIn: number;
}

/** Ratings of a shackle. */
export interface ShackleSpecResult {
  wllN: number;
  minBreakN: number;
  basis: string;
  cautions: readonly string[];
}

const SHACKLE_CAUTIONS = cautionList(
  'Use a rated, forged shackle whose WLL is at least the chain’s (Boat Mechanical Systems Handbook); check the size against the table, not a rule of thumb in sizes.',
  'Mouse (seize) the pin so it cannot work loose.',
);

/**
 * Ratings of a forged screw-pin anchor shackle: WLL from the RR-C-271 table (short tons,
 * from memory; 1/2–3/4 in corroborated), minimum breaking = 5 × WLL (RR-C-271D design
 * factor, seen). Sizes not in the table throw.
 */
export function shackleSpec(input: ShackleSpecInput): ShackleSpecResult {
  const raw = requireObject(input, '');
  const size = requireNumber(raw.nominalIn, 'nominalIn', 0, Infinity, 'min');
  const row = SHACKLE_ROWS[indexOfClose(SHACKLE_SIZES_IN, size)];
  if (row === undefined) {
    const sizes = SHACKLE_SIZES_IN.map(inchFractionLabel).join(', ');
    throw new CalcInputError(
      'nominalIn',
      `nominalIn must be a size in the shackle table: ${sizes}`,
    );
  }
  const wllN = row.wllShortTons * N_PER_SHORT_TON;
  return {
    wllN,
    minBreakN: wllN * SHACKLE_DESIGN_FACTOR,
    basis:
      `${inchFractionLabel(size)} forged screw-pin anchor shackle: WLL ${row.wllShortTons} short tons from the RR-C-271 table ` +
      `(from memory; 1/2–3/4 in corroborated by RR-C-271D, seen); breaking = 5 × WLL (RR-C-271D design factor, seen).`,
    cautions: SHACKLE_CAUTIONS,
  };
}

/** The smallest shackle of the table with a WLL of at least `minWllN`, or null when none is. */
export function shackleForWll(
  minWllN: number,
): { nominalIn: number; wllN: number; minBreakN: number } | null {
  for (const row of SHACKLE_ROWS) {
    const wllN = row.wllShortTons * N_PER_SHORT_TON;
    if (wllN >= minWllN)
      return { nominalIn: row.nominalIn, wllN, minBreakN: wllN * SHACKLE_DESIGN_FACTOR };
  }
  return null;
}
