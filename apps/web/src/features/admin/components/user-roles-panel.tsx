import type { Role, UserDto } from '@app/shared';
import { ROLES } from '@app/shared/values';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { EmptyState } from '@/components/ui/empty-state';
import { Spinner } from '@/components/ui/spinner';
import { TextField } from '@/components/ui/text-field';
import { errorMessage } from '@/lib/form-errors';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { useUsers } from '../api/get-users';
import { useSetUserRoles } from '../api/set-user-roles';
import { ROLE_LABELS } from './role-labels';
import { UserRolesTable } from './user-roles-table';

export interface UserRolesPanelProps {
  currentUserId: number;
  /** Called with the saved user after every change (and undo), e.g. to refresh the own session. */
  onRolesChanged?: (user: UserDto) => void;
}

interface LastChange {
  userId: number;
  previousRoles: Role[];
  summary: string;
}

type Notice = { tone: 'success' | 'error'; text: string; canUndo: boolean } | null;

/** Keeps the roles in the order the shared contract lists them. */
const ordered = (roles: Role[]) => ROLES.filter((role) => roles.includes(role));

/** Search users, grant and revoke roles (revoking asks first), and undo the last change. */
export function UserRolesPanel({ currentUserId, onRolesChanged }: UserRolesPanelProps) {
  const [search, setSearch] = useState('');
  const query = useDebouncedValue(search);
  const users = useUsers(query);
  const setRoles = useSetUserRoles();
  const [revoke, setRevoke] = useState<{ user: UserDto; role: Role } | null>(null);
  const [lastChange, setLastChange] = useState<LastChange | null>(null);
  const [notice, setNotice] = useState<Notice>(null);

  const save = (user: UserDto, roles: Role[], summary: string) => {
    setNotice(null);
    setRoles.mutate(
      { userId: user.id, roles: ordered(roles) },
      {
        onSuccess: ({ user: saved }) => {
          setLastChange({ userId: user.id, previousRoles: user.roles, summary });
          setNotice({ tone: 'success', text: summary, canUndo: true });
          onRolesChanged?.(saved);
        },
        onError: (error) => setNotice({ tone: 'error', text: errorMessage(error), canUndo: false }),
        onSettled: () => setRevoke(null),
      },
    );
  };

  const handleToggle = (user: UserDto, role: Role, isChecked: boolean) => {
    if (isChecked) {
      save(
        user,
        [...user.roles, role],
        `${user.displayName} now has the ${ROLE_LABELS[role]} role.`,
      );
    } else {
      setRevoke({ user, role });
    }
  };

  const handleUndo = () => {
    if (!lastChange) return;
    setRoles.mutate(
      { userId: lastChange.userId, roles: lastChange.previousRoles },
      {
        onSuccess: ({ user: saved }) => {
          setLastChange(null);
          setNotice({ tone: 'success', text: `Undone: ${lastChange.summary}`, canUndo: false });
          onRolesChanged?.(saved);
        },
        onError: (error) => setNotice({ tone: 'error', text: errorMessage(error), canUndo: false }),
      },
    );
  };

  return (
    <div className="flex flex-col gap-4">
      <TextField
        label="Search users"
        type="search"
        hint="Part of a name or e-mail address."
        value={search}
        onChange={(event) => setSearch(event.target.value)}
        className="max-w-md"
      />
      {notice && (
        <Alert
          tone={notice.tone}
          action={
            notice.canUndo && lastChange ? (
              <Button
                size="sm"
                variant="secondary"
                onClick={handleUndo}
                isPending={setRoles.isPending}
              >
                Undo
              </Button>
            ) : undefined
          }
        >
          <p>{notice.text}</p>
        </Alert>
      )}
      {users.isPending ? (
        <Spinner label="Loading users…" />
      ) : users.isError ? (
        <Alert tone="error" title="Couldn't load users">
          <p>{errorMessage(users.error)}</p>
        </Alert>
      ) : users.data.length === 0 ? (
        <EmptyState title="No users found">
          {query ? <p>No one matches “{query}”. Try part of a name or address.</p> : null}
        </EmptyState>
      ) : (
        <UserRolesTable
          users={users.data}
          currentUserId={currentUserId}
          busyUserId={setRoles.isPending ? (setRoles.variables?.userId ?? null) : null}
          onToggle={handleToggle}
        />
      )}
      <ConfirmDialog
        isOpen={revoke !== null}
        title={
          revoke ? `Revoke ${ROLE_LABELS[revoke.role]} from ${revoke.user.displayName}?` : 'Revoke?'
        }
        confirmLabel="Revoke role"
        isDestructive
        isPending={setRoles.isPending}
        onCancel={() => setRevoke(null)}
        onConfirm={() => {
          if (!revoke) return;
          const { user, role } = revoke;
          save(
            user,
            user.roles.filter((held) => held !== role),
            `${user.displayName} no longer has the ${ROLE_LABELS[role]} role.`,
          );
        }}
      >
        <p>They lose what the role allows from their next request. You can undo straight after.</p>
      </ConfirmDialog>
    </div>
  );
}
