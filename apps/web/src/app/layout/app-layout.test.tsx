import '@/testing/setup';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

const club = { name: 'Gullwing Cove Cruising Club', harbors: [] };

function api(session = buildSession(null)) {
  return mockApi({
    'GET /api/club': () => ({ body: { data: club } }),
    'GET /api/auth/me': () => ({ body: { data: session } }),
    'POST /api/auth/logout': () => ({ body: { data: buildSession(null, 'after-logout') } }),
    'GET /api/admin/users': () => ({ body: { data: [] } }),
  });
}

const mainNav = () => screen.findByRole('navigation', { name: 'Main' });

describe('app shell', () => {
  it('shows a visitor Home, Sign in and Join, the club name and the safety line', async () => {
    api();
    renderApp({ route: '/' });
    expect(
      await within(await mainNav()).findByRole('link', { name: 'Sign in' }),
    ).toBeInTheDocument();
    expect(within(await mainNav()).getByRole('link', { name: 'Join' })).toBeInTheDocument();
    expect(within(await mainNav()).queryByRole('link', { name: 'Admin' })).not.toBeInTheDocument();
    expect(within(await mainNav()).getByRole('link', { name: 'Home' })).toHaveAttribute(
      'aria-current',
      'page',
    );
    expect(await screen.findAllByText(/Gullwing Cove Cruising Club/)).not.toHaveLength(0);
    expect(screen.getByRole('contentinfo')).toHaveTextContent(
      "Ground-tackle figures are guidance, not a substitute for the maker's ratings, local regulations or a qualified rigger or surveyor.",
    );
    expect(screen.getByRole('main')).toHaveAttribute('id', 'main');
    expect(screen.getByRole('link', { name: 'Skip to content' })).toHaveAttribute('href', '#main');
  });

  it('greets a signed-in admin and shows Admin, Account and Sign out', async () => {
    const admin = buildUser({ displayName: 'Ada Admin', roles: ['member', 'admin'] });
    api(buildSession(admin));
    renderApp({ route: '/' });
    expect(
      await screen.findByRole('heading', { name: 'Welcome back, Ada Admin' }),
    ).toBeInTheDocument();
    const nav = await mainNav();
    expect(within(nav).getByRole('link', { name: 'Admin' })).toBeInTheDocument();
    expect(within(nav).getByRole('link', { name: 'Settings' })).toBeInTheDocument();
    expect(within(nav).getByRole('button', { name: 'Sign out' })).toBeInTheDocument();
    expect(within(nav).queryByRole('link', { name: 'Sign in' })).not.toBeInTheDocument();
  });

  it('opens and closes the phone menu with its button', async () => {
    api();
    renderApp({ route: '/' });
    const user = userEvent.setup();
    const button = await screen.findByRole('button', { name: 'Menu' });
    expect(button).toHaveAttribute('aria-expanded', 'false');
    await user.click(button);
    expect(button).toHaveAttribute('aria-expanded', 'true');
    const list = document.getElementById(button.getAttribute('aria-controls') ?? '');
    expect(list).toHaveClass('flex');
    await user.keyboard('{Escape}');
    expect(button).toHaveAttribute('aria-expanded', 'false');
  });

  it('signs out and falls back to the visitor navigation', async () => {
    const { requests } = api(buildSession(buildUser({ displayName: 'Kim' }), 'member-token'));
    renderApp({ route: '/account' });
    const user = userEvent.setup();
    await user.click(await within(await mainNav()).findByRole('button', { name: 'Sign out' }));
    expect(
      await within(await mainNav()).findByRole('link', { name: 'Sign in' }),
    ).toBeInTheDocument();
    const logout = requests.find((request) => request.url === '/api/auth/logout');
    expect(logout?.headers['x-csrf-token']).toBe('member-token');
    await waitFor(() =>
      expect(screen.getByRole('heading', { name: 'Welcome aboard' })).toBeInTheDocument(),
    );
  });

  it('sends a visitor from a members-only page to sign in, with the way back', async () => {
    api();
    const { location } = renderApp({ route: '/account' });
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(location.current.pathname).toBe('/sign-in');
    expect(location.current.search).toBe('?next=%2Faccount');
  });

  it('tells a member without the admin role that the admin page is not for them', async () => {
    api(buildSession(buildUser({ roles: ['member'] })));
    renderApp({ route: '/admin/users' });
    expect(await screen.findByText('Not available with your roles')).toBeInTheDocument();
  });

  it('shows a plain page for an unknown address', async () => {
    api();
    renderApp({ route: '/no/such/page' });
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeInTheDocument();
  });
});
