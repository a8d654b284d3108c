import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';

function describe(error: unknown): string {
  // A screen's code failed to download, usually after a new release or when offline.
  if (
    error instanceof TypeError &&
    /dynamically imported module|Importing a module/i.test(error.message)
  ) {
    return 'Part of Rodewise did not load. Check your connection and reload the page.';
  }
  return errorMessage(error);
}

/** Shown when a screen throws: a plain message and a way on, never a stack trace. */
export function RouteErrorScreen({ error }: { error: unknown }) {
  return (
    <Page title="Something went wrong" width="narrow">
      <Alert tone="error">
        <p>{describe(error)}</p>
      </Alert>
      <p className="flex flex-wrap gap-4">
        <button
          type="button"
          className="font-bold underline"
          onClick={() => window.location.reload()}
        >
          Reload the page
        </button>
        <Link to={paths.home.href()}>Go to the home page</Link>
      </p>
    </Page>
  );
}
