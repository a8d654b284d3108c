import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { applyServerErrors } from '@/lib/form-errors';
import { useChangePassword } from '../api/change-password';
import { lazyResolver } from '@/lib/lazy-schema';

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
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm({ resolver, defaultValues: EMPTY });

  const onSubmit = handleSubmit(async ({ currentPassword, newPassword }) => {
    try {
      await change.mutateAsync({ currentPassword, newPassword });
      reset(EMPTY);
    } catch (error) {
      applyServerErrors(error, setError, ['currentPassword', 'newPassword']);
    }
  });

  return (
    <form noValidate onSubmit={(event) => void onSubmit(event)} className="flex flex-col gap-4">
      <FormError message={errors.root?.server?.message} />
      {change.isSuccess && <Alert tone="success">Your password is changed.</Alert>}
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        required
        error={errors.currentPassword?.message}
        {...register('currentPassword')}
      />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        required
        error={errors.newPassword?.message}
        {...register('newPassword')}
      />
      <TextField
        label="Repeat new password"
        type="password"
        autoComplete="new-password"
        required
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
    </form>
  );
}
