import { withFieldPrefix } from '../errors';
import { STANDARD_CAUTIONS } from '../cautions';
import { anchorSuggestion, type AnchorSuggestionResult } from '../advice/anchor-suggestion';
import { rodeSuggestion, type RodeSuggestionResult } from '../advice/rode-suggestion';
import { snubberSuggestion, type SnubberSuggestionResult } from '../advice/snubber-suggestion';
import { weakestLink, type RatedComponent, type WeakestLinkResult } from '../checks/weakest-link';
import { catenary, type CatenaryResult } from '../geometry/catenary';
import { scopeRung, type ScopeRung } from '../geometry/scope';
import { swingRadius, type SwingRadiusResult } from '../geometry/swing-radius';
import { designLoad, type DesignLoadResult } from '../loads/design-load';
import type { AnchorType } from '../tables/anchor-holding';
import { checkPlanInput, type CheckedPlan, type TacklePlanInput } from './plan-input';
import {
  rateChain,
  rateConnector,
  rateRope,
  type PlanChainRating,
  type PlanConnectorRating,
  type PlanRopeRating,
} from './rate-components';

/** The plan's anchor against the suggestion. */
export interface PlanAnchorCheck {
  type: AnchorType;
  massKg: number;
  suggestion: AnchorSuggestionResult;
  meetsMinimum: boolean;
  meetsSuggested: boolean;
}

/** Everything a plan page shows, from {@link tacklePlan}. */
export interface TacklePlanResult {
  designLoad: DesignLoadResult;
  /** The design load, N (same as designLoad.loadN). */
  loadN: number;
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
  rodeSuggestion: RodeSuggestionResult;
  snubberSuggestion: SnubberSuggestionResult;
  warnings: string[];
  cautions: readonly string[];
  basis: string;
}

/**
 * A whole ground-tackle plan in one call: design load (ABYC table), ratings of each part,
 * weakest link, scope ratio, swing radius, chain catenary, anchor check and rode / snubber
 * suggestions, with warnings and cautions. Validates everything, throwing a RangeError
 * ({@link CalcInputError}) that names the field path, e.g. `components.chain.tradeSizeIn`.
 */
export function tacklePlan(input: TacklePlanInput): TacklePlanResult {
  const plan = checkPlanInput(input);
  const { boat, windKn, extrapolate } = plan;
  const load = withFieldPrefix('boat', () =>
    designLoad({ loaM: boat.loaM, beamM: boat.beamM, hull: boat.hull, windKn, extrapolate }),
  );
  const loadN = load.loadN;
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
  const link = weakestLinkOf(loadN, plan.designFactor, chain, rode, connectors, warnings);
  const anchor = anchorCheck(plan, warnings);
  const rodeLengthM = (chain?.lengthM ?? 0) + (rode?.lengthM ?? 0);
  const heightM = plan.depthM + boat.bowHeightM + plan.tideM;
  const geometry = geometryOf(plan, loadN, chain, rode, rodeLengthM, heightM, warnings);
  const rodeAdvice = rodeSuggestion({
    loadN,
    anchorKg: anchor?.massKg ?? anchor?.suggestion.suggestedKg,
    grade: chain?.grade ?? 'G43',
    designFactor: plan.designFactor,
    wet: plan.wet,
  });
  const snubberAdvice = snubberSuggestion({
    loadN,
    designFactor: plan.designFactor,
    wet: plan.wet,
  });
  if (snubber !== null) snubberWarnings(plan, loadN, snubber, snubberAdvice, warnings);
  if (load.extrapolated) warnings.push('The design load is extrapolated beyond the ABYC table.');
  return {
    designLoad: load,
    loadN,
    anchor,
    chain,
    rode,
    snubber,
    connectors,
    weakestLink: link,
    rodeLengthM,
    heightM,
    ...geometry,
    rodeSuggestion: rodeAdvice,
    snubberSuggestion: snubberAdvice,
    warnings,
    cautions: STANDARD_CAUTIONS,
    basis:
      'Design load from the ABYC H-40 table; chain from 49 CFR 393.108; shackles from RR-C-271; rope from engineering tables and 49 CFR 393.108; ' +
      'catenary after MIT 2.019; scope and swing from sailing-course practice. Each part carries its own basis.',
  };
}

function weakestLinkOf(
  loadN: number,
  designFactor: number,
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
  const result = weakestLink({ loadN, components: parts, designFactor });
  warnings.push(...result.warnings);
  if (rode !== null && rode.wllN < loadN) {
    warnings.push(
      'The rope’s working load limit is a cargo tie-down rating (design factor about 9–12); nylon rodes are often worked harder so they stretch — weigh its breaking-strength factor too.',
    );
  }
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

function anchorCheck(plan: CheckedPlan, warnings: string[]): PlanAnchorCheck | null {
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
  const meetsMinimum = anchor.massKg >= suggestion.minKg;
  const meetsSuggested = anchor.massKg >= suggestion.suggestedKg;
  if (!meetsMinimum)
    warnings.push('The anchor is lighter than the minimum our holding model gives for this wind.');
  else if (!meetsSuggested)
    warnings.push(
      'The anchor meets the minimum but not the suggested mass, which allows for gusts and a poor set.',
    );
  return { type: anchor.type, massKg: anchor.massKg, suggestion, meetsMinimum, meetsSuggested };
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
    if (shape.liftsAtAnchor) {
      warnings.push(
        'Under the design load the chain lifts at the anchor and pulls the shank up: let out more rode or add chain.',
      );
    }
  }
  return { scopeRatio: ratio, scopeRung: rung, swingRadius: swing, catenary: shape };
}

function snubberWarnings(
  plan: CheckedPlan,
  loadN: number,
  snubber: PlanRopeRating,
  advice: SnubberSuggestionResult,
  warnings: string[],
): void {
  if (plan.components.snubber?.material === 'polyester') {
    warnings.push(
      'The snubber is polyester, which stretches little: nylon absorbs shock far better.',
    );
  }
  if (snubber.minBreakN < loadN * plan.designFactor) {
    warnings.push(
      'The snubber is thinner than suggested: its breaking strength is below the design factor at this load.',
    );
  } else if (snubber.diameterMm > advice.diameterMm * 1.2) {
    warnings.push(
      'The snubber is much thicker than needed and will stretch little under this load.',
    );
  }
  if (snubber.lengthM < advice.lengthM * 0.75) {
    warnings.push('The snubber is short for this load; a longer one absorbs more shock.');
  }
}
