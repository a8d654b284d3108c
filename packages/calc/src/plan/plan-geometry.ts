import { UPLIFT_WARN_DEG } from '../constants';
import { catenary, type CatenaryResult } from '../geometry/catenary';
import { scopeRung, type ScopeRung } from '../geometry/scope';
import { swingRadius, type SwingRadiusResult } from '../geometry/swing-radius';
import type { CheckedPlan } from './plan-input';
import type { PlanChainRating, PlanRopeRating } from './rate-components';

/** Scope, swing and chain shape of a plan (see TacklePlanResult). */
export interface PlanGeometry {
  scopeRatio: number | null;
  scopeRung: ScopeRung | null;
  swingRadius: SwingRadiusResult | null;
  catenary: CatenaryResult | null;
}

/**
 * Scope ratio = rode ÷ height (m ÷ m), its ladder rung, the swing radius at low water and the
 * chain's catenary under `loadN` (N), with scope and uplift warnings pushed onto `warnings`.
 * All null when there is no rode or no height; no swing or shape when the rode is too short.
 */
export function geometryOf(
  plan: CheckedPlan,
  loadN: number,
  chain: PlanChainRating | null,
  rode: PlanRopeRating | null,
  rodeLengthM: number,
  heightM: number,
  warnings: string[],
): PlanGeometry {
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
