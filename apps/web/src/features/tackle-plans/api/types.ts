import type { TacklePlanResult } from '@app/calc';
import type { BoatDto, TacklePlanDto } from '@app/shared';

/** A plan as the API returns it: the plan, its boat and @app/calc's figures for it. */
export interface TacklePlanWithResult {
  plan: TacklePlanDto;
  boat: BoatDto;
  result: TacklePlanResult;
}
