import type { ReactNode } from 'react';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { useUpdateAccount } from '@/features/auth/api/update-account';
import { UnitSystemProvider } from '@/components/units/unit-system-provider';

/**
 * The unit choice for the ground-tackle screens: a member's is read from and saved to their account;
 * a visitor's is kept in this browser.
 */
export function TackleUnits({ children }: { children: ReactNode }) {
  const { user } = useCurrentUser();
  const update = useUpdateAccount();
  return (
    <UnitSystemProvider
      memberSystem={user?.unitSystem}
      onMemberChange={(unitSystem) => update.mutate({ unitSystem })}
    >
      {children}
    </UnitSystemProvider>
  );
}
