import { interpolateLinear } from '../internal/interpolate';
import {
  optionalBoolean,
  optionalNumber,
  requireNumber,
  requireObject,
  requireOneOf,
} from '../internal/validate';
import { cautionList } from '../cautions';
import {
  NYLON_DOUBLE_BRAID_WLL,
  NYLON_THREE_STRAND_MBS,
  NYLON_THREE_STRAND_WLL,
  NYLON_WET_LOSS_DEFAULT,
  POLYESTER_STRENGTH_FRACTION,
  POLYESTER_TIE_DOWN_FACTOR,
  ROPE_CONSTRUCTIONS,
  ROPE_MATERIALS,
  type RopeConstruction,
  type RopeMaterial,
  type RopePoint,
} from '../tables/rope-nylon';
import { MM_PER_IN, N_PER_LBF } from '../units/units';
import { NYLON_ANCHORING_FACTOR } from '../constants';

/** Input of {@link ropeSpec}. */
export interface RopeSpecInput {
  material: RopeMaterial;
  construction: RopeConstruction;
  /** Diameter, mm; 9.5–25.5 mm (3/8–1 in, the tables) unless `extrapolate` (4–40 mm). */
  diameterMm: number;
  /** Wet line: nylon loses strength when wet; polyester about none. */
  wet?: boolean;
  /** Strength lost by wet nylon, 0–0.6; default 0.15 (UFC 4-159-03; the Boat Mechanical Systems Handbook says about half). */
  wetLossFraction?: number;
  /** When given, wllN = minBreakN ÷ designFactor instead of the anchoring limit. */
  designFactor?: number;
  extrapolate?: boolean;
}

/** Ratings of a rope. */
export interface RopeSpecResult {
  /** Minimum breaking strength, N (after the wet loss when `wet`). */
  minBreakN: number;
  /**
   * Working limit used for anchoring checks, N: the wet breaking strength ÷ 2.25
   * (NYLON_ANCHORING_FACTOR), or minBreak ÷ designFactor when one is given.
   */
  wllN: number;
  /** The cargo tie-down WLL, N (49 CFR 393.108 for nylon; derived for polyester): shown as a cargo rating only. */
  tieDownWllN: number;
  wllBasis: 'anchoring' | 'design-factor';
  extrapolated: boolean;
  basis: string;
  cautions: readonly string[];
}

const MIN_MM = 9.5;
const MAX_MM = 25.5;

function perArea(points: readonly RopePoint[]): { xs: number[]; ks: number[] } {
  return {
    xs: points.map((p) => p.diameterIn),
    ks: points.map((p) => p.lbf / (p.diameterIn * p.diameterIn)),
  };
}

const MBS_3S = perArea(NYLON_THREE_STRAND_MBS);
const WLL_3S = perArea(NYLON_THREE_STRAND_WLL);
const WLL_DB = perArea(NYLON_DOUBLE_BRAID_WLL);

/** lbf at diameter d (in): strength per d² interpolated between rows, held at the ends. */
function byArea(table: { xs: number[]; ks: number[] }, dIn: number): number {
  const first = table.xs[0] ?? 0;
  const last = table.xs[table.xs.length - 1] ?? 0;
  const clamped = Math.min(Math.max(dIn, first), last);
  return interpolateLinear(table.xs, table.ks, clamped) * dIn * dIn;
}

/**
 * The numbers of {@link ropeSpec} without validation, basis or cautions, for sizing loops:
 * breaking strength (wet when asked) and tie-down WLL, N. Same formulas as ropeSpec.
 */
export function ropeStrength(
  material: RopeMaterial,
  construction: RopeConstruction,
  diameterMm: number,
  wet: boolean,
  wetLoss: number = NYLON_WET_LOSS_DEFAULT,
): { minBreakN: number; tieDownWllN: number } {
  const dIn = diameterMm / MM_PER_IN;
  const wll3s = byArea(WLL_3S, dIn);
  const braidRatio = construction === 'double-braid' ? byArea(WLL_DB, dIn) / wll3s : 1;
  const nylonDryLbf = byArea(MBS_3S, dIn) * braidRatio;
  const dryLbf = material === 'nylon' ? nylonDryLbf : nylonDryLbf * POLYESTER_STRENGTH_FRACTION;
  const wetFactor = wet && material === 'nylon' ? 1 - wetLoss : 1;
  const tieDownLbf = material === 'nylon' ? wll3s * braidRatio : dryLbf / POLYESTER_TIE_DOWN_FACTOR;
  return { minBreakN: dryLbf * wetFactor * N_PER_LBF, tieDownWllN: tieDownLbf * N_PER_LBF };
}

/**
 * Ratings of nylon or polyester rope by diameter. Nylon three-strand breaking strength from
 * general engineering tables (seen), interpolated as strength per d²; double braid = that ×
 * the ratio of the CFR double-braid to three-strand tie-down limits (derived); polyester =
 * 0.9 × nylon (from memory). Wet nylon loses `wetLossFraction` (default 15 %, UFC; the Boat Mechanical Systems Handbook says
 * about half). wllN is the anchoring limit, wet breaking ÷ 2.25, unless `designFactor` is
 * given; the 49 CFR 393.108 tie-down limit (seen, a cargo rating with a design factor of about
 * 9–12) is returned as tieDownWllN for reference.
 */
export function ropeSpec(input: RopeSpecInput): RopeSpecResult {
  const raw = requireObject(input, '');
  const material = requireOneOf(raw.material, 'material', ROPE_MATERIALS);
  const construction = requireOneOf(raw.construction, 'construction', ROPE_CONSTRUCTIONS);
  const extrapolate = optionalBoolean(raw.extrapolate, 'extrapolate', false);
  const diameterMm = requireNumber(
    raw.diameterMm,
    'diameterMm',
    extrapolate ? 4 : MIN_MM,
    extrapolate ? 40 : MAX_MM,
    'none',
    extrapolate ? 'mm' : 'mm (3/8–1 in, the rope tables) unless extrapolate is true',
  );
  const wet = optionalBoolean(raw.wet, 'wet', false);
  const wetLoss = optionalNumber(
    raw.wetLossFraction,
    'wetLossFraction',
    NYLON_WET_LOSS_DEFAULT,
    0,
    0.6,
  );
  const designFactor =
    raw.designFactor === undefined
      ? undefined
      : requireNumber(raw.designFactor, 'designFactor', 1, 20);
  const braid = construction === 'double-braid';
  const { minBreakN, tieDownWllN } = ropeStrength(material, construction, diameterMm, wet, wetLoss);
  const wetBreakN = wet
    ? minBreakN
    : ropeStrength(material, construction, diameterMm, true, wetLoss).minBreakN;
  const extrapolated = diameterMm < MIN_MM || diameterMm > MAX_MM;
  return {
    minBreakN,
    wllN:
      designFactor === undefined ? wetBreakN / NYLON_ANCHORING_FACTOR : minBreakN / designFactor,
    tieDownWllN,
    wllBasis: designFactor === undefined ? 'anchoring' : 'design-factor',
    extrapolated,
    basis: describe(material, braid, wet, wetLoss, designFactor, extrapolated),
    cautions: ropeCautions(material, wet),
  };
}

function describe(
  material: RopeMaterial,
  braid: boolean,
  wet: boolean,
  wetLoss: number,
  designFactor: number | undefined,
  extrapolated: boolean,
): string {
  const strength = braid
    ? 'Breaking strength of nylon three-strand from engineering tables (seen) × the ratio of the 49 CFR double-braid to three-strand limits (derived)'
    : 'Breaking strength of nylon three-strand from engineering tables (seen)';
  const fibre =
    material === 'polyester' ? ', taken as 0.9 × nylon for polyester (from memory)' : '';
  const water =
    wet && material === 'nylon'
      ? `, less ${Math.round(wetLoss * 100)} % for wet nylon (UFC 4-159-03 says about 15 %, the Boat Mechanical Systems Handbook about half)`
      : '';
  const wll =
    designFactor === undefined
      ? ` Working limit for anchoring: the ${material === 'nylon' ? 'wet ' : ''}breaking strength ÷ ${NYLON_ANCHORING_FACTOR} (Rodewise's anchoring factor, common practice). ` +
        (material === 'nylon'
          ? 'The 49 CFR 393.108 tie-down limit (seen, about a ninth to a twelfth of breaking) is a cargo rating and is shown for reference only.'
          : 'Its cargo tie-down rating (breaking ÷ 12, derived) is shown for reference only.')
      : ` Working load limit: breaking ÷ ${designFactor}, the chosen design factor.`;
  const beyond = extrapolated
    ? ' This diameter is outside 3/8–1 in and is extrapolated with d².'
    : '';
  return `${strength}${fibre}${water}.${wll}${beyond}`;
}

const CHAFE =
  'Chafe at the bow roller or fairlead can cut a rope rode in hours: protect it and inspect it.';
const KNOTS = 'Knots roughly halve a rope’s strength; a well-made eye splice keeps most of it.';
const ROPE_CAUTIONS = cautionList(CHAFE, KNOTS);
const DRY_NYLON_CAUTIONS = cautionList(
  CHAFE,
  KNOTS,
  'Nylon is weaker wet; these figures are dry. Sources differ on how much (15 % to half).',
);

function ropeCautions(material: RopeMaterial, wet: boolean): readonly string[] {
  return material === 'nylon' && !wet ? DRY_NYLON_CAUTIONS : ROPE_CAUTIONS;
}
