import {
  useForm,
  type DefaultValues,
  type FieldValues,
  type Path,
  type Resolver,
  type UseFormReturn,
} from 'react-hook-form';
import { applyServerErrors } from '@/lib/form-errors';

export interface AccountFormOptions<In extends FieldValues, Out> {
  resolver: Resolver<In, unknown, Out>;
  defaultValues: DefaultValues<In>;
  /** The fields the server's messages may name; any other message goes above the form. */
  fields: readonly Path<In>[];
  /** Sends the checked values; a rejection puts the server's messages on the form. */
  send: (values: Out, form: UseFormReturn<In, unknown, Out>) => Promise<unknown>;
  /** A failure the form shows in its own way instead (its messages are then not placed). */
  isShownElsewhere?: (error: unknown) => boolean;
}

/**
 * The state of one account form: the fields, their errors, and the props of its `AccountForm` frame (the
 * submit handler and the form-level server error). The values the person typed stay when sending fails.
 */
export function useAccountForm<In extends FieldValues, Out>({
  resolver,
  defaultValues,
  fields,
  send,
  isShownElsewhere,
}: AccountFormOptions<In, Out>) {
  const form = useForm<In, unknown, Out>({ resolver, defaultValues });
  const { errors } = form.formState;
  const onSubmit = form.handleSubmit(async (values) => {
    try {
      await send(values, form);
    } catch (error) {
      if (!isShownElsewhere?.(error)) applyServerErrors(error, form.setError, fields);
    }
  });
  return {
    form,
    register: form.register,
    errors,
    frame: { onSubmit, serverError: errors.root?.server?.message },
  };
}
