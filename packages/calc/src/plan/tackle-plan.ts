import { withFieldPrefix } from '../errors';
import { SHOCK_NYLON_MIN_M, SHOCK_REDUCTION_FACTOR, STORM_WIND_KN } from '../constants';
import { STANDARD_CAUTIONS } from '../cautions';
import type { RodeSuggestionResult } from '../advice/rode-suggestion';
import type { SnubberSuggestionResult } from '../advice/snubber-suggestion';
import type { WeakestLinkResult } from '../checks/weakest-link';
import type { CatenaryResult } from '../geometry/catenary';
import type { ScopeRung } from '../geometry/scope';
import type { SwingRadiusResult } from '../geometry/swing-radius';
import { designLoad, type DesignLoadResult } from '../loads/design-load';
import { recommendTackle, type TackleRecommendation } from '../recommend/recommend-tackle';
import { anchorCheck, type PlanAnchorCheck } from './plan-anchor-check';
import { geometryOf } from './plan-geometry';
import { checkPlanInput, type CheckedPlan, type TacklePlanInput } from './plan-input';
import { snubberWarnings, weakestLinkOf } from './plan-part-checks';
import {
  rateChain,
  rateConnector,
  rateRope,
  type PlanChainRating,
  type PlanConnectorRating,
  type PlanRopeRating,
} from './rate-components';

/** Everything a plan page shows, from {@link tacklePlan}. */
export interface TacklePlanResult {
  designLoad: DesignLoadResult;
  /** The design load, N (same as designLoad.loadN). */
  loadN: number;
  /** 0.7 when a storm plan has at least 6.1 m of nylon in the rode (rope or snubber), else 1. */
  peakFactor: number;
  /** The load the parts are checked at: loadN × peakFactor, N. */
  checkLoadN: number;
  anchor: PlanAnchorCheck | null;
  chain: PlanChainRating | null;
  rode: PlanRopeRating | null;
  snubber: PlanRopeRating | null;
  connectors: PlanConnectorRating[];
  /** Chain, rope rode and rated connectors in the load path; null when there are none. */
  weakestLink: WeakestLinkResult | null;
  /** Chain + rope rode, m. */
  rodeLengthM: number;
  /** Seabed to bow roller at high water, m. */
  heightM: number;
  scopeRatio: number | null;
  scopeRung: ScopeRung | null;
  /** At low water (tide 0), the widest circle. */
  swingRadius: SwingRadiusResult | null;
  catenary: CatenaryResult | null;
  /** What Rodewise would carry for this boat and wind (the same function every screen uses). */
  recommendation: TackleRecommendation | null;
  rodeSuggestion: RodeSuggestionResult | null;
  snubberSuggestion: SnubberSuggestionResult | null;
  warnings: string[];
  cautions: readonly string[];
  basis: string;
}

function nylonStretchM(plan: CheckedPlan): number {
  const { rode, snubber } = plan.components;
  const rope = rode?.material === 'nylon' ? rode.lengthM : 0;
  const snub = snubber?.material === 'nylon' ? snubber.lengthM : 0;
  return Math.max(rope, snub);
}

/**
 * A whole ground-tackle plan in one call: design load (ABYC table), ratings of each part,
 * weakest link (smallest working-limit margin), scope, swing radius, chain catenary, anchor
 * check against the holding model and the recommendation for the same boat and wind, with
 * warnings and cautions. A storm plan (above 42 kn) with at least 6.1 m of nylon in the rode is
 * checked at 70 % of the table load (stated). Validates everything, throwing a RangeError
 * ({@link CalcInputError}) that names the field path, e.g. `components.chain.tradeSizeIn`.
 */
export function tacklePlan(input: TacklePlanInput): TacklePlanResult {
  const plan = checkPlanInput(input);
  const { boat, windKn, extrapolate } = plan;
  const load = withFieldPrefix('boat', () =>
    designLoad({ loaM: boat.loaM, beamM: boat.beamM, hull: boat.hull, windKn, extrapolate }),
  );
  const loadN = load.loadN;
  const credited = windKn > STORM_WIND_KN && nylonStretchM(plan) >= SHOCK_NYLON_MIN_M;
  const peakFactor = credited ? SHOCK_REDUCTION_FACTOR : 1;
  const checkLoadN = loadN * peakFactor;
  const warnings: string[] = [];
  const chain = rateChain(plan);
  const rode = rateRope(plan, 'rode');
  const snubber = rateRope(plan, 'snubber');
  const connectors: PlanConnectorRating[] = [];
  plan.components.connectors.forEach((c, i) => {
    const rated = rateConnector(c, i, rode);
    if (rated === null)
      warnings.push(`${c.label}: no rating given, so it is not checked. Enter the maker’s WLL.`);
    else connectors.push(rated);
  });
  const link = weakestLinkOf(checkLoadN, plan.designFactor, chain, rode, connectors, warnings);
  const anchor = anchorCheck(plan, checkLoadN, warnings);
  const rodeLengthM = (chain?.lengthM ?? 0) + (rode?.lengthM ?? 0);
  const heightM = plan.depthM + boat.bowHeightM + plan.tideM;
  const geometry = geometryOf(plan, checkLoadN, chain, rode, rodeLengthM, heightM, warnings);
  const recommendation = recommendationFor(plan);
  if (snubber !== null && recommendation !== null)
    snubberWarnings(plan, snubber, recommendation, warnings);
  if (chain !== null && snubber === null && rode === null && windKn >= 20)
    warnings.push(
      'An all-chain rode with no snubber snatches in gusts: add a nylon snubber of at least 20 ft (6.1 m).',
    );
  if (load.extrapolated) warnings.push('The design load is extrapolated beyond the ABYC table.');
  if (credited)
    warnings.push(
      `With ${nylonStretchM(plan).toFixed(1)} m of nylon in the rode, parts are checked at ${Math.round(SHOCK_REDUCTION_FACTOR * 100)} % of the table load (Rodewise's stated storm credit).`,
    );
  return {
    designLoad: load,
    loadN,
    peakFactor,
    checkLoadN,
    anchor,
    chain,
    rode,
    snubber,
    connectors,
    weakestLink: link,
    rodeLengthM,
    heightM,
    ...geometry,
    recommendation,
    rodeSuggestion: recommendation?.rode ?? null,
    snubberSuggestion: recommendation?.snubber ?? null,
    warnings,
    cautions: STANDARD_CAUTIONS,
    basis:
      'Design load from the ABYC H-40 table; chain from 49 CFR 393.108 with UFC 4-159-03 factors; shackles from RR-C-271; nylon from engineering tables with a wet loss and an anchoring factor; ' +
      'anchor holding after UFC 4-159-03 eq. 26; catenary after MIT 2.019; scope and swing from sailing-course practice. Each part carries its own basis.',
  };
}

function recommendationFor(plan: CheckedPlan): TackleRecommendation | null {
  try {
    return recommendTackle({
      loaM: plan.boat.loaM,
      ...(plan.boat.beamM === undefined ? {} : { beamM: plan.boat.beamM }),
      hull: plan.boat.hull,
      ...(plan.boat.displacementKg === undefined
        ? {}
        : { displacementKg: plan.boat.displacementKg }),
      bowHeightM: plan.boat.bowHeightM,
      windKn: plan.windKn,
      anchorType: plan.components.anchor?.type ?? 'scoop',
      ...(plan.bottom === undefined ? {} : { bottom: plan.bottom }),
      depthM: plan.depthM,
      tideM: plan.tideM,
      ...(plan.components.chain ? { chainGrade: plan.components.chain.grade } : {}),
      extrapolate: plan.extrapolate,
    });
  } catch {
    return null;
  }
}
