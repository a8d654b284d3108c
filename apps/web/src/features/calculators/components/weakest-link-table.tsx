import type { RatedComponent, WeakestLinkResult } from '@app/calc';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { cn } from '@/lib/cn';
import { Quantity } from '@/components/units/quantity';

export interface WeakestLinkTableProps {
  /** The parts in load-path order, as passed to `weakestLink`. */
  parts: readonly RatedComponent[];
  result: WeakestLinkResult;
  /** A breaking factor to flag parts below; none by default (each working limit carries its part's factor). */
  designFactor?: number;
  caption?: string;
}

const times = (value: number) => `${value.toFixed(2)} ×`;

const COLUMNS = [
  'Part',
  'Working limit',
  'Breaking strength',
  'Margin on working limit',
  'Factor on breaking',
] as const;

/** A cell's column name, shown above its value only where the rows are cards (below md). */
function CardLabel({ children }: { children: string }) {
  return (
    <span aria-hidden="true" className="block text-xs font-normal text-ink-700 md:hidden">
      {children}
    </span>
  );
}

/**
 * Each part's margin on its working limit and factor on its breaking strength at the load; the
 * weakest link (smallest working-limit margin) is highlighted and named in words, not by colour
 * alone, and the part that would part first in an overload is named too.
 */
export function WeakestLinkTable({
  parts,
  result,
  designFactor,
  caption = 'Weakest-link check',
}: WeakestLinkTableProps) {
  const marginOf = new Map(result.byWll.map((m) => [m.index, m.margin]));
  const factorOf = new Map(result.byBreak.map((b) => [b.index, b.factor]));
  return (
    <ScrollRegion label={caption}>
      {/* Below md each part is a card (label over value), so nothing hides to the right on a phone; the
          explicit roles keep it a table for screen readers once the display changes. */}
      <table role="table" className="w-full border-collapse text-sm max-md:block md:min-w-[34rem]">
        <caption className="mb-2 text-left font-bold max-md:block">{caption}</caption>
        <thead role="rowgroup" className="max-md:sr-only">
          <tr role="row" className="border-b-2 border-ink-700 text-left">
            {COLUMNS.map((name, i) => (
              <th
                key={name}
                role="columnheader"
                scope="col"
                className={cn('py-2', i < COLUMNS.length - 1 && 'pr-2')}
              >
                {name}
              </th>
            ))}
          </tr>
        </thead>
        <tbody role="rowgroup" className="max-md:flex max-md:flex-col max-md:gap-2">
          {parts.map((part, index) => {
            const isWeakest = result.weakest.index === index;
            const margin = marginOf.get(index) ?? 0;
            const factor = factorOf.get(index) ?? 0;
            const lowFactor = designFactor !== undefined && factor < designFactor;
            return (
              <tr
                key={`${part.label}-${index}`}
                role="row"
                aria-current={isWeakest ? 'true' : undefined}
                data-testid="weakest-link-part"
                className={cn(
                  'border-b border-sand-300',
                  'max-md:grid max-md:grid-cols-2 max-md:gap-x-3 max-md:gap-y-2 max-md:rounded-md max-md:border max-md:bg-white max-md:p-3',
                  isWeakest &&
                    'bg-signal-50 font-bold outline-2 -outline-offset-2 outline-signal-600 max-md:bg-signal-50',
                )}
              >
                <th
                  role="rowheader"
                  scope="row"
                  className="py-2 pr-2 text-left max-md:col-span-2 max-md:py-0"
                >
                  {part.label}
                  {isWeakest && (
                    <span className="ml-2 inline-block rounded-pill bg-signal-600 px-2 py-0.5 text-xs text-white">
                      Weakest link
                    </span>
                  )}
                  {result.weakestByBreak.index === index && !isWeakest && (
                    <span className="ml-2 inline-block rounded-pill bg-ink-700 px-2 py-0.5 text-xs text-white">
                      Parts first in an overload
                    </span>
                  )}
                </th>
                <td role="cell" className="py-2 pr-2 max-md:py-0">
                  <CardLabel>{COLUMNS[1]}</CardLabel>
                  <Quantity value={part.wllN} kind="force" />
                </td>
                <td role="cell" className="py-2 pr-2 max-md:py-0">
                  <CardLabel>{COLUMNS[2]}</CardLabel>
                  <Quantity value={part.minBreakN} kind="force" />
                </td>
                <td
                  role="cell"
                  className={cn('py-2 pr-2 max-md:py-0', margin < 1 && 'text-flare-700')}
                >
                  <CardLabel>{COLUMNS[3]}</CardLabel>
                  {times(margin)}
                  {margin < 1 && <span className="sr-only"> (over its working load limit)</span>}
                </td>
                <td role="cell" className={cn('py-2 max-md:py-0', lowFactor && 'text-flare-700')}>
                  <CardLabel>{COLUMNS[4]}</CardLabel>
                  {times(factor)}
                  {lowFactor && (
                    <span className="sr-only"> (below the design factor {designFactor})</span>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <p className="mt-2 text-sm">
        {result.ok
          ? 'Every part is within its working limit.'
          : 'At least one part is over its working limit.'}{' '}
        Weakest link: <strong>{result.weakest.label}</strong> ({times(result.weakest.margin)} its
        working limit, breaks at {times(result.weakest.factor)} the load).
      </p>
      <p className="mt-1 text-xs text-ink-700">
        Working limit: the maker&apos;s WLL for chain and fittings; for nylon, its wet breaking
        strength ÷ 2.25 (Rodewise&apos;s anchoring factor). A rope&apos;s cargo tie-down rating is
        not an anchoring limit.
      </p>
    </ScrollRegion>
  );
}
