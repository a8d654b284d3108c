import type { ListingPhotoDto } from '@app/shared';
import { ApiError, apiUrl, getCsrfToken } from '@/lib/api-client';

/**
 * POST /api/listings/:id/photos (multipart field `photos`) with upload progress (0–1) reported through
 * `onProgress`. XMLHttpRequest is used because fetch cannot report upload progress.
 */
export function uploadPhotos(
  listingId: number,
  files: File[],
  onProgress: (fraction: number) => void,
): Promise<ListingPhotoDto[]> {
  return new Promise((resolve, reject) => {
    const form = new FormData();
    for (const f of files) form.append('photos', f);
    const xhr = new XMLHttpRequest();
    xhr.open('POST', apiUrl(`/listings/${listingId}/photos`));
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    const token = getCsrfToken();
    if (token) xhr.setRequestHeader('X-CSRF-Token', token);
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress(e.loaded / e.total);
    };
    xhr.onerror = () =>
      reject(new ApiError(0, 'NETWORK_ERROR', 'The upload did not reach Rodewise.'));
    xhr.onload = () => {
      let body: {
        data?: ListingPhotoDto[];
        error?: { code: string; message: string; fields?: Record<string, string> };
      } = {};
      try {
        body = JSON.parse(xhr.responseText) as typeof body;
      } catch {
        reject(new ApiError(xhr.status, 'BAD_RESPONSE', 'The server answer could not be read.'));
        return;
      }
      if (xhr.status >= 200 && xhr.status < 300 && body.data) resolve(body.data);
      else
        reject(
          new ApiError(
            xhr.status,
            'VALIDATION_FAILED',
            body.error?.fields?.photos ?? body.error?.message ?? 'Upload failed',
            body.error?.fields ?? {},
          ),
        );
    };
    xhr.send(form);
  });
}
