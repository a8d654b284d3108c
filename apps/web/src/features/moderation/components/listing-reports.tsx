import { formatDate } from '@app/shared/locale';
import type { ListingReportDto } from '@app/shared';
import type { MouseEvent } from 'react';
import { Link } from 'react-router-dom';
import { DeskCard, DeskSection } from './desk-card';
import { cardHeight, useDecisionDesk, useKeptInPlace } from './use-decision-desk';
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
    <>
      <DeskSection
        id="q-listings"
        heading={`Listings reported (${reports.length})`}
        count={shown.length}
        emptyText="No open listing reports."
        ownDesk={desk}
      >
        {shown.map((r) => (
          <DeskCard
            key={keyOf(r)}
            desk={desk}
            itemKey={keyOf(r)}
            title={r.listingTitle}
            tone="report"
            actions={[
              {
                label: 'Dismiss',
                ariaLabel: `Dismiss the report on “${r.listingTitle}”`,
                variant: 'secondary',
                onClick: (e) => void dismiss(r, e),
              },
              {
                label: 'Hide listing',
                ariaLabel: `Hide listing “${r.listingTitle}”`,
                variant: 'refuse',
                showsPending: true,
                onClick: (e) => void hide(r, e),
              },
            ]}
          >
            <p className="text-xs text-ink-600">
              {r.reporterName} reported a listing on {formatDate(r.createdAt)}
            </p>
            <Link to={listingHref(r.listingId)} className="text-lg font-bold break-words underline">
              {r.listingTitle}
            </Link>
            <p className="text-sm break-words">
              <strong>Reason:</strong> {r.reason}
            </p>
          </DeskCard>
        ))}
      </DeskSection>
      {dialog}
    </>
  );
}
