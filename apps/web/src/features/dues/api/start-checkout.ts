import type { CheckoutDto, CheckoutInput } from '@app/shared';
import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** POST /api/dues/checkout: opens a checkout session and returns its page. */
export const startCheckout = (input: CheckoutInput) =>
  apiFetch<CheckoutDto>('/dues/checkout', { method: 'POST', body: input });

/** Opens a checkout; the caller sends the browser to `url`. */
export const useStartCheckout = () => useMutation({ mutationFn: startCheckout });
