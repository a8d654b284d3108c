import { useNavigate } from 'react-router-dom';
import { Page } from '../../components/ui/page';
import { paths } from '../../config/paths';
import { ApiError } from '../../lib/api-client';
import { RequireAuth } from '../../features/auth/components/require-auth';
import { useClub } from '../../features/club/api/get-club';
import { useSaveListing } from '../../features/exchange/api/save-listing';
import { ListingForm } from '../../features/exchange/components/listing-form';
import { listingFormValues } from '../../features/exchange/utils/listing-form-values';

function NewListingScreen() {
  const club = useClub();
  const save = useSaveListing();
  const navigate = useNavigate();
  const serverError =
    save.error instanceof ApiError
      ? { message: save.error.message, fields: save.error.fields }
      : null;
  return (
    <Page
      title="List gear"
      width="narrow"
      intro={<p>Save a draft first; then add photos and publish it.</p>}
    >
      <ListingForm
        initial={listingFormValues()}
        harbors={club.data?.harbors ?? []}
        submitLabel="Save draft and add photos"
        isPending={save.isPending}
        serverError={serverError}
        onSubmit={(input) =>
          save.mutate({ input }, { onSuccess: (l) => void navigate(paths.listingEdit.href(l.id)) })
        }
      />
    </Page>
  );
}

/** A new listing (signed-in members). */
export function ListingNewRoute() {
  return (
    <RequireAuth>
      <NewListingScreen />
    </RequireAuth>
  );
}
