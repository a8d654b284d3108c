import '@/testing/setup';
import { waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { OLD_PATHS, paths } from '@/config/paths';
import { buildSession, buildUser } from '@/testing/builders';
import { mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

// Bookmarks and mailed links from before the glossary's renames keep working: each old address redirects to the
// new one, with its ids and its query string.
describe('old addresses', () => {
  it.each([
    ['/plans/31?print=1', paths.tacklePlan.href(31), '?print=1'],
    ['/notifications', paths.notices.href(), ''],
    ['/notifications/stop-digest?token=7.abc', '/notices/stop-digest', '?token=7.abc'],
    ['/treasury/plans', paths.membershipPlans.href(), ''],
  ])('%s goes to %s', async (from, toPath, search) => {
    mockApi({});
    const session = buildSession(buildUser({ roles: ['member', 'treasurer'] }));
    const { location } = renderApp({ route: from, session });
    await waitFor(() => expect(location.current.pathname).toBe(toPath));
    expect(location.current.search).toBe(search);
  });

  it('covers every old address the router knows', () => {
    expect(OLD_PATHS.map((p) => p.from).sort()).toEqual(
      ['/notifications', '/notifications/stop-digest', '/plans/:planId', '/treasury/plans'].sort(),
    );
  });
});
