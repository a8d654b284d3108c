import type { DuesCalendarDto, DuesCalendarInput } from '@app/shared';
import { PRORATION_LABELS } from '@app/shared/values';
import { formatMoney } from '@app/shared/locale';
import { useForm, useWatch } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { applyServerErrors } from '@/lib/form-errors';
import { useCalendarPreview } from '../api/dues-calendar';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { readableDate } from '@/lib/format-date';
import { lazyResolver } from '@/lib/lazy-schema';

const resolver = lazyResolver((schemas) => schemas.duesCalendarSchema);

/** A calendar date as the club's region writes it, with the ISO date kept for machines. */
const Day = ({ iso }: { iso: string }) => <time dateTime={iso}>{readableDate(iso)}</time>;

const MONTHS = Array.from({ length: 12 }, (_, i) => ({
  value: String(i + 1),
  label: new Date(Date.UTC(2001, i, 1)).toLocaleString('en', { month: 'long', timeZone: 'UTC' }),
}));
const FIELDS = [
  'fiscalYearStartMonth',
  'fiscalYearStartDay',
  'renewalWindowDays',
  'lapseAfterDays',
] as const;

/** The fiscal years and the join-today amounts a calendar gives. */
export function CalendarPreview({
  view,
  isProposal,
}: {
  view: DuesCalendarDto;
  isProposal: boolean;
}) {
  return (
    <section
      aria-labelledby="calendar-preview-heading"
      aria-live="polite"
      className="flex flex-col gap-2"
    >
      <h3 id="calendar-preview-heading" className="text-lg">
        {isProposal ? 'With this start (not saved yet)' : 'As saved'}
      </h3>
      <p>
        This fiscal year, <strong>{view.fiscalYear.label}</strong>, runs from{' '}
        <strong data-testid="fy-start">
          <Day iso={view.fiscalYear.start} />
        </strong>{' '}
        to{' '}
        <strong data-testid="fy-end">
          <Day iso={view.fiscalYear.end} />
        </strong>
        . The next one starts on <Day iso={view.nextFiscalYear.start} />.
      </p>
      {view.joinToday.length === 0 ? (
        <p>No plan is open to members, so nobody can join today.</p>
      ) : (
        <ScrollRegion label="What a member joining today would pay">
          <table className="w-full min-w-[28rem] text-sm">
            <caption className="text-left font-bold">
              A member joining today (<Day iso={view.today} />) would pay
            </caption>
            <thead>
              <tr className="border-b-2 border-ink-700 text-left">
                <th scope="col" className="px-2">
                  Plan
                </th>
                <th scope="col" className="px-2 text-right">
                  Full year
                </th>
                <th scope="col" className="px-2 text-right">
                  Joining today
                </th>
                <th scope="col" className="px-2">
                  Covers
                </th>
              </tr>
            </thead>
            <tbody>
              {view.joinToday.map((p) => (
                <tr key={p.planId} className="border-b border-sand-300 align-top">
                  <th scope="row" className="px-2 py-1 text-left font-normal">
                    {p.planName}
                    <span className="block text-xs text-ink-700">
                      {PRORATION_LABELS[p.proration]}
                    </span>
                  </th>
                  <td className="px-2 py-1 text-right tabular-nums">
                    {formatMoney(p.fullMinor, p.currency)}
                  </td>
                  <td className="px-2 py-1 text-right font-bold tabular-nums">
                    {formatMoney(p.joinMinor, p.currency)}
                  </td>
                  <td className="px-2 py-1">
                    <Day iso={p.coversFrom} /> to <Day iso={p.coversTo} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
      )}
    </section>
  );
}

/**
 * The club's dues calendar: when the fiscal year starts, when renewal opens and when an unpaid membership lapses,
 * with a live preview of the dates and of what a member joining today pays on each open plan.
 */
export function CalendarForm({
  saved,
  isPending,
  onSubmit,
}: {
  saved: DuesCalendarDto;
  isPending: boolean;
  onSubmit: (input: DuesCalendarInput) => Promise<unknown>;
}) {
  const {
    register,
    handleSubmit,
    setError,
    control,
    formState: { errors },
  } = useForm<DuesCalendarInput>({
    resolver,
    defaultValues: saved.calendar,
  });
  const month = Number(useWatch({ control, name: 'fiscalYearStartMonth' }));
  const day = Number(useWatch({ control, name: 'fiscalYearStartDay' }));
  const isValidStart = Number.isInteger(day) && day >= 1 && day <= 28 && month >= 1 && month <= 12;
  const isProposal =
    isValidStart &&
    (month !== saved.calendar.fiscalYearStartMonth || day !== saved.calendar.fiscalYearStartDay);
  const preview = useCalendarPreview(month, day, isProposal);
  const view = isProposal && preview.data ? preview.data : saved;
  const submit = handleSubmit(async (input) => {
    try {
      await onSubmit(input);
    } catch (error) {
      applyServerErrors(error, setError, FIELDS);
    }
  });
  return (
    <div className="flex flex-col gap-4">
      <form
        noValidate
        aria-label="Dues calendar"
        onSubmit={(e) => void submit(e)}
        className="grid gap-4 sm:grid-cols-2"
      >
        <div className="sm:col-span-2">
          <FormError message={errors.root?.server?.message} />
        </div>
        <SelectField
          label="Fiscal year starts in"
          options={MONTHS}
          error={errors.fiscalYearStartMonth?.message}
          {...register('fiscalYearStartMonth', { valueAsNumber: true })}
        />
        <TextField
          label="on day"
          type="number"
          inputMode="numeric"
          min={1}
          max={28}
          hint="1 to 28, so every year has the day."
          error={errors.fiscalYearStartDay?.message}
          {...register('fiscalYearStartDay', { valueAsNumber: true })}
        />
        <TextField
          label="Renewal opens (days before the year ends)"
          type="number"
          inputMode="numeric"
          min={0}
          max={120}
          hint="From then on, members are shown as due and can pay for the next year."
          error={errors.renewalWindowDays?.message}
          {...register('renewalWindowDays', { valueAsNumber: true })}
        />
        <TextField
          label="Lapsed after (days past due)"
          type="number"
          inputMode="numeric"
          min={1}
          max={730}
          hint="Each plan's own grace period decides when a member is overdue and the late fee applies."
          error={errors.lapseAfterDays?.message}
          {...register('lapseAfterDays', { valueAsNumber: true })}
        />
        <p className="text-sm text-ink-700 sm:col-span-2">
          Changing the start moves no one’s paid-through date. Each member’s next payment runs to
          the end of the fiscal year under the new calendar, cut by their plan’s rule.
        </p>
        <div className="sm:col-span-2">
          <Button type="submit" isPending={isPending} pendingLabel="Saving…">
            Save the calendar
          </Button>
        </div>
      </form>
      {preview.isError && isProposal ? (
        <p role="alert" className="text-sm font-bold text-flare-700">
          The preview could not be worked out; check the month and day.
        </p>
      ) : (
        <CalendarPreview view={view} isProposal={isProposal && !!preview.data} />
      )}
    </div>
  );
}
