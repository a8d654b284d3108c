import type { UnitSystem } from '@app/calc';
import { createContext } from 'react';

/** The display system in force and how to change it. */
export interface UnitSystemState {
  system: UnitSystem;
  setSystem: (system: UnitSystem) => void;
}

/** Metric until a provider says otherwise (tests and screens outside a provider). */
export const UnitSystemContext = createContext<UnitSystemState>({
  system: 'metric',
  setSystem: () => undefined,
});
