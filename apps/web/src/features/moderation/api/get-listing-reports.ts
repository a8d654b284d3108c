import type { ListingReportDto } from '@app/shared';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { moderationKeys } from './keys';

/** GET /api/listings/reports: open reports on exchange listings, oldest first (moderators only). */
export const useListingReports = () =>
  useQuery({
    queryKey: moderationKeys.listingReports(),
    queryFn: ({ signal }) => apiFetch<ListingReportDto[]>('/listings/reports', { signal }),
  });
