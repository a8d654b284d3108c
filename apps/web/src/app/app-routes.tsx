import { useRoutes } from 'react-router-dom';
import { ErrorCatcher } from './layout/screen-boundary';
import { APP_ROUTES } from './router';

/**
 * The app's routes for a `<BrowserRouter>` (or a `<MemoryRouter>` in tests). Declarative routing keeps the data
 * router (loaders, actions, fetchers: about 17 KB gzipped) out of the entry chunk; the app uses none of it.
 */
export function AppRoutes() {
  return <ErrorCatcher>{useRoutes(APP_ROUTES)}</ErrorCatcher>;
}
