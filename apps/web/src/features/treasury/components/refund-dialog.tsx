import type { PaymentDto, RefundInput, ReturnedInput } from '@app/shared';
import { formatMoney } from '@app/shared/locale';
import { useId, useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { DialogButtons } from '@/components/ui/dialog-buttons';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { Modal } from '@/components/ui/modal';
import { ApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/form-errors';
import { minorToInput, moneyMessage, parseMoney } from '../utils/money';
import { refundableMinor } from '../utils/refundable';
import { ReturnedForm } from './returned-form';
import { lazyResolver, type FormSchemaModule } from '@/lib/lazy-schema';

function schemaFor({ refundInputSchema, z }: FormSchemaModule, payment: PaymentDto, left: number) {
  return z
    .object({ amount: z.string(), reason: refundInputSchema.shape.reason })
    .superRefine((v, ctx) => {
      const minor = parseMoney(v.amount, payment.currency);
      let message: string | null = null;
      if (minor === null) message = moneyMessage('Amount', payment.currency);
      else if (minor <= 0) message = 'The amount must be more than zero';
      else if (minor > left)
        message = `At most ${formatMoney(left, payment.currency)} is left to refund`;
      if (message) ctx.addIssue({ code: 'custom', path: ['amount'], message });
    });
}
type FormValues = { amount: string; reason: string };

export interface RefundDialogProps {
  payment: PaymentDto;
  onSubmit: (input: RefundInput) => Promise<unknown>;
  /** Records money handed back outside the provider; offered when the provider cannot refund the payment. */
  onReturned?: (input: ReturnedInput) => Promise<unknown>;
  /** Open straight on "Record money returned" (the provider is known not to be able to refund it). */
  startReturned?: boolean;
  onClose: () => void;
}

/**
 * Asks how much to refund (all that is left by default, or part of it) and why, on the native <dialog>: focus
 * goes to the amount, Escape cancels, focus returns where it was. The dialog stays open with the server's
 * message when the refund is refused.
 */
export function RefundDialog({
  payment,
  onSubmit,
  onReturned,
  startReturned = false,
  onClose,
}: RefundDialogProps) {
  const titleId = useId();
  const left = refundableMinor(payment);
  const [mode, setMode] = useState<'refund' | 'returned'>(startReturned ? 'returned' : 'refund');
  // The provider said no (409): the dialog offers recording the money handed back another way.
  const [refused, setRefused] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    setFocus,
    formState: { errors, isSubmitting },
  } = useForm<FormValues>({
    resolver: useMemo(
      () => lazyResolver((schemas) => schemaFor(schemas, payment, left)),
      [payment, left],
    ),
    defaultValues: { amount: minorToInput(left, payment.currency), reason: '' },
  });

  const submit = handleSubmit(async ({ amount, reason }) => {
    try {
      await onSubmit({ amountMinor: parseMoney(amount, payment.currency) ?? 0, reason });
      onClose();
    } catch (error) {
      const fields = error instanceof ApiError ? error.fields : {};
      if (error instanceof ApiError && error.status === 409 && onReturned) setRefused(true);
      if (fields.amountMinor) setError('amount', { type: 'server', message: fields.amountMinor });
      if (fields.reason) setError('reason', { type: 'server', message: fields.reason });
      if (!fields.amountMinor && !fields.reason)
        setError('root.server', { type: 'server', message: errorMessage(error) });
    }
  });

  return (
    <Modal
      labelledBy={titleId}
      onShown={() => {
        if (!startReturned) setFocus('amount', { shouldSelect: true });
      }}
      onCancel={onClose}
    >
      {mode === 'returned' && onReturned ? (
        <div className="flex flex-col gap-4 p-5">
          <h2 id={titleId} className="text-xl">
            Record money returned to {payment.memberName}
          </h2>
          <ReturnedForm
            payment={payment}
            leftMinor={left}
            onCancel={onClose}
            onSubmit={async (input) => {
              await onReturned(input);
              onClose();
            }}
          />
        </div>
      ) : (
        <form noValidate onSubmit={(e) => void submit(e)} className="flex flex-col gap-4 p-5">
          <h2 id={titleId} className="text-xl">
            Refund {payment.memberName}
          </h2>
          <p className="text-sm">
            Paid {formatMoney(payment.amountMinor, payment.currency)}
            {payment.method === 'card' ? ' by card' : ''}; {formatMoney(left, payment.currency)} can
            still be refunded.{' '}
            {payment.method === 'card'
              ? 'The card is refunded through the payment provider; the entry updates when the provider confirms.'
              : 'Record this once you have handed the money back; it counts at once.'}
          </p>
          <FormError message={errors.root?.server?.message} />
          {refused && onReturned && (
            <div className="flex flex-col gap-2 rounded-md border border-sand-300 bg-white p-3 text-sm">
              <p>
                The card cannot be refunded through the payment provider. If you give the money back
                by bank transfer, cash or cheque, record it so the ledger and the member’s dues show
                it.
              </p>
              <Button variant="secondary" onClick={() => setMode('returned')}>
                Record money returned
              </Button>
            </div>
          )}
          <TextField
            label={`Amount to refund (${payment.currency})`}
            inputMode="decimal"
            required
            hint="All that is left, or less for a part refund."
            error={errors.amount?.message}
            {...register('amount')}
          />
          <TextField
            label="Reason"
            required
            hint="Kept in the ledger and the audit log."
            error={errors.reason?.message}
            {...register('reason')}
          />
          <DialogButtons onCancel={onClose} isPending={isSubmitting}>
            <Button
              type="submit"
              variant="danger"
              isPending={isSubmitting}
              pendingLabel="Refunding…"
            >
              Refund
            </Button>
          </DialogButtons>
        </form>
      )}
    </Modal>
  );
}
