import { tacklePlan, type BottomType, type TacklePlanResult } from '@app/calc';
import type { PlanComponents } from '@app/shared';
import type { Boat } from '../../models';

export interface PlanConditions {
  windKn: number;
  depthM: number;
  tideM?: number;
  bottom?: BottomType;
  components: PlanComponents;
}

/**
 * The figures for a saved plan, from @app/calc's `tacklePlan` (the same function the client runs). Boats and winds
 * beyond the published tables are computed with extrapolation and flagged in the result's warnings.
 */
export function computePlan(boat: Boat, plan: PlanConditions): TacklePlanResult {
  return tacklePlan({
    boat: {
      loaM: boat.loaM,
      hull: boat.hull,
      bowHeightM: boat.bowHeightM,
      ...(boat.beamM ? { beamM: boat.beamM } : {}),
      ...(boat.displacementKg ? { displacementKg: boat.displacementKg } : {}),
    },
    windKn: plan.windKn,
    depthM: plan.depthM,
    tideM: plan.tideM ?? 0,
    ...(plan.bottom ? { bottom: plan.bottom } : {}),
    extrapolate: true,
    components: plan.components,
  });
}
