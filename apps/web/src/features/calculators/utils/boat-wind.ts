import type { HullType } from '@app/calc';

/** The boat and wind a load-based calculator starts from. */
export interface BoatWind {
  loaM: number | undefined;
  beamM: number | undefined;
  hull: HullType;
  windKn: number | undefined;
}

export const DEFAULT_BOAT_WIND: BoatWind = { loaM: 10, beamM: 3.4, hull: 'sail', windKn: 30 };
