import { formatDate } from '@app/shared/locale';
import type { ListingDto } from '@app/shared';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../lib/form-errors';
import { useChangeListingStatus } from '../api/change-listing-status';
import { useListingThreads } from '../api/get-listing-threads';
import { ExchangeSelect } from './select';

/** The seller's controls: publish, edit, mark sold (to a buyer who wrote), relist, withdraw. */
export function OwnerActions({ listing, editHref }: { listing: ListingDto; editHref: string }) {
  const change = useChangeListingStatus();
  const threads = useListingThreads(listing.id, listing.status === 'active');
  const [buyer, setBuyer] = useState('');
  const act = (action: 'publish' | 'relist' | 'withdraw' | 'sold') =>
    change.mutate({
      id: listing.id,
      action,
      threadId: action === 'sold' && buyer ? Number(buyer) : undefined,
    });
  return (
    <section
      aria-labelledby="owner-heading"
      className="flex flex-col gap-3 rounded-lg border border-sand-300 bg-sand-100 p-4"
    >
      <h2 id="owner-heading" className="text-lg">
        Your listing
      </h2>
      {listing.expiresAt && listing.status === 'active' && (
        <p className="text-sm">Shows in search until {formatDate(listing.expiresAt)}.</p>
      )}
      <div className="flex flex-wrap items-end gap-2">
        {listing.status !== 'sold' && (
          <Link
            to={editHref}
            className="inline-flex min-h-11 items-center rounded-md border border-sand-500 px-4 font-bold no-underline"
          >
            Edit and photos
          </Link>
        )}
        {listing.status === 'draft' && (
          <Button isPending={change.isPending} onClick={() => act('publish')}>
            Publish
          </Button>
        )}
        {listing.status === 'active' && (
          <>
            {threads.data && threads.data.length > 0 && (
              <ExchangeSelect
                label="Sold to"
                value={buyer}
                onChange={(e) => setBuyer(e.currentTarget.value)}
                options={[
                  { value: '', label: 'Someone else' },
                  ...threads.data.map((t) => ({
                    value: String(t.id),
                    label: t.otherParty.displayName,
                  })),
                ]}
              />
            )}
            <Button isPending={change.isPending} onClick={() => act('sold')}>
              Mark sold
            </Button>
          </>
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
      {change.isError && <Alert tone="error">{errorMessage(change.error)}</Alert>}
    </section>
  );
}
