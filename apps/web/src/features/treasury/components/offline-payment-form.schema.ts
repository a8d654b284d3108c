import { offlinePaymentSchema, z } from '../../../lib/schemas';

// The shared schema, with the amount typed as a decimal (120.50) instead of minor units.
export const formSchema = offlinePaymentSchema.omit({ amountMinor: true }).extend({
  amount: z
    .string()
    .trim()
    .regex(/^\d+([.,]\d{1,2})?$/, 'Give an amount such as 120 or 120.50 (no minus sign)'),
});
