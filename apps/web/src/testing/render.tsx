import type { SessionDto } from '@app/shared';
import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { createMemoryRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import { AppProvider } from '@/app/provider';
import { APP_ROUTES } from '@/app/router';
import { authKeys } from '@/features/auth/api/keys';
import { setCsrfToken } from '@/lib/api-client';
import { createQueryClient } from '@/lib/query-client';

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
  const router = createMemoryRouter(routes, { initialEntries: [route] });
  const view = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...view, router, queryClient };
}

/** Renders `ui` as the only screen of a memory router, with a fresh query cache. */
export function renderWithProviders(ui: ReactNode, options: RenderOptions = {}) {
  return setup([{ path: '*', element: ui }], options);
}

/** Renders the whole app (layout, navigation, lazy screens) at `options.route`. */
export function renderApp(options: RenderOptions = {}) {
  return setup(APP_ROUTES, options);
}
