import type { UserDto } from '@app/shared';
import { useId } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { useUpdateAccount } from '../api/update-account';
import { lazyResolver } from '@/lib/lazy-schema';
import { useAccountForm } from '../hooks/use-account-form';

const resolver = lazyResolver((schemas) => schemas.updateAccountSchema);
import { AccountForm } from './account-form';

export interface AccountProfileFormProps {
  user: UserDto;
}

const UNIT_CHOICES = [
  { value: 'metric', label: 'Metric', example: 'metres, kilograms, kilonewtons' },
  { value: 'imperial', label: 'Imperial', example: 'feet, pounds, pound-force' },
] as const;

/** Edits the name other members see and the units every figure is shown in. */
export function AccountProfileForm({ user }: AccountProfileFormProps) {
  const update = useUpdateAccount();
  const unitErrorId = useId();
  const { form, register, errors, frame } = useAccountForm({
    resolver,
    defaultValues: { displayName: user.displayName, unitSystem: user.unitSystem },
    fields: ['displayName', 'unitSystem'],
    send: async (input, { reset }) => {
      const { user: saved } = await update.mutateAsync(input);
      reset({ displayName: saved.displayName, unitSystem: saved.unitSystem });
    },
  });
  const { isDirty } = form.formState;

  return (
    <AccountForm {...frame}>
      {update.isSuccess && !isDirty && <Alert tone="success">Your profile is saved.</Alert>}
      <TextField
        label="Your name"
        autoComplete="name"
        required
        error={errors.displayName?.message}
        {...register('displayName')}
      />
      <fieldset
        className="flex flex-col gap-2"
        aria-describedby={errors.unitSystem ? unitErrorId : undefined}
      >
        <legend className="mb-1 text-sm font-bold">Units</legend>
        {UNIT_CHOICES.map((choice) => (
          <label key={choice.value} className="flex min-h-11 items-center gap-3 text-base">
            <input
              type="radio"
              value={choice.value}
              className="size-5 accent-signal-600"
              {...register('unitSystem')}
            />
            <span>
              {choice.label} <span className="text-sm text-ink-600">({choice.example})</span>
            </span>
          </label>
        ))}
        {errors.unitSystem && (
          <p id={unitErrorId} className="text-sm font-bold text-flare-700">
            {errors.unitSystem.message}
          </p>
        )}
      </fieldset>
      <Button
        type="submit"
        isPending={update.isPending}
        pendingLabel="Saving…"
        className="self-start"
      >
        Save profile
      </Button>
    </AccountForm>
  );
}
