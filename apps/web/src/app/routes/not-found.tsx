import { Link } from 'react-router-dom';
import { Page } from '@/components/ui/page';
import { paths } from '@/config/paths';

/** Any path no route matches. */
export function NotFoundRoute() {
  return (
    <Page title="Page not found" width="narrow">
      <p>
        There's nothing at this address. <Link to={paths.home.href()}>Go to the home page</Link>.
      </p>
    </Page>
  );
}
