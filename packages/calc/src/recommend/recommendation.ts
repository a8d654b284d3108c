// The shapes recommendTackle takes and gives, apart from the engine so screens and plans can name them.
import type { AnchorSuggestionResult } from '../advice/anchor-suggestion';
import type { ChainChoice, RodeSuggestionResult } from '../advice/rode-suggestion';
import type { SnubberSuggestionResult } from '../advice/snubber-suggestion';
import type { CatenaryResult } from '../geometry/catenary';
import type { ScopeRung } from '../geometry/scope';
import type { DesignLoadResult } from '../loads/design-load';
import type { HullType } from '../tables/abyc-h40';
import type { AnchorType, BottomType } from '../tables/anchor-holding';
import type { ChainGrade } from '../tables/chain-cfr';

/** Input of `recommendTackle`. */
export interface RecommendTackleInput {
  loaM: number;
  beamM?: number;
  hull: HullType;
  displacementKg?: number;
  /** Bow-roller height above the water, m (default 1). */
  bowHeightM?: number;
  /** Wind to plan for, kn (above 0, at most 100). */
  windKn: number;
  anchorType: AnchorType;
  bottom?: BottomType;
  /** Depth at low water where the boat anchors, m. */
  depthM: number;
  /** Tidal rise (and surge) still to come, m (default 0). */
  tideM?: number;
  /** Chain grade to size (default: the gypsy's, else G43). */
  chainGrade?: ChainGrade;
  /** The windlass gypsy's chain, when the boat has one. */
  gypsy?: { grade: ChainGrade; tradeSizeIn?: number };
  /** Allow boats and winds beyond the tables (results are flagged). */
  extrapolate?: boolean;
}

/** One line of the reasoning, for the boat and plan pages. */
export interface ReasoningStep {
  topic: 'load' | 'anchor' | 'chain' | 'nylon' | 'snubber' | 'shackle' | 'scope' | 'uplift';
  text: string;
}

/** Everything the boat, plan, post and exchange screens show for one boat and one wind. */
export interface TackleRecommendation {
  windKn: number;
  /** Wind above 42 kn: the rode becomes chain plus nylon. */
  storm: boolean;
  /** Table load at the plan's wind. */
  designLoad: DesignLoadResult;
  /** Table load at 30 kn, the working load a snubber is sized on. */
  workingLoadN: number;
  /** Wind the working gear is sized for: max(wind, 42 kn). */
  sizingKn: number;
  /** Table load at sizingKn, N. */
  sizingLoadN: number;
  /** Peak-load factor on the rode: 0.7 for a storm rode with its nylon section, else 1. */
  peakFactor: number;
  /** Load the chain, nylon and shackle are sized for: sizingLoadN × peakFactor, N. */
  rodeLoadN: number;
  anchor: {
    type: AnchorType;
    /** The anchor to carry, kg (suggested mass rounded up to a whole kg), or null on rock and weed. */
    massKg: number | null;
    minKg: number | null;
    suggestedKg: number | null;
    softMud: AnchorSuggestionResult['softMud'];
    suggestion: AnchorSuggestionResult;
  };
  chain: (ChainChoice & { lengthM: number; massKg: number; marginOnWll: number }) | null;
  nylon: {
    sizeIn: number;
    sizeMm: number;
    metricMm: number;
    lengthM: number;
    minBreakN: number;
    workingLimitN: number;
    /** `storm-rode`: part of this plan's rode; `alternative`: the size if the rode is chain and rope. */
    role: 'storm-rode' | 'alternative';
    governedBy: 'handbook-rule' | 'strength';
  } | null;
  snubber: SnubberSuggestionResult;
  /** Smallest table shackle with WLL at least the chain's (one rule), or null. */
  shackle: { nominalIn: number; wllN: number; minBreakN: number } | null;
  scope: {
    ratio: number;
    rung: ScopeRung | null;
    /** Seabed to bow roller at high water, m. */
    heightM: number;
    rodeLengthM: number;
  };
  catenary: CatenaryResult | null;
  rode: RodeSuggestionResult;
  reasoning: ReasoningStep[];
  warnings: string[];
  basis: string;
  cautions: readonly string[];
}
