import { useRoutes } from 'react-router-dom';
import { ErrorCatcher } from './layout/screen-boundary';
import { APP_ROUTES } from './router';

/** The app's routes inside a `<BrowserRouter>` (or a `<MemoryRouter>` in tests), under the outermost error boundary. */
export function AppRoutes() {
  return <ErrorCatcher>{useRoutes(APP_ROUTES)}</ErrorCatcher>;
}
