import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** POST /api/listings/:id/reports. */
export const reportListing = ({ id, reason }: { id: number; reason: string }) =>
  apiFetch<{ reported: true }>(`/listings/${id}/reports`, { method: 'POST', body: { reason } });

/** Reports a listing to the moderators. */
export const useReportListing = () => useMutation({ mutationFn: reportListing });
