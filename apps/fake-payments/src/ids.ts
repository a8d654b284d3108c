import { randomBytes } from 'node:crypto';

const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';

/** A random id with the provider's prefix style, e.g. `newId('cs_test')` → `cs_test_a1B2…`. */
export function newId(prefix: string, length = 24): string {
  const bytes = randomBytes(length);
  let suffix = '';
  for (const byte of bytes) suffix += ALPHABET[byte % ALPHABET.length] ?? 'x';
  return `${prefix}_${suffix}`;
}
