import type { Role } from '@app/shared';
import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { useSession } from '../api/get-session';

export interface RequireAuthProps {
  /** The person needs at least one of these roles; left out: any signed-in person. */
  roles?: readonly Role[];
  children: ReactNode;
}

/**
 * Shows `children` to signed-in people (with one of `roles`, when given); sends visitors to sign-in and
 * back here afterwards. The server checks every request again: this only spares people a dead end.
 */
export function RequireAuth({ roles, children }: RequireAuthProps) {
  const location = useLocation();
  const session = useSession();
  if (session.isPending) return <Spinner label="Checking your session…" />;
  if (session.isError) {
    return (
      <Alert tone="error" title="Couldn't check your session">
        <p>{errorMessage(session.error)}</p>
      </Alert>
    );
  }
  const { user } = session.data;
  if (!user) {
    const next = `${location.pathname}${location.search}`;
    return <Navigate to={paths.signIn.href(next)} replace />;
  }
  if (roles && !roles.some((role) => user.roles.includes(role))) {
    return (
      <Page title="Not available with your roles" width="narrow">
        <Alert tone="warning">
          <p>
            This page needs the {roles.join(' or ')} role. Ask a club admin if you should have it.
          </p>
        </Alert>
      </Page>
    );
  }
  return children;
}
