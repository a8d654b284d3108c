import { useResendVerification } from '../api/resend-verification';
import { EmailRequestForm } from './email-request-form';

/** Asks for a new e-mail confirmation link. */
export function ResendVerificationForm() {
  const resend = useResendVerification();
  return (
    <EmailRequestForm
      onRequest={resend.mutateAsync}
      isPending={resend.isPending}
      isDone={resend.isSuccess}
      submitLabel="Send a new link"
      doneTitle="Check your inbox"
      doneText="If that address belongs to an account that still needs confirming, a new link is on its way."
    />
  );
}
