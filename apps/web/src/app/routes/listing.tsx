import { Suspense } from 'react';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { UnavailablePage } from '@/components/ui/unavailable-page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { useListing } from '@/features/exchange/api/get-listing';
import { ListingDetail } from '@/features/exchange/components/listing-detail';
import { lazyNamed } from '@/lib/lazy-named';

// Only members see these, so a visitor's first load leaves them (and the form library) out.
const OwnerActions = lazyNamed(
  () => import('@/features/exchange/components/owner-actions'),
  'OwnerActions',
);
const ReportListingForm = lazyNamed(
  () => import('@/features/exchange/components/report-listing-form'),
  'ReportListingForm',
);
const MessageForm = lazyNamed(
  () => import('@/features/conversations/components/message-form'),
  'MessageForm',
);

/** One listing: details, the seller's controls or the buyer's message box, and a report link. */
export function ListingRoute() {
  const { listingId } = useParams();
  const [params] = useSearchParams();
  const id = Number(listingId);
  const fitsBoat = params.get('fitsBoat') ? Number(params.get('fitsBoat')) : undefined;
  const listing = useListing(id, fitsBoat);
  const { user } = useCurrentUser();
  const navigate = useNavigate();
  if (listing.isPending) return <Spinner label="Loading the listing…" />;
  if (listing.isError)
    return (
      <UnavailablePage
        title="Listing not available"
        back={{ to: paths.exchange.href(), label: 'Back to the exchange' }}
      >
        {errorMessage(listing.error)}
      </UnavailablePage>
    );
  const l = listing.data;
  return (
    <Page title={l.title}>
      <Link to={paths.exchange.href()} className="text-sm">
        ← Back to the exchange
      </Link>
      {l.soldTo?.isMe && (
        <Alert tone="success" title="Sold to you">
          <p>
            {l.seller.displayName} marked this as sold to you. Arrange the hand-over in your{' '}
            <Link to={paths.messages.href()}>messages</Link>, and inspect the gear before you rely
            on it.
          </p>
        </Alert>
      )}
      <ListingDetail listing={l} />
      <Suspense fallback={<Spinner label="Loading…" />}>
        {l.isMine && <OwnerActions listing={l} editHref={paths.listingEdit.href(l.id)} />}
        {!l.isMine && l.status === 'active' && user && (
          <section
            aria-labelledby="contact-heading"
            className="flex flex-col gap-2 rounded-lg border border-sand-300 p-4"
          >
            <h2 id="contact-heading" className="text-lg">
              Message {l.seller.displayName}
            </h2>
            <MessageForm
              listingId={l.id}
              label="Your message"
              submitLabel="Send message"
              onSent={(threadId) => void navigate(paths.conversation.href(threadId))}
            />
          </section>
        )}
        {!user && l.status === 'active' && (
          <p>
            <Link to={paths.signIn.href(paths.listing.href(l.id))}>Sign in</Link> to message the
            seller.
          </p>
        )}
        {user && !l.isMine && <ReportListingForm listingId={l.id} />}
      </Suspense>
    </Page>
  );
}
