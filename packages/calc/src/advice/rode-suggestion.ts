import { DEFAULT_DESIGN_FACTOR } from '../constants';
import { cautionList } from '../cautions';
import {
  optionalBoolean,
  optionalNumber,
  requireNumber,
  requireObject,
  requireOneOf,
} from '../internal/validate';
import { chainSpec, type ChainSpecResult } from '../ratings/chain-spec';
import { ropeStrength } from '../ratings/rope-spec';
import {
  CHAIN_BREAK_FACTOR,
  CHAIN_GRADE_LABELS,
  CHAIN_GRADES,
  CHAIN_ROWS,
  type ChainGrade,
} from '../tables/chain-cfr';
import { ROPE_DIAMETERS_IN, ROPE_DIAMETERS_MM } from '../tables/rope-nylon';
import { inchFractionLabel } from '../units/format';
import { KG_PER_LB, MM_PER_IN, N_PER_LBF } from '../units/units';

/** Input of {@link rodeSuggestion}. */
export interface RodeSuggestionInput {
  /** Design load, N (> 0). */
  loadN: number;
  /** Anchor mass, kg: drives the handbook nylon-diameter rule. */
  anchorKg?: number;
  /** Chain grade to size (default G43). */
  grade?: ChainGrade;
  /** Breaking strength ÷ load required (default 4). */
  designFactor?: number;
  /** A rope-chain windlass: one rope size up (Boat Mechanical Systems Handbook). */
  ropeChainWindlass?: boolean;
  /** Size the rope on its wet strength (default true). */
  wet?: boolean;
}

/** A chain size that carries the load. */
export interface ChainChoice extends ChainSpecResult {
  grade: ChainGrade;
  tradeSizeIn: number;
}

/** A nylon rode size. */
export interface NylonChoice {
  /** Handbook rule diameter, in (undefined without anchorKg). */
  ruleDiameterIn: number | undefined;
  /** Handbook rule diameter, mm (undefined without anchorKg). */
  ruleDiameterMm: number | undefined;
  /** Standard imperial size chosen, in. */
  sizeIn: number;
  /** Standard metric size chosen, mm. */
  sizeMm: number;
  /** Breaking strength of `sizeIn` (wet when asked), N. */
  minBreakN: number;
  governedBy: 'handbook-rule' | 'strength';
}

/** Result of {@link rodeSuggestion}. */
export interface RodeSuggestionResult {
  designFactor: number;
  /** load × designFactor, N. */
  requiredBreakN: number;
  /** Smallest chain of the chosen grade, or null when none in the table carries the load. */
  chain: ChainChoice | null;
  /** Smallest carrying size of every grade (null where none does). */
  chainByGrade: Array<{ grade: ChainGrade; tradeSizeIn: number | null }>;
  /** Nylon rode, or null when no standard size up to 1 in is enough. */
  nylon: NylonChoice | null;
  basis: string;
  cautions: readonly string[];
  warnings: string[];
}

/** Smallest trade size of `grade` with WLL ≥ load and breaking ≥ required, or null. */
function smallestSize(grade: ChainGrade, loadN: number, requiredBreakN: number): number | null {
  const factor = CHAIN_BREAK_FACTOR[grade];
  for (const row of CHAIN_ROWS) {
    const wllLb = row.wllLb[grade];
    if (wllLb === undefined) continue;
    const wllN = wllLb * N_PER_LBF;
    if (wllN >= loadN && wllN * factor >= requiredBreakN) return row.tradeSizeIn;
  }
  return null;
}

function smallestChain(
  grade: ChainGrade,
  loadN: number,
  requiredBreakN: number,
): ChainChoice | null {
  const tradeSizeIn = smallestSize(grade, loadN, requiredBreakN);
  if (tradeSizeIn === null) return null;
  const spec = chainSpec({ grade, tradeSizeIn });
  return {
    wllN: spec.wllN,
    minBreakN: spec.minBreakN,
    kgPerM: spec.kgPerM,
    extrapolated: spec.extrapolated,
    basis: spec.basis,
    cautions: spec.cautions,
    grade,
    tradeSizeIn,
  };
}

/**
 * The handbook rounds its rule to the nearest size (0.394 in → 3/8 in), so a standard size up
 * to 5 % under the rule diameter is accepted.
 */
const RULE_TOLERANCE = 0.95;

/** Index of the smallest size ≥ 0.95 × `neededMm` whose breaking strength meets `requiredBreakN`. */
function pickRope(
  sizesMm: readonly number[],
  neededMm: number,
  requiredBreakN: number,
  wet: boolean,
): number {
  for (let i = 0; i < sizesMm.length; i += 1) {
    const d = sizesMm[i] ?? 0;
    if (d < neededMm * RULE_TOLERANCE) continue;
    if (ropeStrength('nylon', 'three-strand', d, wet).minBreakN >= requiredBreakN) return i;
  }
  return -1;
}

const SIZES_IN_AS_MM = ROPE_DIAMETERS_IN.map((d) => d * MM_PER_IN);

const RODE_CAUTIONS = cautionList(
  'Match chain to the windlass gypsy and the shackles to the chain (shackle WLL at least the chain’s).',
);

/**
 * Chain and nylon for a design load. Chain: the smallest trade size of the grade with WLL ≥
 * load and breaking ≥ load × design factor (49 CFR 393.108 table). Nylon three-strand: the
 * larger of the handbook rule d(in) = 0.2 + anchor lb ÷ 185, metric d(mm) = 5.08 + anchor kg
 * ÷ 3.3 (Boat Mechanical Systems Handbook, seen) and the smallest size whose (wet) breaking strength ≥ load × design
 * factor; one size up for a rope-chain windlass (Boat Mechanical Systems Handbook, seen).
 */
export function rodeSuggestion(input: RodeSuggestionInput): RodeSuggestionResult {
  const raw = requireObject(input, '');
  const loadN = requireNumber(raw.loadN, 'loadN', 0, Infinity, 'min');
  const grade = requireOneOf(raw.grade ?? 'G43', 'grade', CHAIN_GRADES);
  const designFactor = optionalNumber(
    raw.designFactor,
    'designFactor',
    DEFAULT_DESIGN_FACTOR,
    1,
    20,
  );
  const windlass = optionalBoolean(raw.ropeChainWindlass, 'ropeChainWindlass', false);
  const wet = optionalBoolean(raw.wet, 'wet', true);
  const anchorKg =
    raw.anchorKg === undefined
      ? undefined
      : requireNumber(raw.anchorKg, 'anchorKg', 0, 1000, 'min');
  const requiredBreakN = loadN * designFactor;
  const warnings: string[] = [];
  const chain = smallestChain(grade, loadN, requiredBreakN);
  if (chain === null) {
    warnings.push(
      `No ${CHAIN_GRADE_LABELS[grade]} chain up to 5/8 in carries this load with a design factor of ${designFactor}.`,
    );
  }
  const chainByGrade = CHAIN_GRADES.map((g) => ({
    grade: g,
    tradeSizeIn: smallestSize(g, loadN, requiredBreakN),
  }));
  const nylon = nylonChoice(anchorKg, requiredBreakN, windlass, wet);
  if (nylon === null) {
    warnings.push(
      'No nylon up to 1 in meets this load and rule: ask a rigger about larger line or an all-chain rode.',
    );
  }
  return {
    designFactor,
    requiredBreakN,
    chain,
    chainByGrade,
    nylon,
    basis:
      `Chain: smallest ${CHAIN_GRADE_LABELS[grade]} size with working load limit ≥ the load and breaking strength ≥ ${designFactor} × the load (49 CFR 393.108 table). ` +
      `Nylon three-strand: the larger of the handbook rule 0.2 in + anchor lb ÷ 185 (Boat Mechanical Systems Handbook, seen) and the smallest size whose ${wet ? 'wet ' : ''}breaking strength is ≥ ${designFactor} × the load` +
      (windlass
        ? ', then one size up for the rope-chain windlass (Boat Mechanical Systems Handbook).'
        : '.'),
    cautions: RODE_CAUTIONS,
    warnings,
  };
}

function nylonChoice(
  anchorKg: number | undefined,
  requiredBreakN: number,
  windlass: boolean,
  wet: boolean,
): NylonChoice | null {
  const ruleDiameterIn = anchorKg === undefined ? undefined : 0.2 + anchorKg / KG_PER_LB / 185;
  const ruleDiameterMm = anchorKg === undefined ? undefined : 5.08 + anchorKg / 3.3;
  const step = windlass ? 1 : 0;
  const inIndex = pickRope(SIZES_IN_AS_MM, (ruleDiameterIn ?? 0) * MM_PER_IN, requiredBreakN, wet);
  const mmIndex = pickRope(ROPE_DIAMETERS_MM, ruleDiameterMm ?? 0, requiredBreakN, wet);
  const sizeIn = ROPE_DIAMETERS_IN[inIndex + step];
  const sizeMm = ROPE_DIAMETERS_MM[mmIndex + step];
  if (inIndex < 0 || mmIndex < 0 || sizeIn === undefined || sizeMm === undefined) return null;
  const { minBreakN } = ropeStrength('nylon', 'three-strand', sizeIn * MM_PER_IN, wet);
  const ruleOnly =
    ruleDiameterIn === undefined
      ? -1
      : pickRope(SIZES_IN_AS_MM, ruleDiameterIn * MM_PER_IN, 0, wet);
  const ruleGoverns = ruleOnly === inIndex;
  return {
    ruleDiameterIn,
    ruleDiameterMm,
    sizeIn,
    sizeMm,
    minBreakN,
    governedBy: ruleGoverns ? 'handbook-rule' : 'strength',
  };
}

/** Label of a nylon choice, e.g. "1/2 in (12 mm)". */
export function nylonChoiceLabel(choice: NylonChoice): string {
  return `${inchFractionLabel(choice.sizeIn)} (${choice.sizeMm} mm)`;
}
