import type { PlanBoat } from '@app/calc';
import type { Boat } from '../../models';

/** A saved boat as @app/calc takes it: beam and displacement only when the boat has them (0 counts as unknown). */
export const calcBoatOf = (boat: Boat): PlanBoat => ({
  loaM: boat.loaM,
  hull: boat.hull,
  bowHeightM: boat.bowHeightM,
  ...(boat.beamM ? { beamM: boat.beamM } : {}),
  ...(boat.displacementKg ? { displacementKg: boat.displacementKg } : {}),
});
