import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { Page } from '@/components/ui/page';
import { safeNextPath } from '@/config/paths';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { SignInForm } from '@/features/auth/components/sign-in-form';

/** Sign-in; afterwards back to `?next=` (a path inside the app) or home. */
export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const { user } = useCurrentUser();
  const next = safeNextPath(params.get('next'));
  if (user) return <Navigate to={next} replace />;
  return (
    <Page title="Sign in" width="narrow">
      <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
    </Page>
  );
}
