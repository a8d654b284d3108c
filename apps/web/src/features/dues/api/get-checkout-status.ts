import type { CheckoutStatusDto } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { duesKeys } from './keys';

/** GET /api/dues/checkout/:sessionId. */
export const getCheckoutStatus = (sessionId: string, signal?: AbortSignal) =>
  apiFetch<CheckoutStatusDto>(`/dues/checkout/${encodeURIComponent(sessionId)}`, { signal });

export const checkoutStatusQuery = (sessionId: string) =>
  queryOptions({
    queryKey: duesKeys.checkout(sessionId),
    queryFn: ({ signal }) => getCheckoutStatus(sessionId, signal),
    // The webhook usually lands within a second; poll until the payment is settled.
    refetchInterval: (q) => (q.state.data?.status === 'pending' ? 1000 : false),
  });

/** The outcome of one of the member's checkouts, polled while pending. */
export const useCheckoutStatus = (sessionId: string) => useQuery(checkoutStatusQuery(sessionId));
