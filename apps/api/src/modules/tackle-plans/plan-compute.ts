import {
  tacklePlan,
  type BottomType,
  type TacklePlanInput,
  type TacklePlanResult,
} from '@app/calc';
import type { PlanComponents } from '@app/shared';
import type { Boat } from '../../models';
import { calcBoatOf } from '../boats/calc-boat';

export interface PlanConditions {
  windKn: number;
  depthM: number;
  tideM?: number;
  bottom?: BottomType;
  components: PlanComponents;
}

/**
 * What @app/calc's `tacklePlan` gets for a saved boat in the given conditions. Boats and winds beyond the
 * published tables are computed with extrapolation and flagged in the result's warnings.
 */
export function planInputOf(boat: Boat, plan: PlanConditions): TacklePlanInput {
  return {
    boat: calcBoatOf(boat),
    windKn: plan.windKn,
    depthM: plan.depthM,
    tideM: plan.tideM ?? 0,
    ...(plan.bottom ? { bottom: plan.bottom } : {}),
    extrapolate: true,
    components: plan.components,
  };
}

/** The figures for a saved plan, from @app/calc's `tacklePlan` (the same function the client runs). */
export function computePlan(boat: Boat, plan: PlanConditions): TacklePlanResult {
  return tacklePlan(planInputOf(boat, plan));
}
