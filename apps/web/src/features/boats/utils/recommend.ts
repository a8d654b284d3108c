import {
  CalcInputError,
  planComponentsFrom,
  recommendTackle,
  type AnchorType,
  type TackleRecommendation,
} from '@app/calc';
import type { BoatDto, PlanComponents } from '@app/shared';

/** A recommendation, or the calculation's message when the boat is outside what it can size. */
export type RecommendationOutcome =
  { ok: true; value: TackleRecommendation } | { ok: false; field: string; message: string };

/** Where the boat will anchor: depth at low water and the tide still to come. */
export interface AnchorageConditions {
  depthM: number;
  tideM: number;
}

/**
 * The one recommendation of @app/calc (`recommendTackle`) for a saved boat: the boat's length, beam,
 * hull, displacement, bow height and gypsy, at `windKn`, for an anchor of `anchorType` at the given
 * depth and tide. Never throws for bad boat data: a calc RangeError comes back as a message.
 */
export function recommendFor(
  boat: BoatDto,
  windKn: number,
  anchorType: AnchorType,
  where: AnchorageConditions,
): RecommendationOutcome {
  try {
    const value = recommendTackle({
      loaM: boat.loaM,
      hull: boat.hull,
      windKn,
      anchorType,
      depthM: where.depthM,
      tideM: where.tideM,
      bowHeightM: boat.bowHeightM,
      extrapolate: true,
      ...(boat.beamM === null ? {} : { beamM: boat.beamM }),
      ...(boat.displacementKg === null ? {} : { displacementKg: boat.displacementKg }),
      ...(boat.gypsy ? { gypsy: boat.gypsy } : {}),
    });
    return { ok: true, value };
  } catch (error) {
    if (error instanceof CalcInputError) {
      return { ok: false, field: error.field, message: error.message };
    }
    throw error;
  }
}

/** The recommendation as a plan's components (what was shown is what is saved). */
export function recommendedComponents(rec: TackleRecommendation): PlanComponents {
  const c = planComponentsFrom(rec);
  return { ...c, connectors: c.connectors ?? [] };
}
