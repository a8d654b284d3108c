import type { DuesQuoteDto } from '@app/shared';
import { formatMoney } from '@app/shared/locale';
import { Button } from '@/components/ui/button';

/** What is owed and why, line by line, with the pay button. */
export function QuoteCard({
  quote,
  onPay,
  isPending,
  payLabel = 'Pay by card',
}: {
  quote: DuesQuoteDto;
  onPay: () => void;
  isPending: boolean;
  payLabel?: string;
}) {
  return (
    <section
      aria-label={`${quote.planName} dues`}
      className="flex flex-col gap-3 rounded-lg border border-sand-300 bg-sand-50 p-4 shadow-card"
    >
      <h3 className="text-lg font-bold">{quote.planName}</h3>
      <p className="text-sm text-ink-700">{quote.reason}.</p>
      <table className="w-full text-sm">
        <tbody>
          {quote.lines.map((l) => (
            <tr key={l.label} className="border-t border-sand-300">
              <td className="py-1 pr-2">{l.label}</td>
              <td className="py-1 text-right tabular-nums">
                {formatMoney(l.amountMinor, quote.currency)}
              </td>
            </tr>
          ))}
          <tr className="border-t-2 border-ink-700 font-bold">
            <td className="py-1 pr-2">Total</td>
            <td className="py-1 text-right tabular-nums">
              {formatMoney(quote.amountMinor, quote.currency)}
            </td>
          </tr>
        </tbody>
      </table>
      <Button onClick={onPay} isPending={isPending} pendingLabel="Opening checkout…">
        {payLabel} · {formatMoney(quote.amountMinor, quote.currency)}
      </Button>
    </section>
  );
}
