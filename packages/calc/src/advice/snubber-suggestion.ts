import { SNUBBER_WORKING_FACTOR } from '../constants';
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
} from '../tables/nylon-stretch';
import { ROPE_CONSTRUCTIONS, ROPE_DIAMETERS_IN, type RopeConstruction } from '../tables/rope-nylon';
import { MM_PER_IN } from '../units/units';
import { tradeSizeMm } from '../units/format';

/** Input of {@link snubberSuggestion}. */
export interface SnubberSuggestionInput {
  /** Working load the snubber is sized on, N (> 0): the table load at 30 kn. */
  loadN: number;
  /** Length overall, m: sets the length (default: the 20 ft heavy-weather snubber). */
  loaM?: number;
  /** A storm plan: at least the boat's length, and a second snubber or a bridle (default false). */
  storm?: boolean;
  /** Nylon construction (default three-strand, which stretches most). */
  construction?: RopeConstruction;
  /** Size on wet strength (default true). */
  wet?: boolean;
  /** Wet breaking strength ÷ working load required (default 5). */
  workingFactor?: number;
}

/** Result of {@link snubberSuggestion}. */
export interface SnubberSuggestionResult {
  /** Standard nylon size, in. */
  sizeIn: number;
  /** The same rope in mm. */
  diameterMm: number;
  /** Suggested length, m: at least max(6.1 m, LOA/2), in storms at least LOA. */
  lengthM: number;
  /** Rig two snubbers (or a bridle) rather than one thicker line: storm plans. */
  bridle: boolean;
  /** Working load ÷ (wet) breaking strength. */
  loadFraction: number;
  /** Strain at the working load (from-memory curve). */
  strain: number;
  /** Stretch of `lengthM` under the working load, m. */
  stretchM: number;
  minBreakN: number;
  basis: string;
  cautions: readonly string[];
  warnings: string[];
}

const STRAIN_X = NYLON_THREE_STRAND_STRAIN.map((p) => p[0]);
const STRAIN_Y = NYLON_THREE_STRAND_STRAIN.map((p) => p[1]);

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

const roundUp = (m: number, step: number) => Math.ceil(m / step - 1e-9) * step;

/**
 * A nylon snubber sized once, on the working (30 kn) load: the smallest standard line whose
 * wet breaking strength is at least 5 × that load, so it stretches (“the smallest line that
 * takes the load”, cruising-seamanship texts, seen; factor common practice). Length at least
 * max(20 ft, LOA/2) everyday and at least LOA in storms, where two snubbers or a bridle share
 * the load instead of a thicker line (long snubbers of 20 ft or more cut peak loads by 50–70 %,
 * Practical Sailor 2016, seen).
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
  const storm = optionalBoolean(raw.storm, 'storm', false);
  const loaM = optionalNumber(raw.loaM, 'loaM', 0, 0, 200);
  const factor = optionalNumber(raw.workingFactor, 'workingFactor', SNUBBER_WORKING_FACTOR, 1, 20);
  const warnings: string[] = [];
  let chosen: { sizeIn: number; minBreakN: number } | undefined;
  for (const sizeIn of ROPE_DIAMETERS_IN) {
    const { minBreakN } = ropeStrength('nylon', construction, sizeIn * MM_PER_IN, wet);
    chosen = { sizeIn, minBreakN };
    if (minBreakN >= loadN * factor) break;
  }
  if (chosen === undefined) throw new RangeError('rope diameter list is empty');
  if (chosen.minBreakN < loadN * factor) {
    warnings.push(
      'Even 1 in nylon is below the factor at this working load: rig a bridle of two snubbers or ask a rigger.',
    );
  }
  const lengthM = roundUp(Math.max(SNUBBER_HEAVY_WEATHER_M, storm ? loaM : loaM / 2), 0.5);
  const loadFraction = loadN / chosen.minBreakN;
  const strain = nylonStrain(loadFraction, construction);
  return {
    sizeIn: chosen.sizeIn,
    diameterMm: tradeSizeMm(chosen.sizeIn),
    lengthM,
    bridle: storm,
    loadFraction,
    strain,
    stretchM: lengthM * strain,
    minBreakN: chosen.minBreakN,
    basis:
      `Smallest nylon ${construction} line whose ${wet ? 'wet ' : ''}breaking strength is at least ${factor} × the working (30 kn) load, so that it still stretches (common practice); ` +
      `at least ${storm ? 'the boat’s length' : 'max(20 ft, half the boat’s length)'} long, because long snubbers of 20 ft or more cut peak loads by 50–70 % (Practical Sailor, 2016, seen)` +
      (storm ? '; in a storm rig a second snubber or a bridle rather than a thicker line.' : '.'),
    cautions: SNUBBER_CAUTIONS,
    warnings,
  };
}
