import { z } from 'zod';

// Field schemas the shared forms build on, with the messages a member reads.

/** A finite number between `min` and `max` (in `unit`, named in the messages). */
export const numberField = (label: string, min: number, max: number, unit: string) =>
  z
    .number({ error: `${label} must be a number` })
    .finite(`${label} must be a number`)
    .min(min, `${label} must be at least ${min} ${unit}`)
    .max(max, `${label} must be at most ${max} ${unit}`);

/** Trimmed text of `min` to `max` characters (a 1-character minimum reads as "is required"). */
export const textField = (label: string, min: number, max: number) =>
  z
    .string({ error: `${label} is required` })
    .trim()
    .min(min, min > 1 ? `${label} needs at least ${min} characters` : `${label} is required`)
    .max(max, `${label} is too long (at most ${max} characters)`);
