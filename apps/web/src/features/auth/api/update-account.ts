import type { UpdateAccountInput, UserDto } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { updateSessionUser } from './session-cache';

/** PATCH /api/account. */
export const updateAccount = (input: UpdateAccountInput) =>
  apiFetch<{ user: UserDto }>('/account', { method: 'PATCH', body: input });

/** Saves name and units; the cached session shows the change at once. */
export function useUpdateAccount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateAccount,
    onSuccess: ({ user }) => updateSessionUser(queryClient, user),
  });
}
