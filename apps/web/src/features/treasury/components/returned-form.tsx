import type { returnedInputSchema, PaymentDto, ReturnedInput } from '@app/shared';
import { METHOD_LABELS, OFFLINE_METHODS } from '@app/shared/values';
import { formatMoney } from '@app/shared/locale';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { DialogButtons } from '@/components/ui/dialog-buttons';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { ApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/form-errors';
import { lazyResolver } from '@/lib/lazy-schema';

const resolver = lazyResolver((schemas) => schemas.returnedInputSchema);

type FormValues = z.input<typeof returnedInputSchema>;

/**
 * Records that the money went back outside the payment provider (it could not refund the card): how, and a
 * required note. All that is left of the payment counts as returned; the member is mailed what happened.
 */
export function ReturnedForm({
  payment,
  leftMinor,
  onSubmit,
  onCancel,
}: {
  payment: PaymentDto;
  leftMinor: number;
  onSubmit: (input: ReturnedInput) => Promise<unknown>;
  onCancel: () => void;
}) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<FormValues>({
    resolver,
    defaultValues: { method: 'transfer', note: '' },
  });
  const submit = handleSubmit(async (input) => {
    try {
      await onSubmit(input);
    } catch (error) {
      const fields = error instanceof ApiError ? error.fields : {};
      if (fields.method) setError('method', { type: 'server', message: fields.method });
      if (fields.note) setError('note', { type: 'server', message: fields.note });
      if (!fields.method && !fields.note)
        setError('root.server', { type: 'server', message: errorMessage(error) });
    }
  });
  return (
    <form noValidate onSubmit={(e) => void submit(e)} className="flex flex-col gap-4">
      <p className="text-sm">
        Give the {formatMoney(leftMinor, payment.currency)} back to {payment.memberName} yourself,
        then record it here. The entry stops counting toward their dues and they get an e-mail
        saying how the money came back.
      </p>
      <FormError message={errors.root?.server?.message} />
      <label className="flex flex-col gap-1 font-bold">
        Returned by
        <select
          className="rounded-md border border-sand-300 bg-white px-3 py-2 font-normal"
          aria-invalid={!!errors.method}
          {...register('method')}
        >
          {OFFLINE_METHODS.map((m) => (
            <option key={m} value={m}>
              {m === 'transfer' ? 'Bank transfer' : METHOD_LABELS[m]}
            </option>
          ))}
        </select>
        {errors.method && (
          <span className="text-sm font-normal text-flare-700">{errors.method.message}</span>
        )}
      </label>
      <TextField
        label="Note"
        required
        hint="When and how it went back (transfer reference, receipt number). The member sees it."
        error={errors.note?.message}
        {...register('note')}
      />
      <DialogButtons onCancel={onCancel} isPending={isSubmitting}>
        <Button type="submit" isPending={isSubmitting} pendingLabel="Recording…">
          Record {formatMoney(leftMinor, payment.currency)} returned
        </Button>
      </DialogButtons>
    </form>
  );
}
