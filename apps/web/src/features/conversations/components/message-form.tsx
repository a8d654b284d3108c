import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { applyServerErrors } from '@/lib/form-errors';
import { useSendMessage } from '../api/send-message';
import { lazyResolver } from '@/lib/lazy-schema';

const resolver = lazyResolver((schemas) => schemas.messageInputSchema);

export interface MessageFormProps {
  /** Reply in this thread… */
  threadId?: number;
  /** …or start one about this listing. */
  listingId?: number;
  label: string;
  submitLabel: string;
  onSent?: (threadId: number) => void;
}

/** Writes a message to the other party; they get it by e-mail too. */
export function MessageForm({ threadId, listingId, label, submitLabel, onSent }: MessageFormProps) {
  const send = useSendMessage();
  const { register, handleSubmit, reset, setError, formState } = useForm({
    resolver,
    defaultValues: { body: '' },
  });
  const onSubmit = handleSubmit((v) =>
    send.mutate(
      { threadId, listingId, body: v.body },
      {
        onSuccess: (t) => {
          reset();
          onSent?.(t.id);
        },
        onError: (e) => applyServerErrors(e, setError, ['body']),
      },
    ),
  );
  const error = formState.errors.body?.message;
  return (
    <form onSubmit={(e) => void onSubmit(e)} className="flex flex-col gap-2" noValidate>
      <label htmlFor={`msg-${threadId ?? listingId}`} className="text-sm font-bold">
        {label}
      </label>
      <textarea
        id={`msg-${threadId ?? listingId}`}
        rows={3}
        aria-invalid={error ? true : undefined}
        className="w-full rounded-md border border-sand-500 bg-sand-50 p-3"
        {...register('body')}
      />
      {error && <p className="text-sm font-bold text-flare-700">{error}</p>}
      {formState.errors.root?.server && (
        <Alert tone="error">{formState.errors.root.server.message}</Alert>
      )}
      <div>
        <Button type="submit" isPending={send.isPending}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
