import { SNUBBER_WORKING_FACTOR } from '../constants';
import { weakestLink, type RatedComponent, type WeakestLinkResult } from '../checks/weakest-link';
import type { TackleRecommendation } from '../recommend/recommendation';
import type { CheckedPlan } from './plan-input';
import type { PlanChainRating, PlanConnectorRating, PlanRopeRating } from './rate-components';

/**
 * Weakest link of the load path (chain, rope rode, rated connectors) at `loadN` (N), or null when
 * nothing is rated; pushes its warnings and a warning per shackle weaker than the chain.
 */
export function weakestLinkOf(
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

/**
 * The snubber against the recommendation's: material, breaking strength (at least
 * SNUBBER_WORKING_FACTOR × the working load, N, within 5 %), thickness and length; pushes warnings.
 */
export function snubberWarnings(
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
