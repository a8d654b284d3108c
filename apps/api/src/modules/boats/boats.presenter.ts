import type { BoatDto, TacklePlanDto } from '@app/shared';
import type { Boat, TacklePlan } from '../../models';

export function toBoatDto(b: Boat): BoatDto {
  return {
    id: b.id,
    name: b.name,
    hull: b.hull,
    loaM: b.loaM,
    beamM: b.beamM,
    displacementKg: b.displacementKg,
    draftM: b.draftM,
    bowHeightM: b.bowHeightM,
    gypsy: b.gypsy ?? null,
    homeHarborId: b.homeHarborId,
    createdAt: b.createdAt.toISOString(),
    updatedAt: b.updatedAt.toISOString(),
  };
}

export function toTacklePlanDto(p: TacklePlan): TacklePlanDto {
  return {
    id: p.id,
    boatId: p.boatId,
    name: p.name,
    condition: p.condition,
    windKn: p.windKn,
    depthM: p.depthM,
    tideM: p.tideM,
    bottom: p.bottom ?? null,
    components: p.components,
    notes: p.notes,
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
  };
}
