import { useSearchParams } from 'react-router-dom';
import { Page } from '@/components/ui/page';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';
import { ResetRequestForm } from '@/features/auth/components/reset-request-form';

/** Without a token: ask for a reset link. With `?token=` (the e-mailed link): choose a new password. */
export function ResetPasswordRoute() {
  const [params] = useSearchParams();
  const token = params.get('token');
  if (token) {
    return (
      <Page title="Choose a new password" width="narrow">
        <ResetPasswordForm token={token} />
      </Page>
    );
  }
  return (
    <Page
      title="Reset your password"
      width="narrow"
      intro={<p>Enter the address you joined with and we'll e-mail you a link.</p>}
    >
      <ResetRequestForm />
    </Page>
  );
}
