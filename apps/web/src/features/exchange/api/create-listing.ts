import type { ListingDto, ListingInput } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { errorMessage } from '@/lib/form-errors';
import { changeListingStatus } from './change-listing-status';
import { listingKeys } from './keys';
import { uploadPhotos } from './upload-photos';

export interface CreateListingVariables {
  input: ListingInput;
  /** Photos the seller picked on the form, uploaded once the draft exists. */
  photos: File[];
  publish: boolean;
  onProgress?: (fraction: number) => void;
}

export interface CreatedListing {
  listing: ListingDto;
  /** What did not happen after the draft was saved (photos not stored, not published), for the editor to say. */
  problem: string | null;
}

/**
 * One step for the seller: POST /api/listings (a draft), then the picked photos (multipart), then, when asked,
 * POST /api/listings/:id/publish. Once the draft exists a failed later step never loses it: the answer carries
 * the draft and what went wrong, and the editor shows it.
 */
export async function createListing({
  input,
  photos,
  publish,
  onProgress,
}: CreateListingVariables): Promise<CreatedListing> {
  const draft = await apiFetch<ListingDto>('/listings', { method: 'POST', body: input });
  if (photos.length > 0)
    try {
      await uploadPhotos(draft.id, photos, onProgress ?? (() => undefined));
    } catch (e) {
      return {
        listing: draft,
        problem: `Your draft is saved, but the photos were not: ${errorMessage(e)}`,
      };
    }
  if (!publish) return { listing: draft, problem: null };
  try {
    return {
      listing: await changeListingStatus({ id: draft.id, action: 'publish' }),
      problem: null,
    };
  } catch (e) {
    return {
      listing: draft,
      problem: `Your draft is saved${photos.length ? ' with its photos' : ''}, but not published: ${errorMessage(e)}`,
    };
  }
}

/** Creates a listing with its photos (and publishes it when asked), then refreshes listing queries. */
export function useCreateListing() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createListing,
    onSettled: () => queryClient.invalidateQueries({ queryKey: listingKeys.all }),
  });
}
