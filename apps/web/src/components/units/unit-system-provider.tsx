import type { UnitSystem } from '@app/calc';
import { useMemo, useState, type ReactNode } from 'react';
import { UnitSystemContext } from '@/lib/units/unit-system-context';
import { readStoredUnitSystem, storeUnitSystem } from '@/lib/units/unit-preference';
import { clubLocale } from '@/lib/club-locale';

export interface UnitSystemProviderProps {
  /** The signed-in member's stored choice; undefined for a visitor. */
  memberSystem?: UnitSystem;
  /** Saves a member's new choice (PATCH /api/account); not called for visitors. */
  onMemberChange?: (system: UnitSystem) => void;
  children: ReactNode;
}

/**
 * Supplies the display system: a member's stored choice, else this browser's, else the club's default. A change
 * applies at once, is remembered in this browser and, for a member, saved through `onMemberChange`.
 */
export function UnitSystemProvider({
  memberSystem,
  onMemberChange,
  children,
}: UnitSystemProviderProps) {
  const [chosen, setChosen] = useState<UnitSystem | undefined>(undefined);
  const system = chosen ?? memberSystem ?? readStoredUnitSystem() ?? clubLocale().unitSystem;
  const value = useMemo(
    () => ({
      system,
      setSystem: (next: UnitSystem) => {
        setChosen(next);
        storeUnitSystem(next);
        if (memberSystem !== undefined && next !== memberSystem) onMemberChange?.(next);
      },
    }),
    [system, memberSystem, onMemberChange],
  );
  return <UnitSystemContext value={value}>{children}</UnitSystemContext>;
}
