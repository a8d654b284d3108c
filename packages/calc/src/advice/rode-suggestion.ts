import { CHAIN_SAFETY_FACTOR, NYLON_ANCHORING_FACTOR } from '../constants';
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
import { inchFractionLabel, tradeSizeMm } from '../units/format';
import { KG_PER_LB, MM_PER_IN, N_PER_LBF } from '../units/units';

/** Input of {@link rodeSuggestion}. */
export interface RodeSuggestionInput {
  /** Peak load the rode must carry, N (> 0): the table load at max(wind, 42 kn), after any stated credit. */
  loadN: number;
  /** Anchor mass, kg: drives the handbook nylon-diameter rule. */
  anchorKg?: number;
  /** Chain grade to size (default G43). */
  grade?: ChainGrade;
  /** Length overall, m: sets the practice floor on chain size. */
  loaM?: number;
  /** A rope-chain windlass: one rope size up (Boat Mechanical Systems Handbook). */
  ropeChainWindlass?: boolean;
  /** Size the rope on its wet strength (default true). */
  wet?: boolean;
}

/** A chain size that carries the load. */
export interface ChainChoice extends ChainSpecResult {
  grade: ChainGrade;
  tradeSizeIn: number;
  /** Material diameter of that trade size, mm. */
  nominalMm: number;
  /** Whether the load or the practice floor for the boat's length chose the size. */
  governedBy: 'load' | 'practice-floor';
}

/** A nylon rode size. Imperial and metric figures of `sizeIn` are the same rope. */
export interface NylonChoice {
  /** Handbook rule diameter, in (undefined without anchorKg). */
  ruleDiameterIn: number | undefined;
  /** Handbook rule diameter, mm (undefined without anchorKg). */
  ruleDiameterMm: number | undefined;
  /** Standard imperial size chosen, in. */
  sizeIn: number;
  /** The same rope in mm (sizeIn × 25.4, one decimal). */
  sizeMm: number;
  /** The standard metric rope chosen by the same rules, mm (a different rope, for metric buyers). */
  metricMm: number;
  /** Breaking strength of `sizeIn` (wet when asked), N. */
  minBreakN: number;
  /** Its anchoring working limit: wet breaking ÷ 2.25, N. */
  workingLimitN: number;
  governedBy: 'handbook-rule' | 'strength';
}

/** Result of {@link rodeSuggestion}. */
export interface RodeSuggestionResult {
  /** The peak load sized for, N. */
  loadN: number;
  /** Chain: breaking ≥ 3 × load (UFC 4-159-03 Table 3-7), N. */
  requiredChainBreakN: number;
  /** Nylon: wet breaking ≥ 2.25 × load, N. */
  requiredRopeBreakN: number;
  /** Smallest chain of the chosen grade, or null when none in the table carries the load. */
  chain: ChainChoice | null;
  /** Smallest carrying size of every grade (null where none does), before the practice floor. */
  chainByGrade: Array<{ grade: ChainGrade; tradeSizeIn: number | null }>;
  /** The practice floor for the boat's length, in (null without loaM). */
  chainFloorIn: number | null;
  /** Nylon rode, or null when no standard size up to 1 in is enough. */
  nylon: NylonChoice | null;
  basis: string;
  cautions: readonly string[];
  warnings: string[];
}

/**
 * Practice floor on chain size by length (common practice): 1/4 in (about 6–7 mm) under 8 m,
 * 5/16 in (8 mm) to 12.5 m, 3/8 in (10 mm) above; a lighter chain kinks, wears and lifts too easily.
 */
export function chainFloorIn(loaM: number): number {
  if (loaM < 8) return 1 / 4;
  if (loaM <= 12.5) return 5 / 16;
  return 3 / 8;
}

/** Smallest trade size of `grade` with WLL ≥ load and breaking ≥ 3 × load, or null. */
function smallestSize(grade: ChainGrade, loadN: number, atLeastIn = 0): number | null {
  const factor = CHAIN_BREAK_FACTOR[grade];
  for (const row of CHAIN_ROWS) {
    const wllLb = row.wllLb[grade];
    if (wllLb === undefined || row.tradeSizeIn < atLeastIn - 1e-9) continue;
    const wllN = wllLb * N_PER_LBF;
    if (wllN >= loadN && wllN * factor >= CHAIN_SAFETY_FACTOR * loadN) return row.tradeSizeIn;
  }
  return null;
}

function chainChoice(grade: ChainGrade, loadN: number, floorIn: number): ChainChoice | null {
  const byLoad = smallestSize(grade, loadN);
  if (byLoad === null) return null;
  const tradeSizeIn =
    byLoad >= floorIn - 1e-9 ? byLoad : (smallestSize(grade, 0, floorIn) ?? byLoad);
  const spec = chainSpec({ grade, tradeSizeIn });
  const row = CHAIN_ROWS.find((r) => Math.abs(r.tradeSizeIn - tradeSizeIn) < 1e-9);
  return {
    ...spec,
    grade,
    tradeSizeIn,
    nominalMm: row?.materialMm ?? tradeSizeIn * MM_PER_IN,
    governedBy: tradeSizeIn > byLoad + 1e-9 ? 'practice-floor' : 'load',
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
  'Wet nylon is weaker than dry: we take 15 % off (UFC 4-159-03); the Boat Mechanical Systems Handbook allows for about half.',
);

/**
 * Chain and nylon for a peak load. Chain: the smallest trade size of the grade with WLL ≥ load
 * and breaking ≥ 3 × load (UFC 4-159-03 Table 3-7 for new chain in straight runs, seen; 49 CFR
 * 393.108 table), never below the practice floor for the boat's length. Nylon three-strand: the
 * larger of the handbook rule d(in) = 0.2 + anchor lb ÷ 185, metric d(mm) = 5.08 + anchor kg ÷ 3.3
 * (Boat Mechanical Systems Handbook, seen) and the smallest size whose wet breaking strength
 * (less 15 %, UFC) is at least 2.25 × the load; one size up for a rope-chain windlass.
 */
export function rodeSuggestion(input: RodeSuggestionInput): RodeSuggestionResult {
  const raw = requireObject(input, '');
  const loadN = requireNumber(raw.loadN, 'loadN', 0, Infinity, 'min');
  const grade = requireOneOf(raw.grade ?? 'G43', 'grade', CHAIN_GRADES);
  const windlass = optionalBoolean(raw.ropeChainWindlass, 'ropeChainWindlass', false);
  const wet = optionalBoolean(raw.wet, 'wet', true);
  const loaM =
    raw.loaM === undefined ? undefined : optionalNumber(raw.loaM, 'loaM', 0, 0, 200, 'min');
  const anchorKg =
    raw.anchorKg === undefined
      ? undefined
      : requireNumber(raw.anchorKg, 'anchorKg', 0, 1000, 'min');
  const floorIn = loaM === undefined ? null : chainFloorIn(loaM);
  const requiredRopeBreakN = loadN * NYLON_ANCHORING_FACTOR;
  const warnings: string[] = [];
  const chain = chainChoice(grade, loadN, floorIn ?? 0);
  if (chain === null) {
    warnings.push(
      `No ${CHAIN_GRADE_LABELS[grade]} chain up to 5/8 in has a working load limit of this load: choose a higher grade or ask a rigger.`,
    );
  }
  const chainByGrade = CHAIN_GRADES.map((g) => ({ grade: g, tradeSizeIn: smallestSize(g, loadN) }));
  const nylon = nylonChoice(anchorKg, requiredRopeBreakN, windlass, wet);
  if (nylon === null) {
    warnings.push(
      'No nylon up to 1 in meets this load: use two rodes to two anchors, or ask a rigger about larger line.',
    );
  }
  return {
    loadN,
    requiredChainBreakN: loadN * CHAIN_SAFETY_FACTOR,
    requiredRopeBreakN,
    chain,
    chainByGrade,
    chainFloorIn: floorIn,
    nylon,
    basis:
      `Chain: the smallest ${CHAIN_GRADE_LABELS[grade]} size whose working load limit carries the load, which also gives at least ${CHAIN_SAFETY_FACTOR} × the load in breaking strength ` +
      `(the factor UFC 4-159-03 Table 3-7 asks of new chain, seen; 49 CFR 393.108 table)` +
      (floorIn === null
        ? '. '
        : `, and not below ${inchFractionLabel(floorIn)} for this length (common practice: lighter chain kinks, wears and lifts too easily). `) +
      `Nylon three-strand: the larger of the handbook rule 0.2 in + anchor lb ÷ 185 (Boat Mechanical Systems Handbook, seen) and the smallest size whose ${wet ? 'wet ' : ''}breaking strength is at least ${NYLON_ANCHORING_FACTOR} × the load ` +
      `(Rodewise's anchoring factor, common practice; wet nylon taken 15 % weaker, UFC 4-159-03)` +
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
  const metricMm = ROPE_DIAMETERS_MM[mmIndex + step];
  if (inIndex < 0 || mmIndex < 0 || sizeIn === undefined || metricMm === undefined) return null;
  const { minBreakN } = ropeStrength('nylon', 'three-strand', sizeIn * MM_PER_IN, wet);
  const wetBreakN = ropeStrength('nylon', 'three-strand', sizeIn * MM_PER_IN, true).minBreakN;
  const ruleOnly =
    ruleDiameterIn === undefined
      ? -1
      : pickRope(SIZES_IN_AS_MM, ruleDiameterIn * MM_PER_IN, 0, wet);
  return {
    ruleDiameterIn,
    ruleDiameterMm,
    sizeIn,
    sizeMm: tradeSizeMm(sizeIn),
    metricMm,
    minBreakN,
    workingLimitN: wetBreakN / NYLON_ANCHORING_FACTOR,
    governedBy: ruleOnly === inIndex ? 'handbook-rule' : 'strength',
  };
}

/** Label of a nylon choice, e.g. "1/2 in (12.7 mm)": one rope in both units. */
export function nylonChoiceLabel(choice: NylonChoice): string {
  return `${inchFractionLabel(choice.sizeIn)} (${choice.sizeMm} mm)`;
}
