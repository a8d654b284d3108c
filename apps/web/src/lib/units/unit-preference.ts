import type { UnitSystem } from '@app/calc';

/** Where a visitor's choice is kept in this browser. */
export const UNIT_STORAGE_KEY = 'rodewise.unitSystem';

const isUnitSystem = (value: unknown): value is UnitSystem =>
  value === 'metric' || value === 'imperial';

/** The system remembered in this browser, or undefined (also when storage is blocked). */
export function readStoredUnitSystem(): UnitSystem | undefined {
  try {
    const value = window.localStorage.getItem(UNIT_STORAGE_KEY);
    return isUnitSystem(value) ? value : undefined;
  } catch {
    return undefined;
  }
}

/** Remembers the system in this browser; a blocked storage is ignored. */
export function storeUnitSystem(system: UnitSystem): void {
  try {
    window.localStorage.setItem(UNIT_STORAGE_KEY, system);
  } catch {
    // Private modes may refuse storage; the choice then lasts for this page only.
  }
}
