import '@/testing/setup';
import type { Role, UserDto } from '@app/shared';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { errorReply, mockApi, type MockRequest } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { UserRolesPanel } from './user-roles-panel';

const admin = buildUser({ id: 1, displayName: 'Ada Admin', roles: ['member', 'admin'] });

/** A tiny in-memory users API: GET lists (filtered by q), PUT replaces roles. */
function usersApi(initial: UserDto[]) {
  const users = new Map(initial.map((user) => [user.id, user]));
  const roleRoutes: Record<string, (request: MockRequest) => { body: unknown }> = {};
  for (const user of initial) {
    roleRoutes[`PUT /api/admin/users/${user.id}/roles`] = (request) => {
      const roles = (request.body as { roles: Role[] }).roles;
      const saved = { ...user, ...users.get(user.id), roles };
      users.set(user.id, saved);
      return { body: { data: { user: saved } } };
    };
  }
  return mockApi({
    'GET /api/admin/users': (request) => {
      const q = new URL(request.url, 'http://app.test').searchParams.get('q') ?? '';
      const list = [...users.values()].filter((user) =>
        `${user.displayName} ${user.email}`.toLowerCase().includes(q.toLowerCase()),
      );
      return { body: { data: list } };
    },
    ...roleRoutes,
  });
}

const puts = (requests: MockRequest[]) => requests.filter((request) => request.method === 'PUT');

describe('UserRolesPanel', () => {
  it('grants a role with one PUT to the user’s roles endpoint and offers undo', async () => {
    const kim = buildUser({ id: 7, displayName: 'Kim Kelp', roles: ['member'] });
    const { requests } = usersApi([admin, kim]);
    const onRolesChanged = vi.fn();
    renderWithProviders(
      <UserRolesPanel currentUserId={admin.id} onRolesChanged={onRolesChanged} />,
      {
        session: buildSession(admin, 'csrf-admin'),
      },
    );
    const user = userEvent.setup();

    const box = await screen.findByRole('checkbox', { name: 'Moderator role for Kim Kelp' });
    expect(box).not.toBeChecked();
    await user.click(box);

    expect(await screen.findByText('Kim Kelp now has the Moderator role.')).toBeInTheDocument();
    expect(puts(requests)).toEqual([
      expect.objectContaining({
        url: '/api/admin/users/7/roles',
        body: { roles: ['member', 'moderator'] },
        headers: expect.objectContaining({ 'x-csrf-token': 'csrf-admin' }) as unknown,
      }),
    ]);
    await waitFor(() => expect(box).toBeChecked());
    expect(onRolesChanged).toHaveBeenCalledWith(expect.objectContaining({ id: 7 }));

    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(await screen.findByText(/^Undone:/)).toBeInTheDocument();
    expect(puts(requests).at(-1)).toMatchObject({
      url: '/api/admin/users/7/roles',
      body: { roles: ['member'] },
    });
    await waitFor(() => expect(box).not.toBeChecked());
  });

  it('asks before revoking, and sends nothing when cancelled', async () => {
    const sam = buildUser({ id: 8, displayName: 'Sam Sand', roles: ['member', 'treasurer'] });
    const { requests } = usersApi([admin, sam]);
    renderWithProviders(<UserRolesPanel currentUserId={admin.id} />, {
      session: buildSession(admin),
    });
    const user = userEvent.setup();

    await user.click(await screen.findByRole('checkbox', { name: 'Treasurer role for Sam Sand' }));
    const dialog = await screen.findByRole('dialog', { name: 'Revoke Treasurer from Sam Sand?' });
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(puts(requests)).toHaveLength(0);

    await user.click(screen.getByRole('checkbox', { name: 'Treasurer role for Sam Sand' }));
    await user.click(
      within(await screen.findByRole('dialog')).getByRole('button', { name: 'Revoke role' }),
    );
    expect(
      await screen.findByText('Sam Sand no longer has the Treasurer role.'),
    ).toBeInTheDocument();
    expect(puts(requests)).toEqual([
      expect.objectContaining({ url: '/api/admin/users/8/roles', body: { roles: ['member'] } }),
    ]);
  });

  it('shows the server’s refusal as an error', async () => {
    const lee = buildUser({ id: 9, displayName: 'Lee Line', roles: ['member'] });
    mockApi({
      'GET /api/admin/users': () => ({ body: { data: [admin, lee] } }),
      'PUT /api/admin/users/9/roles': () =>
        errorReply(409, 'CONFLICT', 'That change is not allowed'),
    });
    renderWithProviders(<UserRolesPanel currentUserId={admin.id} />, {
      session: buildSession(admin),
    });
    await userEvent.click(await screen.findByRole('checkbox', { name: 'Admin role for Lee Line' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('That change is not allowed');
  });

  it('locks the admin’s own admin box', async () => {
    usersApi([admin]);
    renderWithProviders(<UserRolesPanel currentUserId={admin.id} />, {
      session: buildSession(admin),
    });
    const own = await screen.findByRole('checkbox', { name: 'Admin role for Ada Admin' });
    expect(own).toBeDisabled();
    expect(own).toHaveAccessibleDescription(/can't remove your own admin role/);
  });

  it('searches by name or address', async () => {
    const { requests } = usersApi([
      admin,
      buildUser({ id: 10, displayName: 'Kim Kelp' }),
      buildUser({ id: 11, displayName: 'Sam Sand' }),
    ]);
    renderWithProviders(<UserRolesPanel currentUserId={admin.id} />, {
      session: buildSession(admin),
    });
    await screen.findByRole('checkbox', { name: 'Member role for Sam Sand' });

    await userEvent.type(screen.getByRole('searchbox', { name: 'Search users' }), 'kelp');
    await waitFor(() =>
      expect(
        screen.queryByRole('checkbox', { name: 'Member role for Sam Sand' }),
      ).not.toBeInTheDocument(),
    );
    expect(screen.getByRole('checkbox', { name: 'Member role for Kim Kelp' })).toBeInTheDocument();
    expect(requests.some((request) => request.url === '/api/admin/users?q=kelp')).toBe(true);

    await userEvent.clear(screen.getByRole('searchbox', { name: 'Search users' }));
    await userEvent.type(screen.getByRole('searchbox', { name: 'Search users' }), 'nobody');
    expect(await screen.findByText('No users found')).toBeInTheDocument();
  });
});
