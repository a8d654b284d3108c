import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { applyServerErrors } from '@/lib/form-errors';
import { lazyResolver } from '@/lib/lazy-schema';

const resolver = lazyResolver((schemas) => schemas.resetRequestSchema);

export interface EmailRequestFormProps {
  /** Sends the request; resolves when the server accepted it. */
  onRequest: (input: { email: string }) => Promise<unknown>;
  isPending: boolean;
  submitLabel: string;
  /** Shown (as a status message) once the server accepted the request. */
  doneTitle: string;
  doneText: string;
  isDone: boolean;
  defaultEmail?: string;
}

/** One e-mail field that asks for a link (password reset, new verification link). */
export function EmailRequestForm({
  onRequest,
  isPending,
  submitLabel,
  doneTitle,
  doneText,
  isDone,
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
      await onRequest(input);
    } catch (error) {
      applyServerErrors(error, setError, ['email']);
    }
  });

  if (isDone) {
    return (
      <Alert tone="success" title={doneTitle}>
        <p>{doneText}</p>
      </Alert>
    );
  }

  return (
    <form noValidate onSubmit={(event) => void onSubmit(event)} className="flex flex-col gap-4">
      <FormError message={errors.root?.server?.message} />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        required
        error={errors.email?.message}
        {...register('email')}
      />
      <Button type="submit" isPending={isPending} pendingLabel="Sending…">
        {submitLabel}
      </Button>
    </form>
  );
}
