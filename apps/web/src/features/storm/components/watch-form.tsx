import type { HarborDto, StormWatchInput } from '@app/shared';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { CheckboxGroup } from '@/components/ui/checkbox-group';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { sendChecked } from '@/lib/form-errors';
import { loadFormSchemas, preloadFormSchemas } from '@/lib/lazy-schema';

preloadFormSchemas();

interface FormValues {
  name: string;
  sustainedKn: string;
  gustKn: string;
  surgeM: string;
  arrivesAt: string;
  endsAt: string;
  harborIds: string[];
  note: string;
  shareDetails: boolean;
}

const FIELDS = [
  'name',
  'sustainedKn',
  'gustKn',
  'surgeM',
  'arrivesAt',
  'endsAt',
  'harborIds',
  'note',
] as const;

/** A datetime-local value ("2026-12-10T06:00", the browser's zone) as an ISO instant, or '' when empty. */
const toIso = (local: string) => {
  const ms = Date.parse(local);
  return Number.isNaN(ms) ? local : new Date(ms).toISOString();
};
const num = (s: string) => (s.trim() === '' ? Number.NaN : Number(s));

const toInput = (v: FormValues): StormWatchInput => ({
  name: v.name,
  sustainedKn: num(v.sustainedKn),
  gustKn: num(v.gustKn),
  surgeM: num(v.surgeM || '0'),
  arrivesAt: toIso(v.arrivesAt),
  endsAt: toIso(v.endsAt),
  harborIds: v.harborIds.map(Number),
  note: v.note,
  shareDetails: v.shareDetails,
});

export interface WatchFormProps {
  harbors: readonly HarborDto[];
  isPending: boolean;
  onSubmit: (input: StormWatchInput) => Promise<unknown>;
}

/** Opening a storm watch: the storm's name, forecast wind and gusts, timing, harbours and a note. */
export function WatchForm({ harbors, isPending, onSubmit }: WatchFormProps) {
  const form = useForm<FormValues>({
    defaultValues: {
      name: '',
      sustainedKn: '',
      gustKn: '',
      surgeM: '0',
      arrivesAt: '',
      endsAt: '',
      harborIds: [],
      note: '',
      shareDetails: false,
    },
  });
  const { register, handleSubmit, setError, formState } = form;
  const errors = formState.errors;
  const submit = handleSubmit(async (v) =>
    sendChecked(
      (await loadFormSchemas()).stormWatchInputSchema,
      toInput(v),
      onSubmit,
      setError,
      FIELDS,
    ),
  );
  return (
    <form onSubmit={(e) => void submit(e)} noValidate className="flex max-w-2xl flex-col gap-4">
      <TextField
        label="Storm or watch name"
        required
        {...register('name')}
        error={errors.name?.message}
      />
      <div className="grid gap-4 sm:grid-cols-3">
        <TextField
          label="Peak sustained wind (kn)"
          inputMode="decimal"
          required
          {...register('sustainedKn')}
          error={errors.sustainedKn?.message}
        />
        <TextField
          label="Gusts (kn)"
          inputMode="decimal"
          required
          hint="Plans are checked at the gust figure."
          {...register('gustKn')}
          error={errors.gustKn?.message}
        />
        <TextField
          label="Storm surge (m)"
          inputMode="decimal"
          hint="Added to each plan's tide."
          {...register('surgeM')}
          error={errors.surgeM?.message}
        />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Expected arrival"
          type="datetime-local"
          required
          {...register('arrivesAt')}
          error={errors.arrivesAt?.message}
        />
        <TextField
          label="Expected end"
          type="datetime-local"
          required
          {...register('endsAt')}
          error={errors.endsAt?.message}
        />
      </div>
      <CheckboxGroup
        legend="Harbours affected"
        options={harbors.map((h) => ({ value: String(h.id), label: h.name }))}
        {...register('harborIds')}
        error={errors.harborIds?.message}
      />
      <div className="flex flex-col gap-1">
        <label htmlFor="watch-note" className="text-sm font-bold">
          Note to members
        </label>
        <textarea
          id="watch-note"
          rows={4}
          {...register('note')}
          className="rounded-md border border-sand-500 bg-sand-50 px-3 py-2"
        />
        {errors.note && <p className="text-sm font-bold text-flare-700">{errors.note.message}</p>}
      </div>
      <label className="flex min-h-11 items-center gap-2">
        <input type="checkbox" {...register('shareDetails')} className="size-5" />
        Members may see each other’s readiness details (otherwise only boat, name and status)
      </label>
      <FormError message={errors.root?.server?.message} />
      <div>
        <Button type="submit" isPending={isPending} pendingLabel="Opening…">
          Open the watch and notify members
        </Button>
      </div>
    </form>
  );
}
