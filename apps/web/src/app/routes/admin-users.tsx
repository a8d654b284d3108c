import type { UserDto } from '@app/shared';
import { useQueryClient } from '@tanstack/react-query';
import { Page } from '@/components/ui/page';
import { UserRolesPanel } from '@/features/admin/components/user-roles-panel';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { updateSessionUser } from '@/features/auth/api/session-cache';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { AdminSections } from '../layout/admin-sections';

function AdminUsersScreen() {
  const { user } = useCurrentUser();
  const queryClient = useQueryClient();
  if (!user) return null;
  // When admins change their own roles, the navigation must follow at once.
  const handleRolesChanged = (saved: UserDto) => {
    if (saved.id === user.id) updateSessionUser(queryClient, saved);
  };
  return (
    <Page
      title="Users and roles"
      intro={
        <p>
          Tick a box to grant a role; untick it to revoke (you'll be asked first). Every change can
          be undone straight after.
        </p>
      }
    >
      <AdminSections />
      <UserRolesPanel currentUserId={user.id} onRolesChanged={handleRolesChanged} />
    </Page>
  );
}

/** Admins grant and revoke roles. */
export function AdminUsersRoute() {
  return (
    <RequireAuth roles={['admin']}>
      <AdminUsersScreen />
    </RequireAuth>
  );
}
