import {
  LISTING_CATEGORIES,
  LISTING_CATEGORY_LABELS,
  LISTING_CONDITIONS,
  LISTING_CONDITION_LABELS,
} from '@app/shared/values';
import { useEffect, useId, useRef, useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { cn } from '@/lib/cn';
import { activeFilterCount } from '../utils/filters';
import { draftOf, keyOf, paramsOf, type Draft, type FilterParams } from '../utils/filter-draft';
import { ExchangeSelect } from './select';

const ANY = { value: '', label: 'Any' };

export interface SearchFiltersProps {
  /** Current filters as they stand in the address bar. */
  value: Record<string, string>;
  harbors: ReadonlyArray<{ id: number; name: string }>;
  /** The member's boats; empty for visitors. */
  boats: ReadonlyArray<{ id: number; name: string }>;
  errors?: Record<string, string>;
  /** Called with every filter as it should stand; `typing` when a text box changed (replace, not push). */
  onChange: (next: FilterParams, opts: { typing: boolean }) => void;
  /** How long typing must pause before text filters apply, ms. */
  debounceMs?: number;
}

/**
 * The search box and facet filters. Lists, the checkbox and the boat apply at once; the search text, prices and
 * sizes apply when typing pauses (or on Enter / Search). Sizes take millimetres or inches ("8 mm", "5/16",
 * "3/8 in"). On a phone the filters fold behind a "Filters" button that counts the ones in use.
 */
export function SearchFilters({
  value,
  harbors,
  boats,
  errors = {},
  onChange,
  debounceMs = 400,
}: SearchFiltersProps) {
  const [draft, setDraft] = useState<Draft>(() => draftOf(value));
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const emitted = useRef(keyOf(value));

  // The address bar changed by itself (back, a link, paging): show what it says.
  const incoming = keyOf(value);
  useEffect(() => {
    if (incoming !== emitted.current) {
      emitted.current = incoming;
      setDraft(draftOf(value));
      setLocalErrors({});
    }
    // `value` is read only when its key changes.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [incoming]);
  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
    },
    [],
  );

  const apply = (d: Draft, typing: boolean) => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    const { params, errors: found } = paramsOf(d);
    setLocalErrors(found);
    if (Object.keys(found).length > 0) return;
    const key = keyOf(params);
    if (key === emitted.current) return;
    emitted.current = key;
    onChange(params, { typing });
  };
  const set = (patch: Partial<Draft>, mode: 'now' | 'typing') => {
    const next = { ...draft, ...patch };
    setDraft(next);
    if (mode === 'now') apply(next, false);
    else {
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(() => apply(next, true), debounceMs);
    }
  };
  const handleSubmit = (e: FormEvent<HTMLFormElement>) => {
    e.preventDefault();
    apply(draft, false);
  };
  const err = (k: string) => localErrors[k] ?? errors[k];
  const count = activeFilterCount(value);

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
          value={draft.q}
          onChange={(e) => set({ q: e.currentTarget.value }, 'typing')}
          placeholder="e.g. 3/8 grade 43 chain, 30 m"
          error={err('q')}
          className="flex-1"
        />
        <div className="flex gap-2">
          <Button type="submit" className="flex-1 sm:flex-none">
            Search
          </Button>
          <Button
            type="button"
            variant="secondary"
            className="flex-1 md:hidden"
            aria-expanded={open}
            aria-controls={panelId}
            aria-label={count > 0 ? `Filters, ${count} in use` : 'Filters'}
            onClick={() => setOpen((o) => !o)}
          >
            Filters
            {count > 0 && (
              <span aria-hidden="true" className="rounded-pill bg-ink-900 px-2 text-xs text-white">
                {count}
              </span>
            )}
          </Button>
        </div>
      </div>
      <div id={panelId} className={cn('flex-col gap-4', open ? 'flex' : 'hidden', 'md:flex')}>
        <div className="grid grid-cols-2 gap-3 md:grid-cols-4">
          <ExchangeSelect
            label="Category"
            name="category"
            value={draft.category}
            onChange={(e) => set({ category: e.currentTarget.value }, 'now')}
            error={err('category')}
            options={[
              ANY,
              ...LISTING_CATEGORIES.map((c) => ({ value: c, label: LISTING_CATEGORY_LABELS[c] })),
            ]}
          />
          <ExchangeSelect
            label="Harbour"
            name="harborId"
            value={draft.harborId}
            onChange={(e) => set({ harborId: e.currentTarget.value }, 'now')}
            options={[ANY, ...harbors.map((h) => ({ value: String(h.id), label: h.name }))]}
          />
          <ExchangeSelect
            label="Condition"
            name="condition"
            value={draft.condition}
            onChange={(e) => set({ condition: e.currentTarget.value }, 'now')}
            options={[
              ANY,
              ...LISTING_CONDITIONS.map((c) => ({ value: c, label: LISTING_CONDITION_LABELS[c] })),
            ]}
          />
          <ExchangeSelect
            label="Sort by"
            name="sort"
            value={draft.sort}
            onChange={(e) => set({ sort: e.currentTarget.value }, 'now')}
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
            value={draft.priceMin}
            onChange={(e) => set({ priceMin: e.currentTarget.value }, 'typing')}
            error={err('priceMin')}
          />
          <TextField
            label="Highest price"
            name="priceMax"
            type="number"
            min="0"
            step="0.01"
            inputMode="decimal"
            value={draft.priceMax}
            onChange={(e) => set({ priceMax: e.currentTarget.value }, 'typing')}
            error={err('priceMax')}
          />
          <TextField
            label="Smallest size"
            name="sizeMin"
            hint="mm or in: 8 mm, 5/16"
            autoComplete="off"
            value={draft.sizeMin}
            onChange={(e) => set({ sizeMin: e.currentTarget.value }, 'typing')}
            error={err('sizeMinMm')}
          />
          <TextField
            label="Largest size"
            name="sizeMax"
            hint="mm or in: 12 mm, 1/2 in"
            autoComplete="off"
            value={draft.sizeMax}
            onChange={(e) => set({ sizeMax: e.currentTarget.value }, 'typing')}
            error={err('sizeMaxMm')}
          />
        </div>
        {boats.length > 0 && (
          <fieldset className="grid grid-cols-1 gap-3 rounded-md border border-sand-300 p-3 sm:grid-cols-3">
            <legend className="px-1 text-sm font-bold">Fits my boat</legend>
            <ExchangeSelect
              label="Boat"
              name="fitsBoat"
              value={draft.fitsBoat}
              onChange={(e) => set({ fitsBoat: e.currentTarget.value }, 'now')}
              options={[
                { value: '', label: 'No boat' },
                ...boats.map((b) => ({ value: String(b.id), label: b.name })),
              ]}
            />
            <ExchangeSelect
              label="Design wind"
              name="windKn"
              value={draft.windKn}
              onChange={(e) => set({ windKn: e.currentTarget.value }, 'now')}
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
                checked={draft.fitsOnly}
                onChange={(e) => set({ fitsOnly: e.currentTarget.checked }, 'now')}
                className="size-5"
              />
              Only what fits
            </label>
          </fieldset>
        )}
      </div>
    </form>
  );
}
