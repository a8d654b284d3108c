import type { SessionDto } from '@app/shared';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { applyServerErrors, errorMessage } from '@/lib/form-errors';
import { useLogin } from '../api/login';
import { useResendVerification } from '../api/resend-verification';
import { lazyResolver } from '@/lib/lazy-schema';

const resolver = lazyResolver((schemas) => schemas.loginSchema);
import { AccountForm, EmailField, PasswordField } from './account-form';

export interface SignInFormProps {
  onSignedIn: (session: SessionDto) => void;
}

const FIELDS = ['email', 'password'] as const;

/** E-mail + password sign-in, with a resend offer when the address is not verified yet. */
export function SignInForm({ onSignedIn }: SignInFormProps) {
  const login = useLogin();
  const resend = useResendVerification();
  const [unverifiedEmail, setUnverifiedEmail] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver, defaultValues: { email: '', password: '' } });

  const onSubmit = handleSubmit(async (input) => {
    setUnverifiedEmail(null);
    resend.reset();
    try {
      onSignedIn(await login.mutateAsync(input));
    } catch (error) {
      if (error instanceof ApiError && error.code === 'EMAIL_NOT_VERIFIED') {
        setUnverifiedEmail(input.email);
        return;
      }
      applyServerErrors(error, setError, FIELDS);
    }
  });

  return (
    <AccountForm onSubmit={onSubmit} serverError={errors.root?.server?.message}>
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
