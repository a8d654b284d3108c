// Public API of @app/calc: ground-tackle engineering, SI units inside, no I/O.
export { CalcInputError, withFieldPrefix } from './errors';
export {
  AIR_DENSITY_KGPM3,
  CHAIN_SAFETY_FACTOR,
  NYLON_ANCHORING_FACTOR,
  SHOCK_NYLON_MIN_M,
  SHOCK_REDUCTION_FACTOR,
  SNUBBER_WORKING_FACTOR,
  STORM_WIND_KN,
  UPLIFT_WARN_DEG,
  FRESH_WATER_DENSITY_KGPM3,
  SEA_WATER_DENSITY_KGPM3,
  STANDARD_GRAVITY_MPS2,
  STEEL_DENSITY_KGPM3,
} from './constants';
export { STANDARD_CAUTIONS } from './cautions';

// Every conversion constant and function (ftToM, MM_PER_IN, …); `units` below groups them.
export * from './units/units';
export {
  UNIT_SYSTEMS,
  formatForce,
  formatLength,
  formatMass,
  inchFractionLabel,
  tradeSizeMm,
  type FormatLengthOptions,
  type FormatOptions,
  type UnitSystem,
} from './units/format';
export {
  SIZE_TEXT_HINT,
  parseInchText,
  parseSizeText,
  sizeTextOf,
  type ParsedSize,
} from './units/size-text';
export { units } from './units/unit-group';

export {
  ABYC_BEAM_POWER_FT,
  ABYC_BEAM_SAIL_FT,
  ABYC_LOA_FT,
  ABYC_LOAD_15KN_LB,
  ABYC_LOAD_30KN_LB,
  ABYC_LOAD_42KN_LB,
  ABYC_WIND_KN,
  HULL_TYPES,
  HULL_TYPE_LABELS,
  MULTIHULL_LOAD_FACTOR,
  type HullType,
} from './tables/abyc-h40';
export {
  CHAIN_BREAK_FACTOR,
  CHAIN_GRADES,
  CHAIN_GRADE_LABELS,
  CHAIN_ROWS,
  CHAIN_TRADE_SIZES_IN,
  chainGradeWords,
  type ChainGrade,
  type ChainRow,
} from './tables/chain-cfr';
export {
  SHACKLE_DESIGN_FACTOR,
  SHACKLE_ROWS,
  SHACKLE_SIZES_IN,
  type ShackleRow,
} from './tables/shackle-rrc';
export {
  ROPE_CONSTRUCTIONS,
  ROPE_CONSTRUCTION_LABELS,
  ROPE_DIAMETERS_IN,
  ROPE_DIAMETERS_MM,
  ROPE_MATERIALS,
  ROPE_MATERIAL_LABELS,
  type RopeConstruction,
  type RopeMaterial,
} from './tables/rope-nylon';
export {
  ANCHOR_EFFICIENCY,
  ANCHOR_TYPES,
  ANCHOR_TYPE_LABELS,
  BOTTOM_TYPES,
  BOTTOM_TYPE_LABELS,
  BURIAL_BOTTOMS,
  DEFAULT_BOTTOM,
  HOLDING_CURVES,
  HOLDING_REF_KG,
  type AnchorType,
  type BottomType,
  type BurialBottom,
  type HoldingCurve,
} from './tables/anchor-holding';

export {
  designLoad,
  loadAtWindLb,
  type DesignLoadInput,
  type DesignLoadResult,
  type RowMode,
} from './loads/design-load';
export {
  chainSpec,
  chainSpecMetric,
  type ChainSpecInput,
  type ChainSpecMetricInput,
  type ChainSpecResult,
} from './ratings/chain-spec';
export {
  shackleForWll,
  shackleSpec,
  type ShackleSpecInput,
  type ShackleSpecResult,
} from './ratings/shackle-spec';
export { ropeSpec, type RopeSpecInput, type RopeSpecResult } from './ratings/rope-spec';

export {
  WATER_TYPES,
  catenary,
  submergedWeightNPerM,
  suspendedLengthM,
  type CatenaryInput,
  type CatenaryResult,
  type WaterType,
} from './geometry/catenary';
export {
  SCOPE_LADDER,
  scope,
  scopeRatio,
  scopeRung,
  type ScopeInput,
  type ScopeRatioInput,
  type ScopeResult,
  type ScopeRung,
} from './geometry/scope';
export {
  swingRadius,
  type SwingRadiusInput,
  type SwingRadiusResult,
} from './geometry/swing-radius';

export {
  weakestLink,
  type BreakFactor,
  type RatedComponent,
  type WeakestComponent,
  type WeakestLinkInput,
  type WeakestLinkResult,
  type WllMargin,
} from './checks/weakest-link';

export {
  WORKING_ANCHOR_MIN_KN,
  anchorSuggestion,
  type AnchorMasses,
  type AnchorSuggestionInput,
  type AnchorSuggestionResult,
} from './advice/anchor-suggestion';
export {
  HEAVY_BOAT_FACTOR_MAX,
  TYPICAL_DL_RATIO,
  anchorHoldingN,
  anchorMassForHoldingKg,
  heavyBoatFactor,
} from './advice/anchor-holding';
export {
  DEFAULT_BOW_HEIGHT_M,
  recommendTackle,
  scopeForWind,
  sizeLabel,
  type ReasoningStep,
  type RecommendTackleInput,
  type TackleRecommendation,
} from './recommend/recommend-tackle';
export { planComponentsFrom } from './recommend/plan-components';
export {
  chainFloorIn,
  nylonChoiceLabel,
  rodeSuggestion,
  type ChainChoice,
  type NylonChoice,
  type RodeSuggestionInput,
  type RodeSuggestionResult,
} from './advice/rode-suggestion';
export {
  nylonStrain,
  snubberSuggestion,
  type SnubberSuggestionInput,
  type SnubberSuggestionResult,
} from './advice/snubber-suggestion';

export {
  CONNECTOR_KINDS,
  CONNECTOR_KIND_LABELS,
  checkPlanInput,
  type CheckedPlan,
  type ConnectorKind,
  type PlanBoat,
  type PlanComponents,
  type PlanConnector,
  type TacklePlanInput,
} from './plan/plan-input';
export {
  SPLICE_EFFICIENCY,
  type PlanChainRating,
  type PlanConnectorRating,
  type PlanRopeRating,
  type RatingSource,
} from './plan/rate-components';
export { type PlanAnchorCheck } from './plan/plan-anchor-check';
export { tacklePlan, type TacklePlanResult } from './plan/tackle-plan';
