import { useSearchParams } from 'react-router-dom';
import { Page } from '@/components/ui/page';
import { VerifyEmailStatus } from '@/features/auth/components/verify-email-status';

/** The e-mailed confirmation link lands here (`/verify-email?token=…`). */
export function VerifyEmailRoute() {
  const [params] = useSearchParams();
  return (
    <Page title="Confirm your e-mail" width="narrow">
      <VerifyEmailStatus token={params.get('token') ?? ''} />
    </Page>
  );
}
