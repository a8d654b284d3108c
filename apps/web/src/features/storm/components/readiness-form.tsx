import type { ReadinessDto, ReadinessInput, StormChecklistItem, StormLocation } from '@app/shared';
import { STORM_LOCATION_LABELS, STORM_LOCATIONS } from '@app/shared/values';
import { useForm, useWatch } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { CheckboxGroup } from '@/components/ui/checkbox-group';
import { FormError } from '@/components/ui/form-error';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { sendChecked } from '@/lib/form-errors';
import { loadFormSchemas, preloadFormSchemas } from '@/lib/lazy-schema';

preloadFormSchemas();

interface FormValues {
  location: StormLocation | '';
  planId: string;
  depthM: string;
  ticked: string[];
  helpWanted: boolean;
  helpNote: string;
}

const FIELDS = ['location', 'planId', 'depthM', 'ticked', 'helpNote'] as const;

const toInput = (v: FormValues): ReadinessInput => ({
  location: v.location === '' ? null : v.location,
  planId: v.planId ? Number(v.planId) : null,
  depthM: v.depthM.trim() === '' ? null : Number(v.depthM),
  ticked: v.ticked,
  helpWanted: v.helpWanted,
  helpNote: v.helpNote,
});

export interface ReadinessFormProps {
  readiness: ReadinessDto;
  checklist: readonly StormChecklistItem[];
  plans: ReadonlyArray<{ id: number; name: string; windKn: number }>;
  isPending: boolean;
  onSubmit: (input: ReadinessInput) => Promise<unknown>;
}

/** Where the boat will be, on which plan, the checklist ticks and the help-wanted flag. */
export function ReadinessForm({
  readiness,
  checklist,
  plans,
  isPending,
  onSubmit,
}: ReadinessFormProps) {
  const d = readiness.details;
  const { register, handleSubmit, setError, formState, control } = useForm<FormValues>({
    defaultValues: {
      location: d?.location ?? '',
      planId: d?.planId ? String(d.planId) : '',
      depthM: d?.depthM !== null && d?.depthM !== undefined ? String(d.depthM) : '',
      ticked: d?.ticked ?? [],
      helpWanted: d?.helpWanted ?? false,
      helpNote: d?.helpNote ?? '',
    },
  });
  const errors = formState.errors;
  const helpWanted = useWatch({ control, name: 'helpWanted' });
  const submit = handleSubmit(async (v) =>
    sendChecked(
      (await loadFormSchemas()).readinessInputSchema,
      toInput(v),
      onSubmit,
      setError,
      FIELDS,
    ),
  );
  return (
    <form onSubmit={(e) => void submit(e)} noValidate className="flex max-w-2xl flex-col gap-4">
      <SelectField
        label="Where the boat will be"
        options={[
          { value: '', label: 'Not decided yet' },
          ...STORM_LOCATIONS.map((l) => ({ value: l, label: STORM_LOCATION_LABELS[l] })),
        ]}
        {...register('location')}
        error={errors.location?.message}
      />
      <SelectField
        label="Tackle plan"
        hint={
          plans.length === 0
            ? 'This boat has no saved plans yet: save one from the boat page to have it checked.'
            : 'Checked against the forecast gust.'
        }
        options={[
          { value: '', label: 'No plan' },
          ...plans.map((p) => ({ value: String(p.id), label: `${p.name} (${p.windKn} kn)` })),
        ]}
        {...register('planId')}
        error={errors.planId?.message}
      />
      <TextField
        label="Depth where the boat will lie (m)"
        inputMode="decimal"
        hint="Leave empty to use the plan's depth. The forecast surge is added to the plan's tide."
        {...register('depthM')}
        error={errors.depthM?.message}
      />
      <CheckboxGroup
        legend="Checklist"
        options={checklist.map((item) => ({ value: item.id, label: item.label }))}
        {...register('ticked')}
        error={errors.ticked?.message}
      />
      <label className="flex min-h-11 items-center gap-2 font-bold">
        <input type="checkbox" {...register('helpWanted')} className="size-5" />
        Help wanted with this boat
      </label>
      {helpWanted && (
        <TextField
          label="What help you need"
          {...register('helpNote')}
          error={errors.helpNote?.message}
        />
      )}
      <FormError message={errors.root?.server?.message} />
      <div>
        <Button type="submit" isPending={isPending} pendingLabel="Saving…">
          Save readiness
        </Button>
      </div>
    </form>
  );
}
