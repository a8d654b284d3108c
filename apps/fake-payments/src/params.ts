import { z } from 'zod';
import { fromZodError } from './provider-error';

// The SDK sends form-encoded bodies, so every scalar arrives as a string; these coerce like the provider.

const int = z.preprocess(
  (v) => (typeof v === 'string' && /^-?\d+$/.test(v.trim()) ? Number(v) : v),
  z.number({ error: 'expected an integer' }).int('expected an integer'),
);

/** Lists arrive as `a[0]=…&a[1]=…`; qs turns long or sparse ones into objects with numeric keys. */
const list = <T extends z.ZodType>(item: T) =>
  z.preprocess((v) => {
    if (v && typeof v === 'object' && !Array.isArray(v)) {
      return Object.entries(v)
        .sort(([a], [b]) => Number(a) - Number(b))
        .map(([, value]) => value as unknown);
    }
    return v;
  }, z.array(item));

// Limits as documented by the provider for metadata (from memory: 50 keys, 40-char keys, 500-char values).
const metadata = z.preprocess(
  (v) => (v === '' ? {} : v),
  z
    .record(
      z.string().max(40, 'keys must be at most 40 characters'),
      z.union([z.string(), z.number(), z.boolean()]).transform(String),
    )
    .refine((m) => Object.keys(m).length <= 50, 'at most 50 keys')
    .transform((m) => Object.fromEntries(Object.entries(m).filter(([, value]) => value !== ''))),
);

const text = (max: number) => z.string().max(max, `must be at most ${max} characters`);
const webUrl = z.url({ protocol: /^https?$/, error: 'expected an http(s) URL' });

export const expandSchema = z.object({ expand: list(z.string()).optional() }).loose();

export const customerCreateSchema = z.object({
  email: z.email('expected an e-mail address').max(512).optional(),
  name: text(256).optional(),
  description: text(350).optional(),
  phone: text(20).optional(),
  metadata: metadata.optional(),
});

export const customerListSchema = z.object({
  email: z.string().optional(),
  limit: int.pipe(z.number().min(1).max(100)).optional(),
});

const lineItemSchema = z.object({
  price: z.string().optional(),
  price_data: z.object({
    currency: z
      .string()
      .regex(/^[a-zA-Z]{3}$/, 'expected a three-letter ISO currency code')
      .transform((c) => c.toLowerCase()),
    unit_amount: int.pipe(z.number().min(0, 'must be 0 or more')),
    product_data: z.object({
      name: text(250).min(1, 'must not be empty'),
      description: text(500).optional(),
    }),
  }),
  quantity: int.pipe(z.number().min(1, 'must be 1 or more')),
});

export const sessionCreateSchema = z.object({
  mode: z.literal('payment', 'this local fake supports mode=payment only'),
  line_items: list(lineItemSchema).refine((items) => items.length > 0, 'at least one line item'),
  customer: z.string().optional(),
  customer_email: z.email('expected an e-mail address').optional(),
  client_reference_id: text(200).optional(),
  metadata: metadata.optional(),
  success_url: webUrl.optional(),
  cancel_url: webUrl.optional(),
  expires_at: int.optional(),
  payment_intent_data: z
    .object({ description: text(1000).optional(), metadata: metadata.optional() })
    .optional(),
  expand: list(z.string()).optional(),
});

export type SessionCreateParams = z.infer<typeof sessionCreateSchema>;

export const refundCreateSchema = z.object({
  payment_intent: z.string().optional(),
  charge: z.string().optional(),
  amount: int.pipe(z.number().min(1, 'must be a positive integer')).optional(),
  reason: z.enum(['duplicate', 'fraudulent', 'requested_by_customer']).optional(),
  metadata: metadata.optional(),
  expand: list(z.string()).optional(),
});

export type RefundCreateParams = z.infer<typeof refundCreateSchema>;

/** Parses request params, throwing a provider-style 400 that names the first bad parameter. */
export function parseParams<T extends z.ZodType>(schema: T, input: unknown): z.infer<T> {
  const result = schema.safeParse(input ?? {}, { reportInput: true });
  if (!result.success) throw fromZodError(result.error);
  return result.data;
}
