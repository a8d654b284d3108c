import {
  CLUB_REGIONS,
  formatDate,
  formatMoney,
  formatNumber,
  type ClubLocale,
} from '@app/shared/locale';
import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { ApiError } from '@/lib/api-client';
import { useSetClubLocale } from '../api/set-club-locale';

const SAMPLE_DATE = '2026-10-23';

/** The club's region (dates, numbers, money), the currency new prices start in, and new members' units. */
export function ClubLocaleForm({ initial }: { initial: ClubLocale }) {
  const [value, setValue] = useState<ClubLocale>(initial);
  const [saved, setSaved] = useState(false);
  const save = useSetClubLocale();
  const fields = save.error instanceof ApiError ? save.error.fields : {};
  const formError = save.error && !Object.keys(fields).length ? save.error.message : undefined;
  const set = (patch: Partial<ClubLocale>) => {
    setSaved(false);
    setValue((v) => ({ ...v, ...patch }));
  };
  const submit = (e: FormEvent) => {
    e.preventDefault();
    save.mutate(value, { onSuccess: () => setSaved(true) });
  };
  let sample: string;
  try {
    sample = `${formatDate(SAMPLE_DATE, value.region)} · ${formatNumber(1234.5, 1, value.region)} · ${formatMoney(12050, value.currency.toUpperCase(), value.region)}`;
  } catch {
    sample = 'Give a three-letter currency code to see a sample.';
  }
  return (
    <form onSubmit={submit} className="flex max-w-xl flex-col gap-4" noValidate>
      <FormError message={formError} />
      <SelectField
        label="Region"
        hint="Sets how dates, numbers and money read everywhere, in the app and in e-mails. The wording stays in English."
        options={CLUB_REGIONS.map((r) => ({ value: r.tag, label: r.label }))}
        value={value.region}
        onChange={(e) => set({ region: e.target.value as ClubLocale['region'] })}
        error={fields.region}
      />
      <TextField
        label="Currency"
        hint="Three letters (ISO 4217), e.g. EUR, GBP, USD. New dues plans and listings start in it; existing prices keep theirs."
        value={value.currency}
        maxLength={3}
        autoCapitalize="characters"
        onChange={(e) => set({ currency: e.target.value })}
        error={fields.currency}
      />
      <SelectField
        label="Units for visitors and new members"
        hint="Each member can still switch on any tackle screen."
        options={[
          { value: 'metric', label: 'Metric (m, kg, kN)' },
          { value: 'imperial', label: 'Imperial (ft, lb, lbf)' },
        ]}
        value={value.unitSystem}
        onChange={(e) => set({ unitSystem: e.target.value === 'imperial' ? 'imperial' : 'metric' })}
        error={fields.unitSystem}
      />
      <p className="text-sm">
        <span className="font-bold">Reads as:</span>{' '}
        <span data-testid="locale-sample">{sample}</span>
      </p>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" isPending={save.isPending} pendingLabel="Saving…">
          Save club locale
        </Button>
        {saved && (
          <p role="status" className="text-sm font-bold text-ink-800">
            Saved. Pages you open from now on use it.
          </p>
        )}
      </div>
    </form>
  );
}
