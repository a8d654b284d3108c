import { useContext } from 'react';
import { UnitSystemContext, type UnitSystemState } from './unit-system-context';

/** The display system chosen by the nearest `UnitSystemProvider`. */
export function useUnits(): UnitSystemState {
  return useContext(UnitSystemContext);
}
