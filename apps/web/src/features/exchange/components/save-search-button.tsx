import type { SavedSearchInput } from '@app/shared';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { errorMessage } from '@/lib/form-errors';
import {
  useCreateSavedSearch,
  useDeleteSavedSearch,
  useSavedSearches,
} from '../api/saved-searches';

/** Saves the current filters as a search that e-mails new matches once; lists and deletes saved ones. */
export function SaveSearchButton({ filters }: { filters: Record<string, string> }) {
  const create = useCreateSavedSearch();
  const remove = useDeleteSavedSearch();
  const saved = useSavedSearches(true);
  const [done, setDone] = useState(false);
  const criteria: SavedSearchInput['criteria'] = {
    q: filters.q,
    category: filters.category as SavedSearchInput['criteria']['category'],
    harborId: filters.harborId ? Number(filters.harborId) : undefined,
    condition: filters.condition as SavedSearchInput['criteria']['condition'],
    priceMax: filters.priceMax ? Number(filters.priceMax) : undefined,
    sizeMinMm: filters.sizeMinMm ? Number(filters.sizeMinMm) : undefined,
    sizeMaxMm: filters.sizeMaxMm ? Number(filters.sizeMaxMm) : undefined,
  };
  const name = [filters.q, filters.category].filter(Boolean).join(' · ') || 'My search';
  return (
    <div className="flex flex-col gap-2">
      <div>
        <Button
          variant="secondary"
          size="sm"
          isPending={create.isPending}
          onClick={() => create.mutate({ name, criteria }, { onSuccess: () => setDone(true) })}
        >
          E-mail me new matches
        </Button>
      </div>
      {done && (
        <Alert tone="success">Saved. You get one e-mail for each new listing that matches.</Alert>
      )}
      {create.isError && <Alert tone="error">{errorMessage(create.error)}</Alert>}
      {saved.data && saved.data.length > 0 && (
        <details className="text-sm">
          <summary className="cursor-pointer font-bold">
            Your saved searches ({saved.data.length})
          </summary>
          <ul className="mt-1 flex flex-col gap-1">
            {saved.data.map((s) => (
              <li key={s.id} className="flex items-center gap-2">
                <span>{s.name}</span>
                <Button variant="ghost" size="sm" onClick={() => remove.mutate(s.id)}>
                  Delete<span className="sr-only"> {s.name}</span>
                </Button>
              </li>
            ))}
          </ul>
        </details>
      )}
    </div>
  );
}
