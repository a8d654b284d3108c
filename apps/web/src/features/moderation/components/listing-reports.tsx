import { formatDate } from '@app/shared/locale';
import type { ListingReportDto } from '@app/shared';
import { Link } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { useModerate } from '../api/decide';
import { useReasonDialog } from './reason-dialog';

export interface ListingReportsProps {
  reports: ListingReportDto[];
  listingHref: (listingId: number) => string;
}

/** Open reports on exchange listings: hide the listing (the seller is told why) or dismiss with a note. */
export function ListingReports({ reports, listingHref }: ListingReportsProps) {
  const moderate = useModerate();
  const { askReason, askNote, dialog } = useReasonDialog();
  const hide = async (r: ListingReportDto) => {
    const reason = await askReason({
      title: `Hide “${r.listingTitle}”?`,
      hint: 'The seller reads this. The listing leaves search and every open report on it is closed.',
      confirmLabel: 'Hide listing',
      isDestructive: true,
    });
    if (reason !== null)
      moderate.mutate({ kind: 'listing-hide', id: r.listingId, body: { reason } });
  };
  const dismiss = async (r: ListingReportDto) => {
    const note = await askNote({
      title: `Dismiss the report on “${r.listingTitle}”?`,
      hint: 'The listing stays up. Only moderators read the note, in the log.',
      confirmLabel: 'Dismiss report',
    });
    if (note !== null)
      moderate.mutate({ kind: 'listing-report-dismiss', id: r.id, body: { note } });
  };
  return (
    <section aria-labelledby="q-listings" className="flex flex-col gap-2">
      <h2 id="q-listings" className="text-xl">
        Listings reported ({reports.length})
      </h2>
      {reports.length === 0 && <p>No open listing reports.</p>}
      <ul className="flex flex-col gap-3">
        {reports.map((r) => (
          <li
            key={r.id}
            className="flex flex-col gap-2 rounded-md border border-flare-700 bg-sand-50 p-3"
          >
            <p className="text-xs text-ink-600">
              {r.reporterName} reported a listing on {formatDate(r.createdAt)}
            </p>
            <Link to={listingHref(r.listingId)} className="text-lg font-bold underline">
              {r.listingTitle}
            </Link>
            <p className="text-sm">
              <strong>Reason:</strong> {r.reason}
            </p>
            <div className="flex flex-wrap gap-2">
              <Button
                size="sm"
                variant="danger"
                aria-label={`Hide listing “${r.listingTitle}”`}
                onClick={() => void hide(r)}
              >
                Hide listing
              </Button>
              <Button
                size="sm"
                variant="secondary"
                aria-label={`Dismiss the report on “${r.listingTitle}”`}
                onClick={() => void dismiss(r)}
              >
                Dismiss
              </Button>
            </div>
          </li>
        ))}
      </ul>
      {dialog}
    </section>
  );
}
