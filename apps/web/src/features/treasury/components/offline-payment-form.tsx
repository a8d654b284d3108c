import type { OfflinePaymentInput, PlanDto, RosterRowDto } from '@app/shared';
import { METHOD_LABELS, OFFLINE_METHODS } from '@app/shared/values';
import { currencyDigits, formatMoney } from '@app/shared/locale';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { ApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import { minorToInput } from '../utils/money';
import type { z } from 'zod';
import { lazyResolver, type FormSchemaModule } from '@/lib/lazy-schema';

// The shared schema, with the amount typed as a decimal (120.50) instead of minor units.
const formSchema = ({ offlinePaymentSchema, z }: FormSchemaModule) =>
  offlinePaymentSchema.omit({ amountMinor: true }).extend({
    amount: z
      .string()
      .trim()
      .regex(/^\d+([.,]\d{1,2})?$/, 'Give an amount such as 120 or 120.50 (no minus sign)'),
  });
const resolver = lazyResolver(formSchema);
type FormValues = z.input<ReturnType<typeof formSchema>>;
const FIELDS = [
  'userId',
  'planId',
  'method',
  'amount',
  'currency',
  'receivedOn',
  'reference',
  'note',
] as const;

const selectClass = 'rounded-md border border-sand-300 bg-white px-3 py-2';

/** Records a cheque, cash or bank-transfer payment for a member. */
export function OfflinePaymentForm({
  members,
  plans,
  isPending,
  onSubmit,
}: {
  members: RosterRowDto[];
  plans: PlanDto[];
  isPending: boolean;
  onSubmit: (input: OfflinePaymentInput) => Promise<unknown>;
}) {
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    reset,
    formState: { errors },
  } = useForm<FormValues>({
    resolver,
    defaultValues: {
      method: 'cheque',
      currency: plans[0]?.currency ?? 'EUR',
      receivedOn: new Date().toISOString().slice(0, 10),
      reference: '',
      note: '',
      amount: '',
    },
  });
  const [owedHint, setOwedHint] = useState('');
  // Choosing a member fills their plan and what they owe now (the roster's figure: prorated, late fee when due);
  // the treasurer can still change either before recording.
  const prefill = (userId: number) => {
    const m = members.find((x) => x.userId === userId);
    const plan = plans.find((p) => p.id === m?.planId);
    if (!m || !plan) {
      setOwedHint(m ? 'No plan yet: choose one and type the amount received.' : '');
      return;
    }
    setValue('planId', plan.id, { shouldValidate: false });
    setValue('currency', plan.currency);
    if (m.owedMinor > 0) {
      setValue('amount', minorToInput(m.owedMinor, plan.currency));
      setOwedHint(
        `${m.displayName} owes ${formatMoney(m.owedMinor, plan.currency)} now on ${plan.name} (prorated and late fee included where they apply).`,
      );
    } else {
      setValue('amount', '');
      setOwedHint(`${m.displayName} owes nothing now; a payment is credited to the next year.`);
    }
  };
  const userField = register('userId', { valueAsNumber: true });
  const submit = handleSubmit(async ({ amount, ...rest }) => {
    const digits = currencyDigits(rest.currency);
    const amountMinor = Math.round(Number(amount.replace(',', '.')) * 10 ** digits);
    try {
      await onSubmit({ ...rest, amountMinor });
      reset();
      setOwedHint('');
    } catch (error) {
      const amountError = error instanceof ApiError ? error.fields.amountMinor : undefined;
      if (amountError) setError('amount', { type: 'server', message: amountError });
      applyServerErrors(error, setError, FIELDS);
    }
  });
  return (
    <form
      noValidate
      onSubmit={(e) => void submit(e)}
      className="grid max-w-2xl gap-3 sm:grid-cols-2"
    >
      <FormError message={errors.root?.server?.message} />
      <label className="flex flex-col gap-1 font-bold">
        Member
        <select
          className={selectClass}
          {...userField}
          onChange={(e) => {
            void userField.onChange(e);
            prefill(Number(e.target.value));
          }}
          aria-invalid={!!errors.userId}
          aria-describedby={owedHint ? 'offline-owed-hint' : undefined}
        >
          <option value="">Choose…</option>
          {members.map((m) => (
            <option key={m.userId} value={m.userId}>
              {m.displayName}
            </option>
          ))}
        </select>
        {errors.userId && <span className="text-sm text-flare-700">{errors.userId.message}</span>}
        {owedHint && (
          <span id="offline-owed-hint" className="text-sm font-normal text-ink-700">
            {owedHint}
          </span>
        )}
      </label>
      <label className="flex flex-col gap-1 font-bold">
        Plan
        <select
          className={selectClass}
          {...register('planId', { valueAsNumber: true })}
          aria-invalid={!!errors.planId}
        >
          <option value="">Choose…</option>
          {plans.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name}
            </option>
          ))}
        </select>
        {errors.planId && <span className="text-sm text-flare-700">{errors.planId.message}</span>}
      </label>
      <label className="flex flex-col gap-1 font-bold">
        Method
        <select className={selectClass} {...register('method')}>
          {OFFLINE_METHODS.map((m) => (
            <option key={m} value={m}>
              {METHOD_LABELS[m]}
            </option>
          ))}
        </select>
      </label>
      <TextField
        label="Amount"
        inputMode="decimal"
        required
        error={errors.amount?.message}
        {...register('amount')}
      />
      <TextField
        label="Currency"
        required
        error={errors.currency?.message}
        {...register('currency')}
      />
      <TextField
        label="Received on"
        type="date"
        required
        error={errors.receivedOn?.message}
        {...register('receivedOn')}
      />
      <TextField
        label="Reference"
        hint="Cheque number, receipt number or transfer id"
        required
        error={errors.reference?.message}
        {...register('reference')}
      />
      <TextField label="Note" error={errors.note?.message} {...register('note')} />
      <div className="sm:col-span-2">
        <Button type="submit" isPending={isPending} pendingLabel="Recording…">
          Record payment
        </Button>
      </div>
    </form>
  );
}
