import {
  ANCHOR_EFFICIENCY,
  HOLDING_CURVES,
  type AnchorType,
  type BurialBottom,
} from '../tables/anchor-holding';
import { KG_PER_LB, M_PER_FT } from '../units/units';

/**
 * Ultimate static holding of a well-set anchor, N, from the power-law curve of UFC 4-159-03
 * eq. 26 for the bottom, scaled by the type's efficiency relative to a scoop.
 */
export function anchorHoldingN(type: AnchorType, bottom: BurialBottom, massKg: number): number {
  const curve = HOLDING_CURVES[bottom];
  return ANCHOR_EFFICIENCY[type] * curve.refHoldingN * (massKg / curve.refKg) ** curve.exponent;
}

/** The anchor mass, kg, whose holding equals `holdingN` (the inverse of {@link anchorHoldingN}). */
export function anchorMassForHoldingKg(
  type: AnchorType,
  bottom: BurialBottom,
  holdingN: number,
): number {
  const curve = HOLDING_CURVES[bottom];
  return (
    curve.refKg * (holdingN / (ANCHOR_EFFICIENCY[type] * curve.refHoldingN)) ** (1 / curve.exponent)
  );
}

/** Displacement–length ratio (on LOA) taken as typical for a cruising boat (common practice). */
export const TYPICAL_DL_RATIO = 200;
/** The most a heavy boat's anchor load is raised. */
export const HEAVY_BOAT_FACTOR_MAX = 1.5;
const KG_PER_LONG_TON = 2240 * KG_PER_LB;

/**
 * How much harder a heavy boat pulls on its anchor than the load table's typical boat: its
 * displacement over that of a boat of the same length at a displacement–length ratio of 200
 * (on LOA), between 1 and 1.5 (common practice, approximate: makers' sizing charts ask for
 * displacement and step a heavy boat up). 1 when the displacement is not given.
 */
export function heavyBoatFactor(loaM: number, displacementKg: number | undefined): number {
  if (displacementKg === undefined || !(loaM > 0)) return 1;
  const typicalKg = TYPICAL_DL_RATIO * (0.01 * (loaM / M_PER_FT)) ** 3 * KG_PER_LONG_TON;
  return Math.min(HEAVY_BOAT_FACTOR_MAX, Math.max(1, displacementKg / typicalKg));
}
