import type { StormCloseInput } from '@app/shared';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { applyServerErrors } from '@/lib/form-errors';
import { lazyResolver } from '@/lib/lazy-schema';

const resolver = lazyResolver((schemas) => schemas.stormCloseSchema);

export interface CloseFormProps {
  isPending: boolean;
  onSubmit: (input: StormCloseInput) => Promise<unknown>;
}

/** Closing a watch with a short lessons note, optionally started as a draft knowledge post. */
export function CloseForm({ isPending, onSubmit }: CloseFormProps) {
  const { register, handleSubmit, setError, formState } = useForm<StormCloseInput>({
    resolver,
    defaultValues: { lessons: '', makePost: true },
  });
  const submit = handleSubmit(async (v) => {
    try {
      await onSubmit(v);
    } catch (err) {
      applyServerErrors(err, setError, ['lessons', 'makePost']);
    }
  });
  const error = formState.errors.lessons?.message;
  return (
    <form onSubmit={(e) => void submit(e)} noValidate className="flex max-w-2xl flex-col gap-3">
      <div className="flex flex-col gap-1">
        <label htmlFor="lessons" className="text-sm font-bold">
          Lessons note
        </label>
        <p id="lessons-hint" className="text-xs text-ink-600">
          What held, what failed, what to do earlier next time.
        </p>
        <textarea
          id="lessons"
          rows={5}
          aria-describedby={error ? 'lessons-hint lessons-error' : 'lessons-hint'}
          aria-invalid={error ? true : undefined}
          {...register('lessons')}
          className="rounded-md border border-sand-500 bg-sand-50 px-3 py-2"
        />
        {error && (
          <p id="lessons-error" className="text-sm font-bold text-flare-700">
            {error}
          </p>
        )}
      </div>
      <label className="flex min-h-11 items-center gap-2">
        <input type="checkbox" {...register('makePost')} className="size-5" />
        Start a draft knowledge post from the note (you edit and publish it)
      </label>
      <FormError message={formState.errors.root?.server?.message} />
      <div>
        <Button type="submit" variant="danger" isPending={isPending} pendingLabel="Closing…">
          Close the watch
        </Button>
      </div>
    </form>
  );
}
