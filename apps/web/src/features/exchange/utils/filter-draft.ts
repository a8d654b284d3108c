import { parseSizeText, sizeTextOf } from '@app/calc';

/** Filters as the search request takes them (the address bar's query, typed). */
export type FilterParams = Record<string, string | number | undefined>;

// What the filter form holds while a member types (text as typed), and how it becomes the request's parameters:
// prices in cents, sizes in millimetres, a message per field that cannot be read.
export interface Draft {
  q: string;
  category: string;
  harborId: string;
  condition: string;
  sort: string;
  priceMin: string;
  priceMax: string;
  sizeMin: string;
  sizeMax: string;
  fitsBoat: string;
  windKn: string;
  fitsOnly: boolean;
}

const price = (v: string | undefined) => (v ? String(Number(v) / 100) : '');
const size = (v: string | undefined) => (v && Number(v) > 0 ? sizeTextOf(Number(v)) : (v ?? ''));

export function draftOf(value: Record<string, string>): Draft {
  return {
    q: value.q ?? '',
    category: value.category ?? '',
    harborId: value.harborId ?? '',
    condition: value.condition ?? '',
    sort: value.sort ?? '',
    priceMin: price(value.priceMin),
    priceMax: price(value.priceMax),
    sizeMin: size(value.sizeMinMm),
    sizeMax: size(value.sizeMaxMm),
    fitsBoat: value.fitsBoat ?? '',
    windKn: value.windKn ?? '30',
    fitsOnly: value.fitsOnly === 'true',
  };
}

const blank = (v: string) => (v.trim() === '' ? undefined : v.trim());
const cents = (v: string) => {
  const t = blank(v);
  return t === undefined || !Number.isFinite(Number(t)) ? t : Math.round(Number(t) * 100);
};

/** A typed size as the API's millimetres, or the message to show under the field. */
function sizeParam(text: string): { mm?: string; error?: string } {
  if (text.trim() === '') return {};
  const parsed = parseSizeText(text);
  if (!parsed.ok) return { error: parsed.message };
  return { mm: String(Math.round(parsed.mm * 10_000) / 10_000) };
}

export function paramsOf(d: Draft): { params: FilterParams; errors: Record<string, string> } {
  const min = sizeParam(d.sizeMin);
  const max = sizeParam(d.sizeMax);
  const errors: Record<string, string> = {};
  if (min.error) errors.sizeMinMm = min.error;
  if (max.error) errors.sizeMaxMm = max.error;
  const fitsBoat = blank(d.fitsBoat);
  return {
    errors,
    params: {
      q: blank(d.q),
      category: blank(d.category),
      harborId: blank(d.harborId),
      condition: blank(d.condition),
      priceMin: cents(d.priceMin),
      priceMax: cents(d.priceMax),
      sizeMinMm: min.mm,
      sizeMaxMm: max.mm,
      sort: blank(d.sort),
      fitsBoat,
      windKn: fitsBoat ? blank(d.windKn) : undefined,
      fitsOnly: fitsBoat && d.fitsOnly ? 'true' : undefined,
    },
  };
}

export const keyOf = (p: FilterParams) =>
  JSON.stringify(
    Object.entries(p)
      .filter(([k, v]) => v !== undefined && v !== '' && k !== 'page')
      .map(([k, v]) => [k, String(v)])
      .sort(([a], [b]) => (a ?? '').localeCompare(b ?? '')),
  );
