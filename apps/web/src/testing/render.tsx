import type { SessionDto } from '@app/shared';
import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter, type RouteObject } from 'react-router-dom';
import { AppProvider } from '@/app/provider';
import { APP_ROUTES } from '@/app/router';
import { authKeys } from '@/features/auth/api/keys';
import { setCsrfToken } from '@/lib/api-client';
import { createQueryClient } from '@/lib/query-client';
import { RoutesWithProbe, type LocationRef } from './routes-with-probe';

export interface RenderOptions {
  /** Where the memory router starts. */
  route?: string;
  /** Put this session in the cache up front (skips GET /api/auth/me). */
  session?: SessionDto;
}

function setup(routes: RouteObject[], { route = '/', session }: RenderOptions) {
  const queryClient = createQueryClient();
  queryClient.setDefaultOptions({ queries: { retry: false, staleTime: Infinity } });
  if (session) {
    queryClient.setQueryData(authKeys.session(), session);
    setCsrfToken(session.csrfToken);
  }
  const location = {} as LocationRef;
  const view = render(
    <AppProvider queryClient={queryClient}>
      <MemoryRouter initialEntries={[route]}>
        <RoutesWithProbe routes={routes} locationRef={location} />
      </MemoryRouter>
    </AppProvider>,
  );
  return { ...view, location, queryClient };
}

/** Renders `ui` as the only screen of a memory router, with a fresh query cache. */
export function renderWithProviders(ui: ReactNode, options: RenderOptions = {}) {
  return setup([{ path: '*', element: ui }], options);
}

/** Renders the whole app (layout, navigation, lazy screens) at `options.route`. */
export function renderApp(options: RenderOptions = {}) {
  return setup(APP_ROUTES, options);
}
