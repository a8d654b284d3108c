import type { topicInputSchema } from '@app/shared';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { applyServerErrors } from '@/lib/form-errors';
import { lazyResolver } from '@/lib/lazy-schema';

type FieldsSchema = ReturnType<typeof topicInputSchema.pick<{ name: true; description: true }>>;
type FieldsInput = z.input<FieldsSchema>;
type FieldsOutput = z.output<FieldsSchema>;
const resolver = lazyResolver(({ topicInputSchema }) =>
  topicInputSchema.pick({ name: true, description: true }),
);
const FIELD_NAMES = ['name', 'description'] as const;

export interface TopicFieldsFormProps {
  initial?: { name: string; description: string };
  submitLabel: string;
  /** Throws the server's error; its field messages land on the fields. */
  onSubmit: (values: FieldsOutput) => Promise<unknown>;
  onCancel?: () => void;
}

/** A topic's name and description (adding one or renaming one); the schema is the API's own. */
export function TopicFieldsForm({
  initial,
  submitLabel,
  onSubmit,
  onCancel,
}: TopicFieldsFormProps) {
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<FieldsInput, unknown, FieldsOutput>({
    resolver,
    defaultValues: initial ?? { name: '', description: '' },
  });
  const submit = handleSubmit(async (values) => {
    try {
      await onSubmit(values);
      if (!initial) reset({ name: '', description: '' });
    } catch (error) {
      applyServerErrors(error, setError, FIELD_NAMES);
    }
  });
  return (
    <form noValidate onSubmit={(e) => void submit(e)} className="flex flex-col gap-3">
      <FormError message={errors.root?.server?.message} />
      <TextField
        label="Topic name"
        required
        maxLength={60}
        error={errors.name?.message}
        {...register('name')}
      />
      <TextField
        label="Description"
        hint="One line shown under the topic (optional)."
        maxLength={300}
        error={errors.description?.message}
        {...register('description')}
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" size="sm" isPending={isSubmitting}>
          {submitLabel}
        </Button>
        {onCancel && (
          <Button size="sm" variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
