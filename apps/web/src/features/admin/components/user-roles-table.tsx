import type { Role, UserDto } from '@app/shared';
import { ROLES } from '@app/shared/values';
import { useId } from 'react';
import { ROLE_LABELS } from './role-labels';

export interface UserRolesTableProps {
  users: UserDto[];
  currentUserId: number;
  /** The user whose change is being saved; their boxes are disabled meanwhile. */
  busyUserId: number | null;
  onToggle: (user: UserDto, role: Role, isChecked: boolean) => void;
}

/** One row per user, one checkbox per role. */
export function UserRolesTable({
  users,
  currentUserId,
  busyUserId,
  onToggle,
}: UserRolesTableProps) {
  const selfNoteId = useId();
  return (
    <div className="relative overflow-x-auto rounded-lg border border-sand-300 bg-sand-50 shadow-card">
      <p id={selfNoteId} className="sr-only">
        You can't remove your own admin role; another admin has to.
      </p>
      <table className="w-full border-collapse text-left text-sm max-sm:block">
        <caption className="sr-only">Users and their roles</caption>
        <thead className="bg-sand-200 text-xs text-ink-900 max-sm:hidden">
          <tr>
            <th scope="col" className="px-3 py-2">
              Name
            </th>
            {ROLES.map((role) => (
              <th key={role} scope="col" className="px-2 py-2 text-center">
                {ROLE_LABELS[role]}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="max-sm:block">
          {users.map((user) => {
            const isSelf = user.id === currentUserId;
            return (
              <tr
                key={user.id}
                className="border-t border-sand-300 align-middle first:border-t-0 max-sm:grid max-sm:grid-cols-2 max-sm:px-3 max-sm:py-2 sm:first:border-t"
              >
                <th scope="row" className="px-3 py-2 font-normal max-sm:col-span-2 max-sm:px-0">
                  <span className="block font-bold break-words">
                    {user.displayName}
                    {isSelf && <span className="font-normal text-ink-600"> (you)</span>}
                  </span>
                  <span className="block text-xs break-all text-ink-600">{user.email}</span>
                  {!user.emailVerified && (
                    <span className="mt-1 inline-block rounded-sm bg-signal-50 px-1.5 text-xs text-ink-900">
                      e-mail not confirmed
                    </span>
                  )}
                </th>
                {ROLES.map((role) => {
                  const isLocked = isSelf && role === 'admin' && user.roles.includes('admin');
                  return (
                    <td
                      key={role}
                      className="px-2 py-1 text-center max-sm:px-0 max-sm:text-left sm:py-2"
                    >
                      <label className="inline-flex min-h-11 cursor-pointer items-center gap-2 sm:size-11 sm:justify-center">
                        <input
                          type="checkbox"
                          aria-label={`${ROLE_LABELS[role]} role for ${user.displayName}`}
                          className="size-5 accent-signal-600"
                          checked={user.roles.includes(role)}
                          disabled={isLocked || busyUserId === user.id}
                          aria-describedby={isLocked ? selfNoteId : undefined}
                          onChange={(event) => onToggle(user, role, event.target.checked)}
                        />
                        <span aria-hidden="true" className="sm:sr-only">
                          {ROLE_LABELS[role]}
                        </span>
                      </label>
                    </td>
                  );
                })}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
