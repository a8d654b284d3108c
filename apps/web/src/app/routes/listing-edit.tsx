import { Link, useLocation, useParams } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/form-errors';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useClub } from '@/features/club/api/get-club';
import { useListing } from '@/features/exchange/api/get-listing';
import { useSaveListing } from '@/features/exchange/api/save-listing';
import { ListingForm } from '@/features/exchange/components/listing-form';
import { listingFormValues } from '@/features/exchange/utils/listing-form-values';
import { OwnerActions } from '@/features/exchange/components/owner-actions';
import { PhotoManager } from '@/features/exchange/components/photo-manager';
import type { ListingEditorNotice } from '@/features/exchange/utils/editor-notice';

function EditListingScreen({ id }: { id: number }) {
  const listing = useListing(id);
  const club = useClub();
  const save = useSaveListing();
  const { notice, problem } = (useLocation().state ?? {}) as ListingEditorNotice;
  if (listing.isPending) return <Spinner label="Loading the listing…" />;
  if (listing.isError) return <Alert tone="error">{errorMessage(listing.error)}</Alert>;
  const l = listing.data;
  const serverError =
    save.error instanceof ApiError
      ? { message: save.error.message, fields: save.error.fields }
      : null;
  return (
    <Page title={`Edit: ${l.title}`}>
      <Link to={paths.listing.href(l.id)} className="text-sm">
        See the listing page
      </Link>
      {problem && <Alert tone="error">{problem}</Alert>}
      {notice && !problem && l.status === 'draft' && <Alert tone="success">{notice}</Alert>}
      <OwnerActions listing={l} editHref={paths.listingEdit.href(l.id)} />
      <PhotoManager listingId={l.id} photos={l.photos} />
      <section aria-labelledby="details-heading" className="flex max-w-xl flex-col gap-3">
        <h2 id="details-heading" className="text-xl">
          Details
        </h2>
        {save.isSuccess && <Alert tone="success">Saved.</Alert>}
        <ListingForm
          key={l.updatedAt}
          initial={listingFormValues(l)}
          harbors={club.data?.harbors ?? []}
          submitLabel="Save changes"
          isPending={save.isPending}
          serverError={serverError}
          onSubmit={(input) => save.mutate({ id: l.id, input })}
        />
      </section>
    </Page>
  );
}

/** Edit one of the member's listings: details, photos and status. */
export function ListingEditRoute() {
  const { listingId } = useParams();
  return (
    <RequireAuth>
      <EditListingScreen id={Number(listingId)} />
    </RequireAuth>
  );
}
