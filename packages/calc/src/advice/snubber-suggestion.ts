import { DEFAULT_DESIGN_FACTOR } from '../constants';
import { cautionList } from '../cautions';
import { interpolateLinear } from '../internal/interpolate';
import {
  optionalBoolean,
  optionalNumber,
  requireNumber,
  requireObject,
  requireOneOf,
} from '../internal/validate';
import { ropeStrength } from '../ratings/rope-spec';
import {
  DOUBLE_BRAID_STRAIN_FACTOR,
  NYLON_THREE_STRAND_STRAIN,
  SNUBBER_HEAVY_WEATHER_M,
  SNUBBER_TARGET_STRETCH_M,
} from '../tables/nylon-stretch';
import { ROPE_CONSTRUCTIONS, ROPE_DIAMETERS_IN, type RopeConstruction } from '../tables/rope-nylon';
import { MM_PER_IN } from '../units/units';

/** Input of {@link snubberSuggestion}. */
export interface SnubberSuggestionInput {
  /** Working load the snubber must take, N (> 0). */
  loadN: number;
  /** Nylon construction (default three-strand, which stretches most). */
  construction?: RopeConstruction;
  /** Size on wet strength (default true). */
  wet?: boolean;
  /** Wet breaking strength ÷ load required (default 4). */
  designFactor?: number;
  /** Stretch wanted under the load, m (default 1.37 m = 4.5 ft). */
  targetStretchM?: number;
}

/** Result of {@link snubberSuggestion}. */
export interface SnubberSuggestionResult {
  /** Standard nylon size, in. */
  sizeIn: number;
  /** The same size in mm. */
  diameterMm: number;
  /** Suggested length, m (kept between 3.05 m and 12.2 m). */
  lengthM: number;
  /** Load ÷ (wet) breaking strength. */
  loadFraction: number;
  /** Strain at the load (from memory curve). */
  strain: number;
  /** Stretch of `lengthM` under the load, m. */
  stretchM: number;
  minBreakN: number;
  basis: string;
  cautions: readonly string[];
  warnings: string[];
}

const STRAIN_X = NYLON_THREE_STRAND_STRAIN.map((p) => p[0]);
const STRAIN_Y = NYLON_THREE_STRAND_STRAIN.map((p) => p[1]);
const MIN_LENGTH_M = SNUBBER_HEAVY_WEATHER_M / 2;
const MAX_LENGTH_M = SNUBBER_HEAVY_WEATHER_M * 2;

const SNUBBER_CAUTIONS = cautionList(
  'Leave the chain slack behind the snubber and made fast, so the chain takes over if the snubber parts.',
  'Protect the snubber from chafe at the fairlead; a stretching line chafes fast.',
  'Polyester and other low-stretch lines do not make good snubbers.',
);

/** Strain of nylon at a load fraction of breaking, from the from-memory curve (≤ 1). */
export function nylonStrain(
  loadFraction: number,
  construction: RopeConstruction = 'three-strand',
): number {
  const f = Math.min(Math.max(loadFraction, 0), 1);
  const strain = interpolateLinear(STRAIN_X, STRAIN_Y, f);
  return construction === 'double-braid' ? strain * DOUBLE_BRAID_STRAIN_FACTOR : strain;
}

/**
 * A nylon snubber that stretches under the working load: the smallest standard line whose
 * (wet) breaking strength ≥ design factor × load (“the smallest line that takes the load so
 * that it stretches”, cruising-seamanship texts, seen); length = target stretch ÷ strain at
 * that load (strain curve from memory), kept between half and twice the 20 ft heavy-weather
 * snubber (seen).
 */
export function snubberSuggestion(input: SnubberSuggestionInput): SnubberSuggestionResult {
  const raw = requireObject(input, '');
  const loadN = requireNumber(raw.loadN, 'loadN', 0, Infinity, 'min');
  const construction = requireOneOf(
    raw.construction ?? 'three-strand',
    'construction',
    ROPE_CONSTRUCTIONS,
  );
  const wet = optionalBoolean(raw.wet, 'wet', true);
  const designFactor = optionalNumber(
    raw.designFactor,
    'designFactor',
    DEFAULT_DESIGN_FACTOR,
    1,
    20,
  );
  const target = optionalNumber(
    raw.targetStretchM,
    'targetStretchM',
    SNUBBER_TARGET_STRETCH_M,
    0.1,
    5,
  );
  const warnings: string[] = [];
  let chosen: { sizeIn: number; minBreakN: number } | undefined;
  for (const sizeIn of ROPE_DIAMETERS_IN) {
    const { minBreakN } = ropeStrength('nylon', construction, sizeIn * MM_PER_IN, wet);
    chosen = { sizeIn, minBreakN };
    if (minBreakN >= loadN * designFactor) break;
  }
  if (chosen === undefined) throw new RangeError('rope diameter list is empty');
  if (chosen.minBreakN < loadN * designFactor) {
    warnings.push(
      'Even 1 in nylon is below the design factor at this load: use a bridle of two snubbers or ask a rigger.',
    );
  }
  const loadFraction = loadN / chosen.minBreakN;
  const strain = nylonStrain(loadFraction, construction);
  const ideal = strain > 0 ? target / strain : MAX_LENGTH_M;
  const lengthM = Math.min(Math.max(ideal, MIN_LENGTH_M), MAX_LENGTH_M);
  if (ideal > MAX_LENGTH_M) {
    warnings.push(
      'At this light load even the smallest line barely stretches; the snubber is capped at 12.2 m (40 ft).',
    );
  }
  return {
    sizeIn: chosen.sizeIn,
    diameterMm: chosen.sizeIn * MM_PER_IN,
    lengthM,
    loadFraction,
    strain,
    stretchM: lengthM * strain,
    minBreakN: chosen.minBreakN,
    basis:
      `Smallest nylon ${construction} line whose ${wet ? 'wet ' : ''}breaking strength is at least ${designFactor} × the load, so that it still stretches; ` +
      'length = wanted stretch (4–5 ft for a 20 ft heavy-weather snubber, seen) ÷ the strain at that load (nylon stretch curve from memory, approximate), ' +
      'kept between 10 and 40 ft.',
    cautions: SNUBBER_CAUTIONS,
    warnings,
  };
}
