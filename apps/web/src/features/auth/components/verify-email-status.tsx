import { useEffect, useRef } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/form-errors';
import { useVerifyEmail } from '../api/verify-email';
import { useResendVerification } from '../api/resend-verification';
import { EmailRequestForm } from './email-request-form';

export interface VerifyEmailStatusProps {
  token: string;
}

const isDeadLink = (error: unknown) =>
  error instanceof ApiError && ['GONE', 'VALIDATION_FAILED', 'NOT_FOUND'].includes(error.code);

/** Sends the token from the e-mailed link once, then says how it went; a dead link offers a new one. */
export function VerifyEmailStatus({ token }: VerifyEmailStatusProps) {
  const verify = useVerifyEmail();
  const resend = useResendVerification();
  const { mutate } = verify;
  // A token works once: never post the same one twice (StrictMode runs effects twice in development).
  const sentToken = useRef<string | null>(null);

  useEffect(() => {
    if (!token || sentToken.current === token) return;
    sentToken.current = token;
    mutate({ token });
  }, [token, mutate]);

  if (!token || isDeadLink(verify.error)) {
    return (
      <div className="flex flex-col gap-4">
        <Alert tone="error" title="This confirmation link doesn't work">
          <p>
            {token
              ? 'It has been used already or has expired.'
              : 'The link is incomplete. Open it straight from the e-mail, or ask for a new one.'}
          </p>
        </Alert>
        <h2 className="text-lg">Send a new link</h2>
        <EmailRequestForm
          request={resend}
          submitLabel="Send a new link"
          doneTitle="Check your inbox"
          doneText="If that address belongs to an account that still needs confirming, a new link is on its way."
        />
      </div>
    );
  }
  if (verify.isError) {
    return (
      <Alert tone="error" title="Couldn't confirm your address">
        <p>{errorMessage(verify.error)}</p>
      </Alert>
    );
  }
  if (verify.isSuccess) {
    return (
      <Alert tone="success" title="Your e-mail address is confirmed">
        <p>
          Thank you, {verify.data.user.displayName}. You can now{' '}
          <Link to={paths.signIn.href()}>sign in</Link>.
        </p>
      </Alert>
    );
  }
  return <Spinner label="Confirming your address…" />;
}
