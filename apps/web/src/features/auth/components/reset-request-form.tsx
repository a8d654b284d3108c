import { useRequestPasswordReset } from '../api/request-password-reset';
import { EmailRequestForm } from './email-request-form';

/** Asks for a password-reset link. */
export function ResetRequestForm() {
  const request = useRequestPasswordReset();
  return (
    <EmailRequestForm
      request={request}
      submitLabel="Send reset link"
      doneTitle="Check your inbox"
      doneText="If an account exists for that address, a link to choose a new password is on its way. It works once and expires after a while."
    />
  );
}
