import type { PaymentDto, PaymentStatus } from '@app/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { treasuryKeys } from './keys';

/** GET /api/treasury/payments, optionally one status. */
export const getPayments = (status?: PaymentStatus, signal?: AbortSignal) =>
  apiFetch<PaymentDto[]>('/treasury/payments', { query: { status }, signal });

export const paymentsQuery = (status?: PaymentStatus) =>
  queryOptions({
    queryKey: treasuryKeys.payments(status),
    queryFn: ({ signal }) => getPayments(status, signal),
  });

/** Ledger entries, newest first. */
export const usePayments = (status?: PaymentStatus) => useQuery(paymentsQuery(status));
