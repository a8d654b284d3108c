import { CalcInputError } from '../errors';
import { indexOfClose } from '../internal/interpolate';
import { optionalBoolean, requireNumber, requireObject, requireOneOf } from '../internal/validate';
import { cautionList } from '../cautions';
import {
  CHAIN_BREAK_FACTOR,
  CHAIN_BREAK_FACTOR_MARK,
  CHAIN_GRADE_LABELS,
  CHAIN_GRADE_NUMBER,
  CHAIN_GRADES,
  CHAIN_MASS_COEFF_KGPM_PER_MM2,
  CHAIN_ROWS,
  CHAIN_TRADE_SIZES_IN,
  type ChainGrade,
} from '../tables/chain-cfr';
import { inchFractionLabel } from '../units/format';
import { N_PER_LBF } from '../units/units';

/** Input of {@link chainSpec}. */
export interface ChainSpecInput {
  grade: ChainGrade;
  /** Trade size, inches; must be a row of the 49 CFR 393.108 table for that grade. */
  tradeSizeIn: number;
}

/** Input of {@link chainSpecMetric}. */
export interface ChainSpecMetricInput {
  grade: ChainGrade;
  /** Nominal material diameter, mm; 7–16 mm unless `extrapolate` (then 4–26 mm). */
  nominalMm: number;
  extrapolate?: boolean;
}

/** Ratings of a chain. */
export interface ChainSpecResult {
  /** Working load limit, N. */
  wllN: number;
  /** Minimum breaking load, N. */
  minBreakN: number;
  /** Mass in air, kg/m (approximate, ±10 %). */
  kgPerM: number;
  /** True when a metric size lies outside 7–16 mm. */
  extrapolated: boolean;
  basis: string;
  cautions: readonly string[];
}

const ROW_SIZES_IN: readonly number[] = CHAIN_ROWS.map((r) => r.tradeSizeIn);
const METRIC_MIN_MM = 7;
const METRIC_MAX_MM = 16;

/**
 * Ratings of welded steel chain by grade and trade size: WLL from the 49 CFR 393.108 table
 * (seen), minimum breaking load = WLL × grade factor (G30 4, G43 3 per the Boat Mechanical Systems Handbook, seen; G70–G100
 * 4 per NACM, from memory), mass per metre approximate. Sizes not in the table throw.
 */
export function chainSpec(input: ChainSpecInput): ChainSpecResult {
  const raw = requireObject(input, '');
  const grade = requireOneOf(raw.grade, 'grade', CHAIN_GRADES);
  const size = requireNumber(raw.tradeSizeIn, 'tradeSizeIn', 0, Infinity, 'min');
  const row = CHAIN_ROWS[indexOfClose(ROW_SIZES_IN, size)];
  const wllLb = row?.wllLb[grade];
  if (row === undefined || wllLb === undefined) {
    const sizes = CHAIN_TRADE_SIZES_IN[grade].map(inchFractionLabel).join(', ');
    throw new CalcInputError(
      'tradeSizeIn',
      `tradeSizeIn must be a ${grade} size in the chain table: ${sizes}`,
    );
  }
  const factor = CHAIN_BREAK_FACTOR[grade];
  const wllN = wllLb * N_PER_LBF;
  return {
    wllN,
    minBreakN: wllN * factor,
    kgPerM: row.kgPerM,
    extrapolated: false,
    basis:
      `${CHAIN_GRADE_LABELS[grade]} ${inchFractionLabel(size)}: working load limit from the 49 CFR 393.108 chain table (seen); ` +
      `breaking load = ${factor} × WLL (${CHAIN_BREAK_FACTOR_MARK[grade]}); mass ${row.massMark}, ±10 %.`,
    cautions: chainCautions(),
  };
}

/**
 * Ratings of metric chain by grade and nominal diameter d (mm): minimum breaking force =
 * grade number × 10 N/mm² × 2 × π d²/4 (ISO/EN grade convention, from memory); WLL = that ÷
 * the grade's breaking factor; mass ≈ 0.0235 × d² kg/m (fitted to from-memory masses).
 */
export function chainSpecMetric(input: ChainSpecMetricInput): ChainSpecResult {
  const raw = requireObject(input, '');
  const grade = requireOneOf(raw.grade, 'grade', CHAIN_GRADES);
  const extrapolate = optionalBoolean(raw.extrapolate, 'extrapolate', false);
  const d = requireNumber(
    raw.nominalMm,
    'nominalMm',
    extrapolate ? 4 : METRIC_MIN_MM,
    extrapolate ? 26 : METRIC_MAX_MM,
    'none',
    extrapolate
      ? 'mm'
      : 'mm (7–16 mm, the range checked against the CFR table) unless extrapolate is true',
  );
  const factor = CHAIN_BREAK_FACTOR[grade];
  const minBreakN = CHAIN_GRADE_NUMBER[grade] * 10 * 2 * ((Math.PI * d * d) / 4);
  const extrapolated = d < METRIC_MIN_MM || d > METRIC_MAX_MM;
  return {
    wllN: minBreakN / factor,
    minBreakN,
    kgPerM: CHAIN_MASS_COEFF_KGPM_PER_MM2 * d * d,
    extrapolated,
    basis:
      `${CHAIN_GRADE_LABELS[grade]} ${d} mm: breaking force = ${CHAIN_GRADE_NUMBER[grade] * 10} N/mm² × 2 × π d²/4 ` +
      `(ISO/EN grade convention, from memory); WLL = breaking force ÷ ${factor}; mass ≈ 0.0235 d² kg/m (approximate).` +
      (extrapolated ? ' This size is outside 7–16 mm and is extrapolated.' : ''),
    cautions: chainCautions(),
  };
}

const CHAIN_CAUTIONS = cautionList(
  'Unmarked chain counts as grade 30 proof coil (49 CFR 393.108); check the grade stamp on the links.',
  'Check that the chain fits your windlass gypsy: pitch matters as much as size.',
);

function chainCautions(): readonly string[] {
  return CHAIN_CAUTIONS;
}
