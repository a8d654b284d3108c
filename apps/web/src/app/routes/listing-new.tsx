import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { Page } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useClub } from '@/features/club/api/get-club';
import { useCreateListing } from '@/features/exchange/api/create-listing';
import { ListingForm } from '@/features/exchange/components/listing-form';
import { PendingPhotos } from '@/features/exchange/components/pending-photos';
import type { ListingEditorNotice } from '@/features/exchange/utils/editor-notice';
import { listingFormValues } from '@/features/exchange/utils/listing-form-values';

function NewListingScreen() {
  const club = useClub();
  const create = useCreateListing();
  const navigate = useNavigate();
  const [photos, setPhotos] = useState<File[]>([]);
  const [progress, setProgress] = useState<number | null>(null);
  const serverError =
    create.error instanceof ApiError
      ? { message: create.error.message, fields: create.error.fields }
      : null;
  return (
    <Page
      title="List gear"
      width="narrow"
      intro={<p>Describe the gear, add photos, then publish it or keep it as a draft.</p>}
    >
      <ListingForm
        initial={listingFormValues()}
        harbors={club.data?.harbors ?? []}
        actions={[
          { intent: 'draft', label: 'Save draft', variant: 'secondary' },
          { intent: 'publish', label: 'Publish' },
        ]}
        // Still pending once saved: the form stays on view until the editor opens, and must not save twice.
        isPending={create.isPending || create.isSuccess}
        serverError={serverError}
        onSubmit={(input, intent) => {
          const publish = intent === 'publish';
          create.mutate(
            { input, photos, publish, onProgress: setProgress },
            {
              onSettled: () => setProgress(null),
              onSuccess: ({ listing, problem }) => {
                if (publish && !problem) {
                  void navigate(paths.listing.href(listing.id));
                  return;
                }
                const state: ListingEditorNotice = problem
                  ? { problem }
                  : { notice: 'Draft saved. Publish it when you are ready.' };
                void navigate(paths.listingEdit.href(listing.id), { state });
              },
            },
          );
        }}
      >
        <PendingPhotos files={photos} onChange={setPhotos} disabled={create.isPending} />
        {progress !== null && (
          <div className="w-full max-w-xs">
            <progress value={progress} max={1} className="w-full" aria-label="Upload progress" />
            <p className="text-xs" role="status">
              Uploading photos… {Math.round(progress * 100)} %
            </p>
          </div>
        )}
      </ListingForm>
    </Page>
  );
}

/** A new listing (signed-in members): details and photos in one step, saved as a draft or published. */
export function ListingNewRoute() {
  return (
    <RequireAuth>
      <NewListingScreen />
    </RequireAuth>
  );
}
