import { errorMessage } from '@/lib/form-errors';
import { Alert } from './alert';
import { Spinner } from './spinner';

export interface ErrorAlertProps {
  title: string;
  /** The failed request's error; only its safe message is shown. */
  error: unknown;
}

/** A failed request as an error box: a title and the message the server gave (never a stack trace). */
export function ErrorAlert({ title, error }: ErrorAlertProps) {
  return (
    <Alert tone="error" title={title}>
      <p>{errorMessage(error)}</p>
    </Alert>
  );
}

export interface QueryStatusProps {
  query: { isPending: boolean; isError: boolean; error: unknown };
  /** The spinner's label while the request runs. */
  loadingLabel: string;
  /** The error box's title when it failed. */
  errorTitle: string;
}

/** A query's loading and failed states: a spinner while it runs, an error box if it failed, else nothing. */
export function QueryStatus({ query, loadingLabel, errorTitle }: QueryStatusProps) {
  if (query.isPending) return <Spinner label={loadingLabel} />;
  if (query.isError) return <ErrorAlert title={errorTitle} error={query.error} />;
  return null;
}
