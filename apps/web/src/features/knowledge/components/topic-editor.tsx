import type { TopicDto } from '@app/shared';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { errorMessage } from '@/lib/form-errors';
import {
  useCreateTopic,
  useDeleteTopic,
  useReorderTopics,
  useUpdateTopic,
} from '../api/edit-topics';
import { TopicFieldsForm } from './topic-fields-form';
import { countOf } from '@/lib/plural';

/** Moves the item at `from` by `step` places; the ids of the new order. */
const moved = (topics: TopicDto[], from: number, step: -1 | 1) => {
  const ids = topics.map((t) => t.id);
  const to = from + step;
  const [id] = ids.splice(from, 1);
  if (id !== undefined) ids.splice(to, 0, id);
  return ids;
};

/** Admins add, rename, reorder, retire, restore and delete the topics posts are filed under. */
export function TopicEditor({ topics }: { topics: TopicDto[] }) {
  const create = useCreateTopic();
  const update = useUpdateTopic();
  const reorder = useReorderTopics();
  const remove = useDeleteTopic();
  const [editingId, setEditingId] = useState<number | null>(null);
  const [deleting, setDeleting] = useState<TopicDto | null>(null);
  const [done, setDone] = useState('');
  const failed = [update, reorder, remove].find((m) => m.isError)?.error;

  const retire = (t: TopicDto) =>
    update.mutate(
      { id: t.id, patch: { retired: !t.retired } },
      { onSuccess: () => setDone(`“${t.name}” ${t.retired ? 'is offered again' : 'is retired'}.`) },
    );

  return (
    <div className="flex flex-col gap-6">
      <p role="status" className="text-sm font-bold text-kelp-700">
        {done}
      </p>
      {failed && (
        <Alert tone="error">
          <p>{errorMessage(failed)}</p>
        </Alert>
      )}
      <section aria-labelledby="topics-list" className="flex flex-col gap-3">
        <h2 id="topics-list" className="text-xl">
          Topics, in the order members see them
        </h2>
        <ol aria-labelledby="topics-list" className="flex flex-col gap-2">
          {topics.map((t, i) => (
            <li
              key={t.id}
              className="flex flex-col gap-2 rounded-md border border-sand-500 bg-sand-50 p-3"
            >
              {editingId === t.id ? (
                <TopicFieldsForm
                  initial={{ name: t.name, description: t.description }}
                  submitLabel="Save topic"
                  onCancel={() => setEditingId(null)}
                  onSubmit={async (values) => {
                    await update.mutateAsync({ id: t.id, patch: values });
                    setEditingId(null);
                    setDone(`Saved “${values.name}”.`);
                  }}
                />
              ) : (
                <div className="flex flex-col gap-1">
                  <h3 className="flex flex-wrap items-center gap-2 text-base">
                    {t.name}
                    {t.retired && (
                      <span className="rounded-pill border border-ink-600 px-2 text-xs text-ink-700">
                        Retired
                      </span>
                    )}
                  </h3>
                  {t.description && <p className="text-sm text-ink-700">{t.description}</p>}
                  <p className="text-xs text-ink-600">
                    {countOf(t.postCount, 'published post', 'published posts')}
                  </p>
                </div>
              )}
              <div className="flex flex-wrap gap-2">
                <Button
                  size="sm"
                  variant="secondary"
                  aria-label={`Move “${t.name}” up`}
                  disabled={i === 0 || reorder.isPending}
                  onClick={() => reorder.mutate({ topicIds: moved(topics, i, -1) })}
                >
                  ↑ Up
                </Button>
                <Button
                  size="sm"
                  variant="secondary"
                  aria-label={`Move “${t.name}” down`}
                  disabled={i === topics.length - 1 || reorder.isPending}
                  onClick={() => reorder.mutate({ topicIds: moved(topics, i, 1) })}
                >
                  ↓ Down
                </Button>
                {editingId !== t.id && (
                  <Button
                    size="sm"
                    variant="secondary"
                    aria-label={`Rename “${t.name}”`}
                    onClick={() => setEditingId(t.id)}
                  >
                    Rename
                  </Button>
                )}
                <Button
                  size="sm"
                  variant="secondary"
                  aria-label={`${t.retired ? 'Restore' : 'Retire'} “${t.name}”`}
                  onClick={() => retire(t)}
                >
                  {t.retired ? 'Restore' : 'Retire'}
                </Button>
                {t.postCount === 0 && (
                  <Button
                    size="sm"
                    variant="danger"
                    aria-label={`Delete “${t.name}”`}
                    onClick={() => setDeleting(t)}
                  >
                    Delete
                  </Button>
                )}
              </div>
            </li>
          ))}
        </ol>
        <p className="text-xs text-ink-600">
          Retiring keeps a topic on its posts but stops offering it for new ones. Only a topic no
          post uses can be deleted.
        </p>
      </section>
      <section aria-labelledby="topics-add" className="flex flex-col gap-3">
        <h2 id="topics-add" className="text-xl">
          Add a topic
        </h2>
        <TopicFieldsForm
          submitLabel="Add topic"
          onSubmit={async (values) => {
            await create.mutateAsync(values);
            setDone(`Added “${values.name}”.`);
          }}
        />
      </section>
      <ConfirmDialog
        isOpen={deleting !== null}
        title={`Delete “${deleting?.name ?? ''}”?`}
        confirmLabel="Delete topic"
        isDestructive
        isPending={remove.isPending}
        onCancel={() => setDeleting(null)}
        onConfirm={() => {
          if (!deleting) return;
          const name = deleting.name;
          remove.mutate(deleting.id, {
            onSettled: () => setDeleting(null),
            onSuccess: () => setDone(`Deleted “${name}”.`),
          });
        }}
      >
        <p>The topic goes for good. Retire it instead if you may want it back.</p>
      </ConfirmDialog>
    </div>
  );
}
