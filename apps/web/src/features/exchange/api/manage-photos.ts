import type { ListingDto } from '@app/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { listingKeys } from './keys';

/** DELETE /api/listings/:id/photos/:photoId. */
export const deletePhoto = ({ listingId, photoId }: { listingId: number; photoId: number }) =>
  apiFetch<void>(`/listings/${listingId}/photos/${photoId}`, { method: 'DELETE' });

/** PUT /api/listings/:id/photos/order. */
export const reorderPhotos = ({ listingId, photoIds }: { listingId: number; photoIds: number[] }) =>
  apiFetch<ListingDto>(`/listings/${listingId}/photos/order`, {
    method: 'PUT',
    body: { photoIds },
  });

/** Removes a photo. */
export function useDeletePhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePhoto,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listingKeys.all }),
  });
}

/** Saves a new photo order. */
export function useReorderPhotos() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: reorderPhotos,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listingKeys.all }),
  });
}
