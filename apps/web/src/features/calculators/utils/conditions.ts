import { designLoad, type BottomType, type HullType } from '@app/calc';
import type { BoatDto } from '@app/shared';
import { createContext, useContext, useState } from 'react';
import { HULL_TYPES } from '@app/calc';
import { pick } from './options';

/** The boat and conditions every calculator on the page starts from. */
export interface CalcConditions {
  loaM: number | undefined;
  beamM: number | undefined;
  hull: HullType;
  windKn: number | undefined;
  depthM: number | undefined;
  bowHeightM: number | undefined;
  tideM: number | undefined;
  bottom: BottomType | '';
}

export const DEFAULT_CONDITIONS: CalcConditions = {
  loaM: 10,
  beamM: 3.4,
  hull: 'sail',
  windKn: 30,
  depthM: 6,
  bowHeightM: 1.2,
  tideM: 1.5,
  bottom: '',
};

export interface ConditionsState {
  conditions: CalcConditions;
  setConditions: (next: CalcConditions) => void;
  /** The steady load of the boat above in the wind above (ABYC H-40 table), when it can be worked out. */
  loadN: number | undefined;
}

/** The design load for `c`, or undefined while a field is missing or out of the table's reach. */
export function sharedLoadN(c: CalcConditions): number | undefined {
  if (c.loaM === undefined || c.windKn === undefined) return undefined;
  try {
    return designLoad({
      loaM: c.loaM,
      hull: c.hull,
      windKn: c.windKn,
      extrapolate: true,
      ...(c.beamM === undefined ? {} : { beamM: c.beamM }),
    }).loadN;
  } catch {
    return undefined;
  }
}

export const ConditionsContext = createContext<ConditionsState>({
  conditions: DEFAULT_CONDITIONS,
  setConditions: () => undefined,
  loadN: sharedLoadN(DEFAULT_CONDITIONS),
});

export const useConditions = () => useContext(ConditionsContext);

/**
 * A calculator's inputs, some of which (`shared`) follow the block at the top until the member types over one of
 * them here; from then on the calculator keeps its own copy of those until `follow()` is called. Inputs that are
 * the calculator's alone (`start` minus `shared`) are its own throughout.
 */
export function useLinkedState<S extends object, K extends keyof S>(start: S, shared: Pick<S, K>) {
  const keys = Object.keys(shared) as K[];
  const [local, setLocal] = useState<S>(start);
  const [own, setOwn] = useState<Pick<S, K> | null>(null);
  const value: S = { ...local, ...(own ?? shared) };
  const set = (patch: Partial<S>) => {
    const sharedPart = Object.fromEntries(
      keys.filter((k) => k in patch).map((k) => [k, patch[k]]),
    ) as Partial<Pick<S, K>>;
    if (Object.keys(sharedPart).length > 0) setOwn((o) => ({ ...(o ?? shared), ...sharedPart }));
    setLocal((l) => ({ ...l, ...patch }));
  };
  return { value, set, own: own !== null, follow: () => setOwn(null) };
}

/** Fills the block from a saved boat; wind, depth, tide and bottom stay as they are. */
export function conditionsFromBoat(c: CalcConditions, boat: BoatDto): CalcConditions {
  return {
    ...c,
    loaM: boat.loaM,
    beamM: boat.beamM ?? undefined,
    hull: pick(boat.hull, HULL_TYPES, 'sail'),
    bowHeightM: boat.bowHeightM,
  };
}
