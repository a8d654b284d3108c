import type { PlanDto, PlanInput } from '@app/shared';
import { PLAN_KIND_LABELS, PLAN_KINDS, PRORATION_LABELS, PRORATIONS } from '@app/shared/values';
import { useForm, type Path } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { ApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/form-errors';
import { lazyResolver, type FormSchemaModule } from '@/lib/lazy-schema';
import { minorToInput, moneyMessage, parseMoney } from '../utils/money';

// The shared plan schema, with money typed as decimals (120.50) and converted to minor units on submit.
const formSchema = ({ planInputSchema, z }: FormSchemaModule) => {
  const shape = planInputSchema.shape;
  return z
    .object({
      code: shape.code,
      name: shape.name,
      kind: z.enum(PLAN_KINDS, { error: 'Choose who the plan is for' }),
      description: z.string().trim().max(500, 'Keep the description under 500 characters'),
      amount: z.string(),
      currency: shape.currency,
      proration: shape.proration,
      lateFee: z.string(),
      graceDays: z
        .number({ error: 'Give the grace period in whole days' })
        .pipe(shape.graceDays.unwrap()),
      active: z.boolean(),
    })
    .superRefine((v, ctx) => {
      const money = [
        ['amount', 'Amount', shape.amountMinor],
        ['lateFee', 'Late fee', shape.lateFeeMinor],
      ] as const;
      for (const [field, label, rule] of money) {
        const minor = parseMoney(v[field], v.currency);
        if (minor === null) {
          ctx.addIssue({ code: 'custom', path: [field], message: moneyMessage(label, v.currency) });
          continue;
        }
        const checked = rule.safeParse(minor);
        if (!checked.success)
          ctx.addIssue({
            code: 'custom',
            path: [field],
            message: checked.error.issues[0]?.message ?? `Check the ${label.toLowerCase()}`,
          });
      }
    });
};
const resolver = lazyResolver(formSchema);
type FormIn = z.input<ReturnType<typeof formSchema>>;
type FormOut = z.output<ReturnType<typeof formSchema>>;

/** Server field names → the form's own (money is typed as decimals here). */
const SERVER_FIELD: Record<string, Path<FormIn>> = {
  code: 'code',
  name: 'name',
  kind: 'kind',
  description: 'description',
  amountMinor: 'amount',
  currency: 'currency',
  proration: 'proration',
  lateFeeMinor: 'lateFee',
  graceDays: 'graceDays',
  active: 'active',
};

function defaultsFor(plan: PlanDto | undefined): FormIn {
  if (!plan)
    return {
      code: '',
      name: '',
      kind: 'individual',
      description: '',
      amount: '',
      currency: 'EUR',
      proration: 'monthly',
      lateFee: '0',
      graceDays: 30,
      active: true,
    };
  return {
    code: plan.code,
    name: plan.name,
    kind: plan.kind,
    description: plan.description,
    amount: minorToInput(plan.amountMinor, plan.currency),
    currency: plan.currency,
    proration: plan.proration,
    lateFee: minorToInput(plan.lateFeeMinor, plan.currency),
    graceDays: plan.graceDays,
    active: plan.active,
  };
}

export interface MembershipPlanFormProps {
  /** The plan being changed; a new plan when absent. */
  plan?: PlanDto;
  isPending: boolean;
  onSubmit: (input: PlanInput) => Promise<unknown>;
  onCancel?: () => void;
}

/**
 * Creates or changes a dues plan. Money is typed as a decimal in the plan's currency; the code is fixed once the
 * plan exists. Server field errors land on the fields they name.
 */
export function MembershipPlanForm({
  plan,
  isPending,
  onSubmit,
  onCancel,
}: MembershipPlanFormProps) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<FormIn, unknown, FormOut>({
    resolver,
    defaultValues: defaultsFor(plan),
  });
  const submit = handleSubmit(async ({ amount, lateFee, ...rest }) => {
    const input: PlanInput = {
      ...rest,
      amountMinor: parseMoney(amount, rest.currency) ?? 0,
      lateFeeMinor: parseMoney(lateFee, rest.currency) ?? 0,
    };
    try {
      await onSubmit(input);
    } catch (error) {
      const fields = error instanceof ApiError ? error.fields : {};
      let placed = 0;
      for (const [name, message] of Object.entries(fields)) {
        const field = SERVER_FIELD[name];
        if (!field) continue;
        setError(field, { type: 'server', message }, { shouldFocus: placed === 0 });
        placed += 1;
      }
      if (placed === 0) setError('root.server', { type: 'server', message: errorMessage(error) });
    }
  });
  const idPrefix = plan ? `plan-${plan.id}` : 'plan-new';
  return (
    <form
      noValidate
      onSubmit={(e) => void submit(e)}
      aria-label={plan ? `Change the ${plan.name} plan` : 'New plan'}
      className="grid gap-4 sm:grid-cols-2"
    >
      <div className="sm:col-span-2">
        <FormError message={errors.root?.server?.message} />
      </div>
      <TextField label="Plan name" required error={errors.name?.message} {...register('name')} />
      <TextField
        label="Code"
        hint={
          plan
            ? 'Fixed once the plan exists; it identifies the plan in the ledger.'
            : '2–40 lower-case letters, digits or dashes, e.g. family-two'
        }
        required
        readOnly={!!plan}
        error={errors.code?.message}
        {...register('code')}
      />
      <SelectField
        label="Who it is for"
        options={PLAN_KINDS.map((k) => ({ value: k, label: PLAN_KIND_LABELS[k] }))}
        error={errors.kind?.message}
        {...register('kind')}
      />
      <TextField
        label="Description"
        hint="Shown to members choosing a plan."
        error={errors.description?.message}
        {...register('description')}
      />
      <TextField
        label="Annual amount"
        inputMode="decimal"
        required
        hint="For a full fiscal year, e.g. 120.00"
        error={errors.amount?.message}
        {...register('amount')}
      />
      <TextField
        label="Currency"
        hint="Three letters, e.g. EUR. Fixed once members have paid on the plan."
        required
        maxLength={3}
        autoCapitalize="characters"
        error={errors.currency?.message}
        {...register('currency')}
      />
      <fieldset
        className="flex flex-col gap-2 sm:col-span-2"
        aria-describedby={errors.proration ? `${idPrefix}-proration-error` : undefined}
      >
        <legend className="text-sm font-bold text-ink-900">
          Members who join after the fiscal year began pay
        </legend>
        {PRORATIONS.map((p) => (
          <label key={p} className="flex min-h-11 items-center gap-2">
            <input type="radio" value={p} className="size-5" {...register('proration')} />
            {PRORATION_LABELS[p]}
          </label>
        ))}
        {errors.proration && (
          <p id={`${idPrefix}-proration-error`} className="text-sm font-bold text-flare-700">
            {errors.proration.message}
          </p>
        )}
      </fieldset>
      <TextField
        label="Late fee"
        inputMode="decimal"
        hint="Added once the grace period has passed; 0 for none."
        error={errors.lateFee?.message}
        {...register('lateFee')}
      />
      <TextField
        label="Grace period (days)"
        type="number"
        inputMode="numeric"
        min={0}
        max={180}
        hint="Days after the due date before the member counts as overdue."
        error={errors.graceDays?.message}
        {...register('graceDays', { valueAsNumber: true })}
      />
      <label className="flex min-h-11 items-center gap-2 sm:col-span-2">
        <input type="checkbox" className="size-5" {...register('active')} />
        <span>
          <span className="font-bold">Open to members.</span> Untick to retire the plan: nobody new
          can join it, and its current members keep it until they move.
        </span>
      </label>
      <p className="text-sm text-ink-700 sm:col-span-2">
        Changes apply to checkouts opened from now on. Payments already made keep the amounts they
        were made for.
      </p>
      <div className="flex flex-col-reverse gap-2 sm:col-span-2 sm:flex-row">
        {onCancel && (
          <Button variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        )}
        <Button type="submit" isPending={isPending} pendingLabel="Saving…">
          {plan ? 'Save changes' : 'Create plan'}
        </Button>
      </div>
    </form>
  );
}
