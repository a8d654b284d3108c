import {
  CalcInputError,
  recommendTackle,
  tacklePlan,
  type TacklePlanInput,
  type TacklePlanResult,
} from '@app/calc';
import { TIGHT_MARGIN_BELOW, type MarginBand, type StormCheckDto } from '@app/shared';
import type { Boat, StormWatch, TacklePlan } from '../../models';
import { calcBoatOf } from '../boats/calc-boat';
import { planInputOf } from '../tackle-plans/plan-compute';

/** Cautions shown with every storm check, before the calc package's own. */
export const STORM_CAUTIONS: readonly string[] = Object.freeze([
  'The harbour master and local rules come first: follow their instructions on moorings, berths and leaving the harbour.',
  'Follow the makers’ ratings for every part, and ask a qualified rigger, surveyor or boatyard when in doubt.',
  'A forecast is not a promise: storms arrive early, veer and gust above their forecast; plan for worse.',
  'Never stay aboard or go out to a boat in the storm to save gear; no boat is worth a life.',
]);

/** The plan input @app/calc's tacklePlan gets for a boat and its saved plan at a given wind. */
export function stormPlanInput(
  boat: Boat,
  plan: TacklePlan,
  opts: { windKn: number; depthM: number | null; surgeM: number },
): TacklePlanInput {
  // planInputOf extrapolates: storm winds lie beyond the 42 kn column of the load table, which the calc package
  // scales with V² and flags.
  return planInputOf(boat, {
    windKn: opts.windKn,
    depthM: opts.depthM ?? plan.depthM,
    // The surge raises the water on top of the tide still to come.
    tideM: plan.tideM + opts.surgeM,
    ...(plan.bottom ? { bottom: plan.bottom } : {}),
    components: plan.components,
  });
}

/** Storm-specific warnings the calc package does not give: chafe and snubbers (common practice). */
function chafeWarnings(result: TacklePlanResult): string[] {
  const out: string[] = [];
  if (result.snubber === null) {
    out.push(
      result.rode === null
        ? 'No snubber: an all-chain rode snatches in gusts. Rig a nylon snubber or a bridle, and double it for a storm (common practice).'
        : 'No snubber in the plan: rig one, or lead the nylon rode through chafe gear at the fairlead (common practice).',
    );
  } else {
    out.push(
      'Chafe: protect the snubber with chafe gear at every fairlead and chock, and rig a second snubber as a back-up (common practice).',
    );
  }
  if (result.rode !== null)
    out.push(
      'Chafe: the nylon rode needs chafe gear where it crosses the bow roller or fairlead (common practice).',
    );
  return out;
}

function bandOf(margin: number | null): MarginBand | null {
  if (margin === null) return null;
  if (margin < 1) return 'below-wll';
  return margin < TIGHT_MARGIN_BELOW ? 'tight' : 'passes';
}

/**
 * What @app/calc's recommendTackle gives this boat at the gust, in the plan's water, for comparison with the
 * plan's own gear; null when the recommendation cannot be computed for this boat (e.g. beyond its tables).
 */
function recommendationAt(
  boat: Boat,
  plan: TacklePlan,
  input: TacklePlanInput,
): StormCheckDto['recommended'] {
  try {
    const rec = recommendTackle({
      ...calcBoatOf(boat),
      windKn: input.windKn,
      anchorType: plan.components.anchor?.type ?? 'plow',
      ...(plan.bottom ? { bottom: plan.bottom } : {}),
      depthM: input.depthM,
      tideM: input.tideM ?? 0,
      ...(plan.components.chain ? { chainGrade: plan.components.chain.grade } : {}),
      extrapolate: true,
    });
    return {
      chain: rec.chain ? { grade: rec.chain.grade, tradeSizeIn: rec.chain.tradeSizeIn } : null,
      shackleIn: rec.shackle?.nominalIn ?? null,
      anchorKg: rec.anchor.massKg,
      scopeRatio: rec.scope.ratio,
      basis: rec.basis,
    };
  } catch (err) {
    if (err instanceof CalcInputError) return null;
    throw err;
  }
}

/**
 * Checks a saved plan against the watch's forecast with @app/calc's tacklePlan: the peak check at the gust
 * figure (the weakest link by WLL margin, and its margin at the sustained wind), scope for the given depth with
 * the surge on top of the tide, and the snubber, scope and chafe warnings in plain words.
 */
export function stormCheck(
  boat: Boat,
  plan: TacklePlan,
  watch: Pick<StormWatch, 'gustKn' | 'sustainedKn' | 'surgeM'>,
  depthM: number | null,
): StormCheckDto {
  const input = stormPlanInput(boat, plan, { windKn: watch.gustKn, depthM, surgeM: watch.surgeM });
  const atGust = tacklePlan(input);
  const atSustained = tacklePlan({ ...input, windKn: watch.sustainedKn });
  const link = atGust.weakestLink;
  const weakest = link?.weakest ?? null;
  const sustainedMargin =
    weakest === null
      ? null
      : (atSustained.weakestLink?.byWll.find((m) => m.index === weakest.index)?.margin ?? null);
  const parts =
    link === null
      ? []
      : link.byWll.map((m) => ({
          label: m.label,
          wllMargin: m.margin,
          breakFactor: link.byBreak.find((b) => b.index === m.index)?.factor ?? 0,
        }));
  return {
    planId: plan.id,
    planName: plan.name,
    windKn: watch.gustKn,
    sustainedKn: watch.sustainedKn,
    loadN: atGust.loadN,
    band: bandOf(weakest?.margin ?? null),
    weakestLink:
      weakest === null
        ? null
        : { label: weakest.label, wllMargin: weakest.margin, breakFactor: weakest.factor },
    sustainedMargin,
    parts,
    depthM: input.depthM,
    tideM: input.tideM ?? 0,
    scopeRatio: atGust.scopeRatio,
    recommended: recommendationAt(boat, plan, input),
    warnings: [...atGust.warnings, ...chafeWarnings(atGust)],
    cautions: [...STORM_CAUTIONS, ...atGust.cautions],
    basis: `Checked at the forecast gust of ${watch.gustKn} kn (the peak load), with the margin at the sustained ${watch.sustainedKn} kn beside it. ${atGust.basis}`,
  };
}
