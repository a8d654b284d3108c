import { z } from 'zod';
export * from './values/dues';
/** A calendar date, YYYY-MM-DD, that really exists. */
export const isoDate = z
  .string({ error: 'Give a date' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use the form YYYY-MM-DD')
  .refine((s) => {
    const d = new Date(`${s}T00:00:00Z`);
    return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
  }, 'That date does not exist');

/** An amount in minor units (cents), named by `label` in its messages. */
export const minorAmountSchema = (label: string) =>
  z
    .number({ error: `${label} must be a number` })
    .int(`${label} must be a whole number of cents`)
    .min(0, `${label} cannot be negative`)
    .max(100_000_000, `${label} is too large`);

export const currencySchema = z
  .string({ error: 'Give a currency' })
  .trim()
  .regex(/^[A-Za-z]{3}$/, 'Use a three-letter currency code such as EUR')
  .transform((s) => s.toUpperCase());
