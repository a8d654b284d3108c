import type { StormChecklistItem } from '@app/shared';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { errorMessage } from '@/lib/form-errors';
import { loadFormSchemas, preloadFormSchemas } from '@/lib/lazy-schema';

preloadFormSchemas();

const slug = (label: string) =>
  label
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 40) || 'item';

export interface ChecklistEditorProps {
  items: readonly StormChecklistItem[];
  isPending: boolean;
  onSave: (items: StormChecklistItem[]) => Promise<unknown>;
}

/** The club's checklist template: rename, remove, add and reorder items, then save. */
export function ChecklistEditor({ items: initial, isPending, onSave }: ChecklistEditorProps) {
  const [items, setItems] = useState<StormChecklistItem[]>([...initial]);
  const [added, setAdded] = useState('');
  const [error, setError] = useState<string | undefined>();
  const [saved, setSaved] = useState(false);
  const change = (next: StormChecklistItem[]) => {
    setItems(next);
    setSaved(false);
  };
  const move = (i: number, by: number) => {
    const next = [...items];
    const [item] = next.splice(i, 1);
    if (item) next.splice(i + by, 0, item);
    change(next);
  };
  const add = () => {
    const label = added.trim();
    if (!label) return;
    let id = slug(label);
    while (items.some((i) => i.id === id)) id = `${id.slice(0, 36)}-${items.length + 1}`;
    change([...items, { id, label }]);
    setAdded('');
  };
  const save = async () => {
    const parsed = (await loadFormSchemas()).stormChecklistSchema.safeParse({ items });
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message);
      return;
    }
    setError(undefined);
    try {
      await onSave(parsed.data.items);
      setSaved(true);
    } catch (err) {
      setError(errorMessage(err));
    }
  };
  return (
    <div className="flex max-w-2xl flex-col gap-4">
      <ol className="flex flex-col gap-3">
        {items.map((item, i) => (
          <li key={item.id} className="flex flex-wrap items-end gap-2">
            <TextField
              className="min-w-64 flex-1"
              label={`Item ${i + 1}`}
              value={item.label}
              onChange={(e) =>
                change(items.map((x) => (x.id === item.id ? { ...x, label: e.target.value } : x)))
              }
            />
            <Button size="sm" variant="secondary" disabled={i === 0} onClick={() => move(i, -1)}>
              Up<span className="sr-only"> ({item.label})</span>
            </Button>
            <Button
              size="sm"
              variant="secondary"
              disabled={i === items.length - 1}
              onClick={() => move(i, 1)}
            >
              Down<span className="sr-only"> ({item.label})</span>
            </Button>
            <Button
              size="sm"
              variant="ghost"
              onClick={() => change(items.filter((x) => x.id !== item.id))}
            >
              Remove<span className="sr-only"> ({item.label})</span>
            </Button>
          </li>
        ))}
      </ol>
      <div className="flex flex-wrap items-end gap-2">
        <TextField
          className="min-w-64 flex-1"
          label="New item"
          value={added}
          onChange={(e) => setAdded(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === 'Enter') {
              e.preventDefault();
              add();
            }
          }}
        />
        <Button variant="secondary" onClick={add}>
          Add item
        </Button>
      </div>
      <FormError message={error} />
      {saved && <p role="status">Checklist saved. New watches use it; open watches keep theirs.</p>}
      <div>
        <Button isPending={isPending} pendingLabel="Saving…" onClick={() => void save()}>
          Save checklist
        </Button>
      </div>
    </div>
  );
}
