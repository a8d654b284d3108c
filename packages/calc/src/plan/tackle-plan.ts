import { withFieldPrefix } from '../errors';
import {
  SHOCK_NYLON_MIN_M,
  SHOCK_REDUCTION_FACTOR,
  SNUBBER_WORKING_FACTOR,
  STORM_WIND_KN,
} from '../constants';
import { STANDARD_CAUTIONS } from '../cautions';
import { anchorSuggestion, type AnchorSuggestionResult } from '../advice/anchor-suggestion';
import { anchorMassForHoldingKg, heavyBoatFactor } from '../advice/anchor-holding';
import type { RodeSuggestionResult } from '../advice/rode-suggestion';
import type { SnubberSuggestionResult } from '../advice/snubber-suggestion';
import { weakestLink, type RatedComponent, type WeakestLinkResult } from '../checks/weakest-link';
import { catenary, type CatenaryResult } from '../geometry/catenary';
import { scopeRung, type ScopeRung } from '../geometry/scope';
import { swingRadius, type SwingRadiusResult } from '../geometry/swing-radius';
import { designLoad, type DesignLoadResult } from '../loads/design-load';
import {
  recommendTackle,
  UPLIFT_WARN_DEG,
  type TackleRecommendation,
} from '../recommend/recommend-tackle';
import {
  BURIAL_BOTTOMS,
  DEFAULT_BOTTOM,
  type AnchorType,
  type BurialBottom,
} from '../tables/anchor-holding';
import { checkPlanInput, type CheckedPlan, type TacklePlanInput } from './plan-input';
import {
  rateChain,
  rateConnector,
  rateRope,
  type PlanChainRating,
  type PlanConnectorRating,
  type PlanRopeRating,
} from './rate-components';

/** The plan's anchor against the holding model. */
export interface PlanAnchorCheck {
  type: AnchorType;
  massKg: number;
  suggestion: AnchorSuggestionResult;
  /** Mass that holds the load this plan's anchor sees (the peak-credited load at the plan's wind), kg; null on rock and weed. */
  neededKg: number | null;
  /** massKg ÷ neededKg. */
  massMargin: number | null;
  meetsMinimum: boolean;
  meetsSuggested: boolean;
}

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

function weakestLinkOf(
  loadN: number,
  designFactor: number | undefined,
  chain: PlanChainRating | null,
  rode: PlanRopeRating | null,
  connectors: PlanConnectorRating[],
  warnings: string[],
): WeakestLinkResult | null {
  const parts: RatedComponent[] = [];
  if (chain !== null) parts.push({ label: 'chain', wllN: chain.wllN, minBreakN: chain.minBreakN });
  if (rode !== null) parts.push({ label: 'rope rode', wllN: rode.wllN, minBreakN: rode.minBreakN });
  for (const c of connectors) parts.push({ label: c.label, wllN: c.wllN, minBreakN: c.minBreakN });
  if (parts.length === 0) return null;
  const result = weakestLink({
    loadN,
    components: parts,
    ...(designFactor === undefined ? {} : { designFactor }),
  });
  warnings.push(...result.warnings);
  if (chain !== null) {
    for (const c of connectors) {
      if (c.kind === 'shackle' && c.wllN < chain.wllN) {
        warnings.push(
          `${c.label}: its WLL is below the chain’s; a shackle should be at least as strong as the chain (Boat Mechanical Systems Handbook).`,
        );
      }
    }
  }
  return result;
}

function anchorCheck(
  plan: CheckedPlan,
  checkLoadN: number,
  warnings: string[],
): PlanAnchorCheck | null {
  const anchor = plan.components.anchor;
  if (anchor === undefined) return null;
  const suggestion = withFieldPrefix('boat', () =>
    anchorSuggestion({
      loaM: plan.boat.loaM,
      beamM: plan.boat.beamM,
      hull: plan.boat.hull,
      displacementKg: plan.boat.displacementKg,
      windKn: plan.windKn,
      anchorType: anchor.type,
      bottom: plan.bottom,
      extrapolate: plan.extrapolate,
    }),
  );
  const bottom = plan.bottom ?? DEFAULT_BOTTOM;
  const burial = (BURIAL_BOTTOMS as readonly string[]).includes(bottom);
  if (!burial) {
    warnings.push(
      'On rock or weed no holding curve applies, so the anchor mass is not checked: holding there is unpredictable.',
    );
    return {
      type: anchor.type,
      massKg: anchor.massKg,
      suggestion,
      neededKg: null,
      massMargin: null,
      meetsMinimum: false,
      meetsSuggested: false,
    };
  }
  const heavy = heavyBoatFactor(plan.boat.loaM, plan.boat.displacementKg);
  const neededKg = anchorMassForHoldingKg(anchor.type, bottom as BurialBottom, checkLoadN * heavy);
  const meetsMinimum = anchor.massKg >= neededKg;
  const storm = plan.windKn >= STORM_WIND_KN;
  const meetsSuggested = storm
    ? meetsMinimum
    : anchor.massKg >= (suggestion.suggestedKg ?? Infinity);
  if (!meetsMinimum)
    warnings.push(
      `The anchor is lighter than the ${neededKg.toFixed(1)} kg our holding model needs at ${plan.windKn} kn: choose a heavier anchor or a more efficient type.`,
    );
  else if (!meetsSuggested)
    warnings.push(
      `The anchor holds ${plan.windKn} kn but not a 42 kn squall, which a working anchor should survive (${(suggestion.suggestedKg ?? 0).toFixed(1)} kg).`,
    );
  return {
    type: anchor.type,
    massKg: anchor.massKg,
    suggestion,
    neededKg,
    massMargin: anchor.massKg / neededKg,
    meetsMinimum,
    meetsSuggested,
  };
}

function geometryOf(
  plan: CheckedPlan,
  loadN: number,
  chain: PlanChainRating | null,
  rode: PlanRopeRating | null,
  rodeLengthM: number,
  heightM: number,
  warnings: string[],
): Pick<TacklePlanResult, 'scopeRatio' | 'scopeRung' | 'swingRadius' | 'catenary'> {
  if (rodeLengthM === 0 || heightM <= 0) {
    return { scopeRatio: null, scopeRung: null, swingRadius: null, catenary: null };
  }
  const ratio = rodeLengthM / heightM;
  const rung = scopeRung(ratio) ?? null;
  const lowWaterM = plan.depthM + plan.boat.bowHeightM;
  if (rodeLengthM <= heightM) {
    warnings.push('The rode is too short to reach the seabed at high water.');
    return { scopeRatio: ratio, scopeRung: rung, swingRadius: null, catenary: null };
  }
  if (ratio < 3)
    warnings.push(
      'Scope is below 3:1, the bare minimum even in light weather (Boat Mechanical Systems Handbook).',
    );
  else if (ratio < 5 && plan.windKn >= 30)
    warnings.push('Scope is below 5:1 for a strong wind (Boat Mechanical Systems Handbook).');
  else if (ratio < 7 && plan.windKn >= 42)
    warnings.push('Scope is below 7:1 for a storm (Boat Mechanical Systems Handbook).');
  const swing =
    rodeLengthM >= lowWaterM
      ? swingRadius({
          rodeM: rodeLengthM,
          depthM: plan.depthM,
          bowHeightM: plan.boat.bowHeightM,
          loaM: plan.boat.loaM,
        })
      : null;
  let shape: CatenaryResult | null = null;
  if (chain !== null) {
    shape = catenary({
      depthM: plan.depthM,
      bowHeightM: plan.boat.bowHeightM,
      tideM: plan.tideM,
      chainKgPerM: chain.kgPerM,
      horizontalLoadN: loadN,
      chainLengthM: chain.lengthM,
      ropeLengthM: rode?.lengthM ?? 0,
      water: plan.water,
    });
    if (shape.anchorAngleDeg > UPLIFT_WARN_DEG) {
      warnings.push(
        `Under the design load the chain pulls the anchor ${shape.anchorAngleDeg.toFixed(0)}° upward (we warn above ${UPLIFT_WARN_DEG}°): let out more rode, add chain, or hang a kellet.`,
      );
    }
  }
  return { scopeRatio: ratio, scopeRung: rung, swingRadius: swing, catenary: shape };
}

function snubberWarnings(
  plan: CheckedPlan,
  snubber: PlanRopeRating,
  rec: TackleRecommendation,
  warnings: string[],
): void {
  const advice = rec.snubber;
  if (plan.components.snubber?.material === 'polyester') {
    warnings.push(
      'The snubber is polyester, which stretches little: nylon absorbs shock far better.',
    );
  }
  const needBreakN = rec.workingLoadN * SNUBBER_WORKING_FACTOR;
  if (snubber.minBreakN < needBreakN * 0.95) {
    warnings.push(
      `The snubber is thinner than suggested: its breaking strength is below ${SNUBBER_WORKING_FACTOR} × the working (30 kn) load.`,
    );
  } else if (snubber.diameterMm > advice.diameterMm * 1.35) {
    warnings.push(
      'The snubber is much thicker than needed and will stretch little; at storm winds rig a second snubber or a bridle instead.',
    );
  }
  if (snubber.lengthM < advice.lengthM * 0.9) {
    warnings.push(
      `The snubber is short: at least ${advice.lengthM.toFixed(1)} m ${rec.storm ? '(the boat’s length, in a storm)' : '(20 ft or half the boat’s length)'} absorbs shock far better.`,
    );
  }
}
