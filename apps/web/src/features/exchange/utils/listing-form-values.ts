import { inchFractionLabel, parseInchText } from '@app/calc';
import type { ListingDto } from '@app/shared';
import type { FormSchemaModule } from '@/lib/lazy-schema';

/** What the form holds: strings as typed; converted to the shared listing schema on submit. */
export interface ListingFormValues {
  category: string;
  title: string;
  description: string;
  condition: string;
  price: string;
  currency: string;
  harborId: string;
  specs: Record<string, string>;
}

type SpecKind = 'num' | 'inch' | 'str' | 'bool';
const SPEC_KEYS: Record<string, Array<[key: string, kind: SpecKind]>> = {
  anchor: [
    ['anchorType', 'str'],
    ['massKg', 'num'],
  ],
  chain: [
    ['grade', 'str'],
    ['tradeSizeIn', 'inch'],
    ['nominalMm', 'num'],
    ['lengthM', 'num'],
    ['galvanizing', 'str'],
  ],
  rode: [
    ['material', 'str'],
    ['construction', 'str'],
    ['diameterMm', 'num'],
    ['lengthM', 'num'],
  ],
  connector: [
    ['kind', 'str'],
    ['nominalIn', 'inch'],
    ['wllN', 'num'],
  ],
  snubber: [
    ['material', 'str'],
    ['diameterMm', 'num'],
    ['lengthM', 'num'],
    ['bridle', 'bool'],
  ],
  windlass: [
    ['part', 'str'],
    ['grade', 'str'],
    ['tradeSizeIn', 'inch'],
    ['nominalMm', 'num'],
  ],
  mooring: [
    ['item', 'str'],
    ['massKg', 'num'],
  ],
  other: [],
};

const toNumber = (v: string | undefined) =>
  v === undefined || v.trim() === '' ? undefined : Number(v);

/** Converts typed strings to the shared schema's shape (numbers, cents, only this category's specs). */
export function toListingInput(v: ListingFormValues): Record<string, unknown> {
  const specs: Record<string, unknown> = {};
  for (const [key, kind] of SPEC_KEYS[v.category] ?? []) {
    const raw = v.specs[key];
    if (raw === undefined || raw === '') continue;
    specs[key] =
      kind === 'num'
        ? Number(raw)
        : kind === 'inch'
          ? (parseInchText(raw) ?? Number.NaN)
          : kind === 'bool'
            ? raw === 'true'
            : raw;
  }
  const price = toNumber(v.price);
  return {
    category: v.category,
    title: v.title,
    description: v.description,
    condition: v.condition,
    priceCents: price === undefined ? undefined : Math.round(price * 100),
    currency: v.currency,
    harborId: toNumber(v.harborId),
    specs,
  };
}

/** The shared listing schema behind a converter from typed strings. */
export const formSchema = ({ listingInputSchema, z }: FormSchemaModule) =>
  z
    .custom<ListingFormValues>((v) => typeof v === 'object' && v !== null)
    .transform(toListingInput)
    .pipe(listingInputSchema);

/** An inch size as the seller would type it: "5/16", "1 1/8", or the decimal when it is not a 16th. */
const inchText = (v: number) =>
  Number.isInteger(v * 16) ? inchFractionLabel(v).replace(/ in$/, '') : String(v);

/** Form values for an existing listing (or blanks). */
export function listingFormValues(l?: ListingDto): ListingFormValues {
  const specs: Record<string, string> = {};
  for (const [k, v] of Object.entries(l?.specs ?? {}))
    specs[k] =
      (k === 'tradeSizeIn' || k === 'nominalIn') && typeof v === 'number'
        ? inchText(v)
        : typeof v === 'string' || typeof v === 'number' || typeof v === 'boolean'
          ? String(v)
          : '';
  return {
    category: l?.category ?? 'chain',
    title: l?.title ?? '',
    description: l?.description ?? '',
    condition: l?.condition ?? 'good',
    price: l ? String(l.priceCents / 100) : '',
    currency: l?.currency ?? 'EUR',
    harborId: l ? String(l.harborId) : '',
    specs,
  };
}
