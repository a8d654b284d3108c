import type { Role, UserDto } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { adminUserKeys } from './keys';

export interface SetUserRolesVariables {
  userId: number;
  roles: Role[];
}

/** PUT /api/admin/users/:userId/roles; 409 when an admin drops their own admin role. */
export const setUserRoles = ({ userId, roles }: SetUserRolesVariables) =>
  apiFetch<{ user: UserDto }>(`/admin/users/${userId}/roles`, { method: 'PUT', body: { roles } });

/** Replaces a user's roles and patches every cached users list with the answer. */
export function useSetUserRoles() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setUserRoles,
    onSuccess: ({ user }) => {
      queryClient.setQueriesData<UserDto[]>({ queryKey: adminUserKeys.lists() }, (old) =>
        old?.map((candidate) => (candidate.id === user.id ? user : candidate)),
      );
      return queryClient.invalidateQueries({ queryKey: adminUserKeys.lists() });
    },
  });
}
