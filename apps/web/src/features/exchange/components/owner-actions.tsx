import { formatDate } from '@app/shared/locale';
import type { ListingDto } from '@app/shared';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { LinkButton } from '@/components/ui/link-button';
import { TitledSection } from '@/components/ui/titled-section';
import { errorMessage } from '@/lib/form-errors';
import { useChangeListingStatus } from '../api/change-listing-status';
import { useListingThreads } from '../api/get-listing-threads';
import { MarkSoldDialog } from './mark-sold-dialog';

/** The seller's controls: publish, edit, mark sold (asked in a dialog, to a buyer who wrote), relist, withdraw. */
export function OwnerActions({ listing, editHref }: { listing: ListingDto; editHref: string }) {
  const change = useChangeListingStatus();
  const threads = useListingThreads(listing.id, listing.status === 'active');
  const [asking, setAsking] = useState(false);
  const [soldNote, setSoldNote] = useState<string | null>(null);
  const act = (action: 'publish' | 'relist' | 'withdraw') => {
    setSoldNote(null);
    change.mutate({ id: listing.id, action });
  };
  const sell = (threadId: number | undefined) =>
    change.mutate(
      { id: listing.id, action: 'sold', threadId },
      {
        onSuccess: (l) => {
          setAsking(false);
          setSoldNote(
            l.soldTo
              ? `Marked sold to ${l.soldTo.displayName}, who has been told in Rodewise and by e-mail.`
              : 'Marked sold.',
          );
        },
      },
    );
  return (
    <TitledSection
      headingId="owner-heading"
      title="Your listing"
      className="flex flex-col gap-3 rounded-lg border border-sand-300 bg-sand-100 p-4"
      headingClassName="text-lg"
    >
      {listing.expiresAt && listing.status === 'active' && (
        <p className="text-sm">Shows in search until {formatDate(listing.expiresAt)}.</p>
      )}
      <div className="flex flex-wrap items-end gap-2">
        {listing.status !== 'sold' && (
          <LinkButton to={editHref} variant="outline">
            Edit and photos
          </LinkButton>
        )}
        {listing.status === 'draft' && (
          <Button isPending={change.isPending} onClick={() => act('publish')}>
            Publish
          </Button>
        )}
        {listing.status === 'active' && (
          <Button
            isPending={change.isPending && !asking}
            disabled={threads.isPending}
            onClick={() => {
              change.reset();
              setAsking(true);
            }}
          >
            Close as sold…
          </Button>
        )}
        {['sold', 'expired', 'withdrawn'].includes(listing.status) && (
          <Button isPending={change.isPending} onClick={() => act('relist')}>
            Relist for 60 days
          </Button>
        )}
        {['draft', 'active'].includes(listing.status) && (
          <Button variant="ghost" isPending={change.isPending} onClick={() => act('withdraw')}>
            Withdraw
          </Button>
        )}
      </div>
      {listing.status === 'sold' && listing.soldTo && !soldNote && (
        <p className="text-sm">Sold to {listing.soldTo.displayName}.</p>
      )}
      {soldNote && (
        <Alert tone="success">
          {soldNote} If the sale falls through, relist it: the buyer is told.
        </Alert>
      )}
      {change.isError && !asking && <Alert tone="error">{errorMessage(change.error)}</Alert>}
      {asking && (
        <MarkSoldDialog
          isOpen
          title={listing.title}
          threads={threads.data ?? []}
          isPending={change.isPending}
          error={change.isError ? errorMessage(change.error) : null}
          onConfirm={sell}
          onCancel={() => setAsking(false)}
        />
      )}
    </TitledSection>
  );
}
