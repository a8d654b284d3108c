import { STORM_WIND_KN } from '../constants';
import { withFieldPrefix } from '../errors';
import { anchorSuggestion, type AnchorSuggestionResult } from '../advice/anchor-suggestion';
import { anchorMassForHoldingKg, heavyBoatFactor } from '../advice/anchor-holding';
import {
  BURIAL_BOTTOMS,
  DEFAULT_BOTTOM,
  type AnchorType,
  type BurialBottom,
} from '../tables/anchor-holding';
import type { CheckedPlan } from './plan-input';

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

/**
 * The plan's anchor against the holding model at the load the parts are checked at (N): the mass
 * that holds it, kg (× the heavy-boat factor), and the suggestion for the same boat and wind. On
 * rock and weed nothing is checked. Pushes what falls short onto `warnings`; null without an anchor.
 */
export function anchorCheck(
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
