import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';
import { lazyResolver } from '@/lib/lazy-schema';
import { useAccountForm } from '../hooks/use-account-form';
import { AccountForm, PasswordField } from './account-form';

const resolver = lazyResolver(({ passwordSchema, z }) =>
  z
    .object({ password: passwordSchema, confirmPassword: z.string() })
    .refine((values) => values.password === values.confirmPassword, {
      path: ['confirmPassword'],
      message: "The two passwords don't match",
    }),
);

export interface ResetPasswordFormProps {
  token: string;
}

function isDeadLink(error: unknown): boolean {
  return (
    error instanceof ApiError &&
    (error.code === 'GONE' || (error.code === 'VALIDATION_FAILED' && 'token' in error.fields))
  );
}

/** Sets a new password with the token from the e-mailed reset link. */
export function ResetPasswordForm({ token }: ResetPasswordFormProps) {
  const confirm = useConfirmPasswordReset();
  const { register, errors, frame } = useAccountForm({
    resolver,
    defaultValues: { password: '', confirmPassword: '' },
    fields: ['password'],
    send: ({ password }) => confirm.mutateAsync({ token, password }),
    // A used or expired link replaces the form with its own message.
    isShownElsewhere: isDeadLink,
  });

  if (confirm.isSuccess) {
    return (
      <Alert tone="success" title="Password changed">
        <p>
          You can now <Link to={paths.signIn.href()}>sign in</Link> with your new password.
        </p>
      </Alert>
    );
  }
  if (isDeadLink(confirm.error)) {
    return (
      <Alert tone="error" title="This reset link no longer works">
        <p>
          It has been used already or has expired.{' '}
          <Link to={paths.resetPassword.href()}>Ask for a new link</Link>.
        </p>
      </Alert>
    );
  }

  return (
    <AccountForm {...frame}>
      <PasswordField
        label="New password"
        isNew
        hint="At least 10 characters."
        error={errors.password?.message}
        {...register('password')}
      />
      <PasswordField
        label="Repeat new password"
        isNew
        error={errors.confirmPassword?.message}
        {...register('confirmPassword')}
      />
      <Button type="submit" isPending={confirm.isPending} pendingLabel="Saving…">
        Save new password
      </Button>
    </AccountForm>
  );
}
