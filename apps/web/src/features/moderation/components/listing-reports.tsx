import { formatDate } from '@app/shared/locale';
import type { ListingReportDto } from '@app/shared';
import type { MouseEvent } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { DecidedLine, DeskAlerts } from './decision-desk';
import { cardHeight, keptHeight, useDecisionDesk, useKeptInPlace } from './use-decision-desk';
import { useReasonDialog } from './reason-dialog';

export interface ListingReportsProps {
  reports: ListingReportDto[];
  listingHref: (listingId: number) => string;
}

const keyOf = (r: ListingReportDto) => `listing-report:${r.id}`;

/**
 * Open reports on exchange listings: hide the listing (the seller is told why) or dismiss with a note. Cards at
 * every width (the status and buttons wrap inside the card on a phone); a decided card stays with Undo.
 */
export function ListingReports({ reports, listingHref }: ListingReportsProps) {
  const desk = useDecisionDesk();
  const shown = useKeptInPlace(reports, keyOf, desk.kept);
  const { askReason, askNote, dialog } = useReasonDialog();
  const hide = async (r: ListingReportDto, e: MouseEvent) => {
    const height = cardHeight(e);
    const reason = await askReason({
      title: `Hide “${r.listingTitle}”?`,
      hint: 'The seller reads this. The listing leaves search and every open report on it is closed.',
      confirmLabel: 'Hide listing',
      isDestructive: true,
    });
    if (reason !== null)
      await desk.decide(
        keyOf(r),
        r.listingTitle,
        'Listing hidden',
        { kind: 'listing-hide', id: r.listingId, body: { reason } },
        height,
      );
  };
  const dismiss = async (r: ListingReportDto, e: MouseEvent) => {
    const height = cardHeight(e);
    const note = await askNote({
      title: `Dismiss the report on “${r.listingTitle}”?`,
      hint: 'The listing stays up. Only moderators read the note, in the log.',
      confirmLabel: 'Dismiss report',
    });
    if (note !== null)
      await desk.decide(
        keyOf(r),
        r.listingTitle,
        'Report dismissed',
        { kind: 'listing-report-dismiss', id: r.id, body: { note } },
        height,
      );
  };
  return (
    <section aria-labelledby="q-listings" className="flex flex-col gap-2">
      <h2 id="q-listings" className="text-xl">
        Listings reported ({reports.length})
      </h2>
      <DeskAlerts desk={desk} />
      {shown.length === 0 && <p>No open listing reports.</p>}
      <ul className="flex flex-col gap-3">
        {shown.map((r) => {
          const key = keyOf(r);
          const decided = desk.decidedOf(key);
          return (
            <li
              key={key}
              style={keptHeight(decided)}
              className="flex min-w-0 flex-col gap-2 rounded-md border border-flare-700 bg-sand-50 p-3"
            >
              <p className="text-xs text-ink-600">
                {r.reporterName} reported a listing on {formatDate(r.createdAt)}
              </p>
              <Link
                to={listingHref(r.listingId)}
                className="text-lg font-bold break-words underline"
              >
                {r.listingTitle}
              </Link>
              <p className="text-sm break-words">
                <strong>Reason:</strong> {r.reason}
              </p>
              {decided ? (
                <DecidedLine desk={desk} itemKey={key} title={r.listingTitle} />
              ) : (
                <div className="flex flex-wrap gap-2">
                  <Button
                    size="sm"
                    variant="secondary"
                    disabled={desk.isPending(key)}
                    aria-label={`Dismiss the report on “${r.listingTitle}”`}
                    onClick={(e) => void dismiss(r, e)}
                  >
                    Dismiss
                  </Button>
                  <Button
                    size="sm"
                    variant="refuse"
                    className="sm:ml-auto"
                    isPending={desk.isPending(key)}
                    aria-label={`Hide listing “${r.listingTitle}”`}
                    onClick={(e) => void hide(r, e)}
                  >
                    Hide listing
                  </Button>
                </div>
              )}
            </li>
          );
        })}
      </ul>
      {dialog}
    </section>
  );
}
