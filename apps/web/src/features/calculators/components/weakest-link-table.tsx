import type { RatedComponent, WeakestLinkResult } from '@app/calc';
import { ScrollRegion } from '../../../components/ui/scroll-region';
import { cn } from '../../../lib/cn';
import { Quantity } from '../../units/components/quantity';

export interface WeakestLinkTableProps {
  /** The parts in load-path order, as passed to `weakestLink`. */
  parts: readonly RatedComponent[];
  result: WeakestLinkResult;
  /** A breaking factor to flag parts below; none by default (each working limit carries its part's factor). */
  designFactor?: number;
  caption?: string;
}

const times = (value: number) => `${value.toFixed(2)} ×`;

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
      <table className="w-full min-w-[34rem] border-collapse text-sm">
        <caption className="mb-2 text-left font-bold">{caption}</caption>
        <thead>
          <tr className="border-b-2 border-ink-700 text-left">
            <th scope="col" className="py-2 pr-2">
              Part
            </th>
            <th scope="col" className="py-2 pr-2">
              Working limit
            </th>
            <th scope="col" className="py-2 pr-2">
              Breaking strength
            </th>
            <th scope="col" className="py-2 pr-2">
              Margin on working limit
            </th>
            <th scope="col" className="py-2">
              Factor on breaking
            </th>
          </tr>
        </thead>
        <tbody>
          {parts.map((part, index) => {
            const isWeakest = result.weakest.index === index;
            const margin = marginOf.get(index) ?? 0;
            const factor = factorOf.get(index) ?? 0;
            return (
              <tr
                key={`${part.label}-${index}`}
                aria-current={isWeakest ? 'true' : undefined}
                className={cn(
                  'border-b border-sand-300',
                  isWeakest &&
                    'bg-signal-50 font-bold outline-2 -outline-offset-2 outline-signal-600',
                )}
              >
                <th scope="row" className="py-2 pr-2 text-left">
                  {part.label}
                  {isWeakest && (
                    <span className="ml-2 rounded-pill bg-signal-600 px-2 py-0.5 text-xs text-white">
                      Weakest link
                    </span>
                  )}
                  {result.weakestByBreak.index === index && !isWeakest && (
                    <span className="ml-2 rounded-pill bg-ink-700 px-2 py-0.5 text-xs text-white">
                      Parts first in an overload
                    </span>
                  )}
                </th>
                <td className="py-2 pr-2">
                  <Quantity value={part.wllN} kind="force" />
                </td>
                <td className="py-2 pr-2">
                  <Quantity value={part.minBreakN} kind="force" />
                </td>
                <td className={cn('py-2 pr-2', margin < 1 && 'text-flare-700')}>
                  {times(margin)}
                  {margin < 1 && <span className="sr-only"> (over its working load limit)</span>}
                </td>
                <td
                  className={cn(
                    'py-2',
                    designFactor !== undefined && factor < designFactor && 'text-flare-700',
                  )}
                >
                  {times(factor)}
                  {designFactor !== undefined && factor < designFactor && (
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
