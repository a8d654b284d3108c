import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { lazyResolver } from '@/lib/lazy-schema';
import { useAccountForm } from '../hooks/use-account-form';

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
  const { register, errors, frame } = useAccountForm({
    resolver,
    defaultValues: { email: defaultEmail },
    fields: ['email'],
    send: (input) => request.mutateAsync(input),
  });

  if (request.isSuccess) {
    return (
      <Alert tone="success" title={doneTitle}>
        <p>{doneText}</p>
      </Alert>
    );
  }

  return (
    <AccountForm {...frame}>
      <EmailField error={errors.email?.message} {...register('email')} />
      <Button type="submit" isPending={request.isPending} pendingLabel="Sending…">
        {submitLabel}
      </Button>
    </AccountForm>
  );
}
