import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { applyServerErrors } from '@/lib/form-errors';
import { lazyResolver } from '@/lib/lazy-schema';

const resolver = lazyResolver((schemas) => schemas.resetRequestSchema);
import { AccountForm, EmailField } from './account-form';

export interface EmailRequestFormProps {
  /** The request's mutation; `mutateAsync` resolves when the server accepted it. */
  request: {
    mutateAsync: (input: { email: string }) => Promise<unknown>;
    isPending: boolean;
    isSuccess: boolean;
  };
  submitLabel: string;
  /** Shown (as a status message) once the server accepted the request. */
  doneTitle: string;
  doneText: string;
  defaultEmail?: string;
}

/** One e-mail field that asks for a link (password reset, new verification link). */
export function EmailRequestForm({
  request,
  submitLabel,
  doneTitle,
  doneText,
  defaultEmail = '',
}: EmailRequestFormProps) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({
    resolver,
    defaultValues: { email: defaultEmail },
  });

  const onSubmit = handleSubmit(async (input) => {
    try {
      await request.mutateAsync(input);
    } catch (error) {
      applyServerErrors(error, setError, ['email']);
    }
  });

  if (request.isSuccess) {
    return (
      <Alert tone="success" title={doneTitle}>
        <p>{doneText}</p>
      </Alert>
    );
  }

  return (
    <AccountForm onSubmit={onSubmit} serverError={errors.root?.server?.message}>
      <EmailField error={errors.email?.message} {...register('email')} />
      <Button type="submit" isPending={request.isPending} pendingLabel="Sending…">
        {submitLabel}
      </Button>
    </AccountForm>
  );
}
