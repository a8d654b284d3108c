import type { SessionDto } from '@app/shared';
import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter, type Location, type RouteObject } from 'react-router-dom';
import { AppProvider } from '../app/provider';
import { AppRoutes } from '../app/app-routes';
import { LocationProbe, Screens } from './router-probes';
import { authKeys } from '../features/auth/api/keys';
import { setCsrfToken } from '../lib/api-client';
import { createQueryClient } from '../lib/query-client';

export interface RenderOptions {
  /** Where the memory router starts. */
  route?: string;
  /** Put this session in the cache up front (skips GET /api/auth/me). */
  session?: SessionDto;
}

function setup(routes: RouteObject[] | 'app', { route = '/', session }: RenderOptions) {
  const queryClient = createQueryClient();
  queryClient.setDefaultOptions({ queries: { retry: false, staleTime: Infinity } });
  if (session) {
    queryClient.setQueryData(authKeys.session(), session);
    setCsrfToken(session.csrfToken);
  }
  const whereRef: { current?: Location } = {};
  const view = render(
    <AppProvider queryClient={queryClient}>
      <MemoryRouter initialEntries={[route]}>
        <LocationProbe intoRef={whereRef} />
        {routes === 'app' ? <AppRoutes /> : <Screens routes={routes} />}
      </MemoryRouter>
    </AppProvider>,
  );
  /** The memory router's current location. */
  const location = () => {
    if (!whereRef.current) throw new Error('the router has not rendered');
    return whereRef.current;
  };
  return { ...view, location, queryClient };
}

/** Renders `ui` as the only screen of a memory router, with a fresh query cache. */
export function renderWithProviders(ui: ReactNode, options: RenderOptions = {}) {
  return setup([{ path: '*', element: ui }], options);
}

/** Renders the whole app (layout, navigation, lazy screens) at `options.route`. */
export function renderApp(options: RenderOptions = {}) {
  return setup('app', options);
}
