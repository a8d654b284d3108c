import type { SummaryDto } from '@app/shared';
import { formatMoney } from '@app/shared/locale';
import { countOf } from '@/lib/plural';

/**
 * The year's four figures, each with a line saying what is in it, so collected, outstanding and expected can be
 * reconciled: expected = collected for this year + outstanding without late fees + the difference.
 */
export function SummaryTiles({ summary: s }: { summary: SummaryDto }) {
  const money = (v: number) => formatMoney(v, s.currency);
  const b = s.breakdown;
  const tiles: { key: string; label: string; value: string; notes: string[] }[] = [
    {
      key: 'collected',
      label: 'Collected',
      value: money(s.collectedMinor),
      notes: [
        `${money(b.collectedThisYearMinor)} for this year${b.collectedOtherYearsMinor ? `, ${money(b.collectedOtherYearsMinor)} for other years (renewals ahead, arrears)` : ''}.`,
        `Net of ${money(s.refundedMinor)} refunded; held payments are not counted.`,
      ],
    },
    {
      key: 'expected',
      label: 'Expected',
      value: money(s.expectedMinor),
      notes: [
        `Dues of ${countOf(b.memberCount, 'membership', 'memberships')} this year${b.proratedCount ? `, ${money(b.prorationMinor)} less for ${countOf(b.proratedCount, 'prorated joiner', 'prorated joiners')}` : ''}.`,
        'Late fees are not included.',
      ],
    },
    {
      key: 'outstanding',
      label: 'Outstanding',
      value: money(s.outstandingMinor),
      notes: [
        'Owed now for this year.',
        b.outstandingLateFeesMinor
          ? `Includes ${money(b.outstandingLateFeesMinor)} late fees.`
          : 'No late fees in it.',
      ],
    },
    {
      key: 'held-for-you',
      label: 'Held for you',
      value: String(s.heldCount),
      notes: [
        s.heldCount
          ? `${money(b.heldMinor)} received, not credited until you decide.`
          : 'Nothing waiting.',
        ...(b.refundedOfUncreditedMinor
          ? [`${money(b.refundedOfUncreditedMinor)} of uncredited payments went back.`]
          : []),
      ],
    },
  ];
  return (
    <div className="flex flex-col gap-2">
      <dl className="grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-4">
        {tiles.map((t) => (
          <div key={t.key} className="rounded-lg border border-sand-300 bg-sand-50 p-3">
            <dt className="text-sm">{t.label}</dt>
            <dd className="text-xl font-bold tabular-nums" data-testid={`summary-${t.key}`}>
              {t.value}
            </dd>
            <dd className="mt-1 text-xs text-ink-700" data-testid={`summary-${t.key}-note`}>
              {t.notes.join(' ')}
            </dd>
          </div>
        ))}
      </dl>
      <p className="text-sm" data-testid="summary-reconcile">
        {money(b.collectedThisYearMinor)} collected for this year +{' '}
        {money(s.outstandingMinor - b.outstandingLateFeesMinor)} outstanding dues
        {b.differenceMinor
          ? ` ${b.differenceMinor > 0 ? '+' : '−'} ${money(Math.abs(b.differenceMinor))} difference (late fees paid, amounts above or below the quote, waived dues)`
          : ''}{' '}
        = {money(s.expectedMinor)} expected.
      </p>
    </div>
  );
}
