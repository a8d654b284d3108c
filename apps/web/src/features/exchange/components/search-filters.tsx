import {
  LISTING_CATEGORIES,
  LISTING_CATEGORY_LABELS,
  LISTING_CONDITIONS,
  LISTING_CONDITION_LABELS,
} from '@app/shared';
import type { FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { ExchangeSelect } from './select';

export interface SearchFiltersProps {
  /** Current filters as they stand in the address bar. */
  value: Record<string, string>;
  harbors: ReadonlyArray<{ id: number; name: string }>;
  /** The member's boats; empty for visitors. */
  boats: ReadonlyArray<{ id: number; name: string }>;
  errors?: Record<string, string>;
  onChange: (next: Record<string, string | number | undefined>) => void;
}

const ANY = { value: '', label: 'Any' };
const text = (f: FormData, k: string) => {
  const v = f.get(k);
  return typeof v === 'string' && v.trim() !== '' ? v.trim() : undefined;
};
const cents = (v: string | undefined) =>
  v === undefined ? undefined : Math.round(Number(v) * 100);

/** The search box and facet filters; applies on submit so typing does not fire a request per key. */
export function SearchFilters({
  value,
  harbors,
  boats,
  errors = {},
  onChange,
}: SearchFiltersProps) {
  const handleSubmit = (e: FormEvent<HTMLFormElement>) => {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const fitsBoat = text(f, 'fitsBoat');
    onChange({
      q: text(f, 'q'),
      category: text(f, 'category'),
      harborId: text(f, 'harborId'),
      condition: text(f, 'condition'),
      priceMin: cents(text(f, 'priceMin')),
      priceMax: cents(text(f, 'priceMax')),
      sizeMinMm: text(f, 'sizeMinMm'),
      sizeMaxMm: text(f, 'sizeMaxMm'),
      sort: text(f, 'sort'),
      fitsBoat: fitsBoat,
      windKn: fitsBoat ? text(f, 'windKn') : undefined,
      fitsOnly: fitsBoat && f.get('fitsOnly') === 'on' ? 'true' : undefined,
    });
  };
  const price = (v: string | undefined) => (v ? String(Number(v) / 100) : '');
  return (
    <form
      role="search"
      aria-label="Search the exchange"
      onSubmit={handleSubmit}
      className="flex flex-col gap-4 rounded-lg border border-sand-300 bg-sand-100 p-4"
    >
      <div className="flex flex-col gap-2 sm:flex-row sm:items-end">
        <TextField
          label="Search gear"
          name="q"
          type="search"
          defaultValue={value.q ?? ''}
          placeholder="e.g. 3/8 grade 43 chain"
          error={errors.q}
          className="flex-1"
        />
        <Button type="submit">Search</Button>
      </div>
      <div className="grid grid-cols-2 gap-3 md:grid-cols-4">
        <ExchangeSelect
          label="Category"
          name="category"
          defaultValue={value.category ?? ''}
          error={errors.category}
          options={[
            ANY,
            ...LISTING_CATEGORIES.map((c) => ({ value: c, label: LISTING_CATEGORY_LABELS[c] })),
          ]}
        />
        <ExchangeSelect
          label="Harbour"
          name="harborId"
          defaultValue={value.harborId ?? ''}
          options={[ANY, ...harbors.map((h) => ({ value: String(h.id), label: h.name }))]}
        />
        <ExchangeSelect
          label="Condition"
          name="condition"
          defaultValue={value.condition ?? ''}
          options={[
            ANY,
            ...LISTING_CONDITIONS.map((c) => ({ value: c, label: LISTING_CONDITION_LABELS[c] })),
          ]}
        />
        <ExchangeSelect
          label="Sort by"
          name="sort"
          defaultValue={value.sort ?? ''}
          options={[
            { value: '', label: 'Best match / newest' },
            { value: 'newest', label: 'Newest' },
            { value: 'price-asc', label: 'Price, low to high' },
            { value: 'price-desc', label: 'Price, high to low' },
          ]}
        />
        <TextField
          label="Lowest price"
          name="priceMin"
          type="number"
          min="0"
          step="0.01"
          inputMode="decimal"
          defaultValue={price(value.priceMin)}
          error={errors.priceMin}
        />
        <TextField
          label="Highest price"
          name="priceMax"
          type="number"
          min="0"
          step="0.01"
          inputMode="decimal"
          defaultValue={price(value.priceMax)}
          error={errors.priceMax}
        />
        <TextField
          label="Smallest size (mm)"
          name="sizeMinMm"
          type="number"
          min="0"
          step="0.1"
          inputMode="decimal"
          defaultValue={value.sizeMinMm ?? ''}
          error={errors.sizeMinMm}
        />
        <TextField
          label="Largest size (mm)"
          name="sizeMaxMm"
          type="number"
          min="0"
          step="0.1"
          inputMode="decimal"
          defaultValue={value.sizeMaxMm ?? ''}
          error={errors.sizeMaxMm}
        />
      </div>
      {boats.length > 0 && (
        <fieldset className="grid grid-cols-1 gap-3 rounded-md border border-sand-300 p-3 sm:grid-cols-3">
          <legend className="px-1 text-sm font-bold">Fits my boat</legend>
          <ExchangeSelect
            label="Boat"
            name="fitsBoat"
            defaultValue={value.fitsBoat ?? ''}
            options={[
              { value: '', label: 'No boat' },
              ...boats.map((b) => ({ value: String(b.id), label: b.name })),
            ]}
          />
          <ExchangeSelect
            label="Design wind"
            name="windKn"
            defaultValue={value.windKn ?? '30'}
            options={[
              { value: '15', label: '15 kn (light)' },
              { value: '30', label: '30 kn (working)' },
              { value: '42', label: '42 kn (storm)' },
              { value: '50', label: '50 kn (beyond the table)' },
            ]}
          />
          <label className="flex min-h-11 items-center gap-2 self-end text-sm font-bold">
            <input
              type="checkbox"
              name="fitsOnly"
              defaultChecked={value.fitsOnly === 'true'}
              className="size-5"
            />
            Only what fits
          </label>
        </fieldset>
      )}
    </form>
  );
}
