import type { HarborDto, ReadinessDto } from '@app/shared';
import { STORM_LOCATION_LABELS } from '@app/shared/values';
import { Link } from 'react-router-dom';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { paths } from '@/config/paths';
import { MarginBadge } from './margin-badge';
import { StatusBadge } from './status-badge';

export interface BoardTableProps {
  watchId: number;
  rows: readonly ReadinessDto[];
  harbors: readonly HarborDto[];
  checklistLength: number;
  /** Renders the buddy picker for a row (moderators); left out, the buddy's name shows. */
  buddyCell?: (row: ReadinessDto) => React.ReactNode;
}

/** The club's board: one row per boat, its status and, where the viewer may see it, the margin at the gust. */
export function BoardTable({
  watchId,
  rows,
  harbors,
  checklistLength,
  buddyCell,
}: BoardTableProps) {
  const harbour = new Map(harbors.map((h) => [h.id, h.name]));
  return (
    <div data-board>
      <ScrollRegion label="The board, one row per boat">
        <table className="w-full min-w-[40rem] text-left text-sm">
          <caption className="sr-only">Boats in the watch, their status and margins</caption>
          <thead>
            <tr className="border-b-2 border-ink-700">
              <th scope="col" className="py-2 pr-2">
                Boat
              </th>
              <th scope="col" className="pr-2">
                Owner
              </th>
              <th scope="col" className="pr-2">
                Harbour
              </th>
              <th scope="col" className="pr-2">
                Status
              </th>
              <th scope="col" className="pr-2">
                Where
              </th>
              <th scope="col" className="pr-2">
                Margin at the gust
              </th>
              <th scope="col" className="pr-2">
                Checklist
              </th>
              <th scope="col" className="pr-2">
                Buddy
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => {
              const d = r.details;
              const check = d?.check ?? null;
              return (
                <tr
                  key={r.boatId}
                  className="border-b border-sand-300 align-top"
                  data-boat={r.boatName}
                >
                  <th scope="row" className="py-2 pr-2 font-bold">
                    {d ? (
                      <Link to={paths.stormBoat.href(watchId, r.boatId)}>{r.boatName}</Link>
                    ) : (
                      r.boatName
                    )}
                  </th>
                  <td className="pr-2">{r.ownerName}</td>
                  <td className="pr-2">{r.harborId ? (harbour.get(r.harborId) ?? '—') : '—'}</td>
                  <td className="pr-2">
                    <StatusBadge status={r.status} />
                    {check?.band === 'below-wll' && (
                      <p className="mt-1 text-xs font-bold text-flare-700">
                        Flagged: below WLL at the gust
                      </p>
                    )}
                    {d?.helpWanted && d.helpNote && <p className="mt-1 text-xs">{d.helpNote}</p>}
                  </td>
                  <td className="pr-2">{d?.location ? STORM_LOCATION_LABELS[d.location] : '—'}</td>
                  <td className="pr-2">
                    {check ? (
                      <>
                        <MarginBadge
                          band={check.band}
                          margin={check.weakestLink?.wllMargin ?? null}
                        />
                        {check.weakestLink && (
                          <p className="mt-1 text-xs">Weakest: {check.weakestLink.label}</p>
                        )}
                      </>
                    ) : d ? (
                      'No plan chosen'
                    ) : (
                      <span className="text-ink-600">Not shared</span>
                    )}
                  </td>
                  <td className="pr-2">{d ? `${d.ticked.length} of ${checklistLength}` : '—'}</td>
                  <td className="pr-2">{buddyCell ? buddyCell(r) : (d?.buddy?.name ?? '—')}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </ScrollRegion>
    </div>
  );
}
