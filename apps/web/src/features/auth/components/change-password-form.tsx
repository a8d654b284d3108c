import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { useChangePassword } from '../api/change-password';
import { lazyResolver } from '@/lib/lazy-schema';
import { useAccountForm } from '../hooks/use-account-form';
import { AccountForm, PasswordField } from './account-form';

const resolver = lazyResolver(({ changePasswordSchema, z }) =>
  changePasswordSchema
    .extend({ confirmNewPassword: z.string() })
    .refine((values) => values.newPassword === values.confirmNewPassword, {
      path: ['confirmNewPassword'],
      message: "The two new passwords don't match",
    }),
);

const EMPTY = { currentPassword: '', newPassword: '', confirmNewPassword: '' };

/** Changes the password; the current one is asked for again. */
export function ChangePasswordForm() {
  const change = useChangePassword();
  const { register, errors, frame } = useAccountForm({
    resolver,
    defaultValues: EMPTY,
    fields: ['currentPassword', 'newPassword'],
    send: async ({ currentPassword, newPassword }, form) => {
      await change.mutateAsync({ currentPassword, newPassword });
      form.reset(EMPTY);
    },
  });

  return (
    <AccountForm {...frame}>
      {change.isSuccess && <Alert tone="success">Your password is changed.</Alert>}
      <PasswordField
        label="Current password"
        error={errors.currentPassword?.message}
        {...register('currentPassword')}
      />
      <PasswordField
        label="New password"
        isNew
        hint="At least 10 characters."
        error={errors.newPassword?.message}
        {...register('newPassword')}
      />
      <PasswordField
        label="Repeat new password"
        isNew
        error={errors.confirmNewPassword?.message}
        {...register('confirmNewPassword')}
      />
      <Button
        type="submit"
        isPending={change.isPending}
        pendingLabel="Saving…"
        className="self-start"
      >
        Change password
      </Button>
    </AccountForm>
  );
}
