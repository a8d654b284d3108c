import type { SessionDto } from '@app/shared';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/form-errors';
import { useLogin } from '../api/login';
import { useResendVerification } from '../api/resend-verification';
import { lazyResolver } from '@/lib/lazy-schema';
import { useAccountForm } from '../hooks/use-account-form';

const resolver = lazyResolver((schemas) => schemas.loginSchema);
import { AccountForm, EmailField, PasswordField } from './account-form';

export interface SignInFormProps {
  onSignedIn: (session: SessionDto) => void;
}

const FIELDS = ['email', 'password'] as const;

const isUnverified = (error: unknown) =>
  error instanceof ApiError && error.code === 'EMAIL_NOT_VERIFIED';

/** E-mail + password sign-in, with a resend offer when the address is not verified yet. */
export function SignInForm({ onSignedIn }: SignInFormProps) {
  const login = useLogin();
  const resend = useResendVerification();
  const [unverifiedEmail, setUnverifiedEmail] = useState<string | null>(null);
  const { register, errors, frame } = useAccountForm({
    resolver,
    defaultValues: { email: '', password: '' },
    fields: FIELDS,
    send: async (input) => {
      setUnverifiedEmail(null);
      resend.reset();
      try {
        onSignedIn(await login.mutateAsync(input));
      } catch (error) {
        if (isUnverified(error)) setUnverifiedEmail(input.email);
        throw error;
      }
    },
    // An address not confirmed yet gets the resend offer instead of a field message.
    isShownElsewhere: isUnverified,
  });

  return (
    <AccountForm {...frame}>
      {unverifiedEmail && (
        <Alert
          tone="warning"
          title="Please confirm your e-mail address first"
          action={
            <Button
              size="sm"
              variant="secondary"
              isPending={resend.isPending}
              disabled={resend.isSuccess}
              onClick={() => resend.mutate({ email: unverifiedEmail })}
            >
              Send a new link
            </Button>
          }
        >
          <p>We sent a confirmation link to {unverifiedEmail} when you joined.</p>
          {resend.isSuccess && <p className="mt-1 font-bold">A new link is on its way.</p>}
          {resend.isError && <p className="mt-1 font-bold">{errorMessage(resend.error)}</p>}
        </Alert>
      )}
      <EmailField error={errors.email?.message} {...register('email')} />
      <PasswordField label="Password" error={errors.password?.message} {...register('password')} />
      <Button type="submit" isPending={login.isPending} pendingLabel="Signing in…">
        Sign in
      </Button>
      <p className="text-sm">
        <Link to={paths.resetPassword.href()}>Forgot your password?</Link>
      </p>
      <p className="text-sm">
        New to the club? <Link to={paths.signUp.href()}>Create an account</Link>
      </p>
    </AccountForm>
  );
}
