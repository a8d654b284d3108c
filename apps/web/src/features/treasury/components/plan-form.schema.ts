import { PLAN_KINDS, planInputSchema, z } from '../../../lib/schemas';
import { moneyMessage, parseMoney } from '../utils/money';

const shape = planInputSchema.shape;
// The shared plan schema, with money typed as decimals (120.50) and converted to minor units on submit.
export const formSchema = z
  .object({
    code: shape.code,
    name: shape.name,
    kind: z.enum(PLAN_KINDS, { error: 'Choose who the plan is for' }),
    description: z.string().trim().max(500, 'Keep the description under 500 characters'),
    amount: z.string(),
    currency: shape.currency,
    proration: shape.proration,
    lateFee: z.string(),
    graceDays: z
      .number({ error: 'Give the grace period in whole days' })
      .pipe(shape.graceDays.unwrap()),
    active: z.boolean(),
  })
  .superRefine((v, ctx) => {
    const money = [
      ['amount', 'Amount', shape.amountMinor],
      ['lateFee', 'Late fee', shape.lateFeeMinor],
    ] as const;
    for (const [field, label, rule] of money) {
      const minor = parseMoney(v[field], v.currency);
      if (minor === null) {
        ctx.addIssue({ code: 'custom', path: [field], message: moneyMessage(label, v.currency) });
        continue;
      }
      const checked = rule.safeParse(minor);
      if (!checked.success)
        ctx.addIssue({
          code: 'custom',
          path: [field],
          message: checked.error.issues[0]?.message ?? `Check the ${label.toLowerCase()}`,
        });
    }
  });
