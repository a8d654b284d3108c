import type { FormEvent, ReactNode } from 'react';
import { FormError } from '@/components/ui/form-error';
import { TextField, type TextFieldProps } from '@/components/ui/text-field';

export interface AccountFormProps {
  onSubmit: (event: FormEvent<HTMLFormElement>) => Promise<void>;
  /** The form-level error (`errors.root.server`), shown above the fields. */
  serverError: string | undefined;
  children: ReactNode;
}

/** The frame of the account forms: the schema's messages instead of the browser's, the server's error first. */
export function AccountForm({ onSubmit, serverError, children }: AccountFormProps) {
  return (
    <form noValidate onSubmit={(event) => void onSubmit(event)} className="flex flex-col gap-4">
      <FormError message={serverError} />
      {children}
    </form>
  );
}

type FieldProps = Omit<TextFieldProps, 'type' | 'autoComplete' | 'required'>;

/** The required e-mail field of the account forms. */
export function EmailField(props: Omit<FieldProps, 'label'>) {
  return <TextField label="E-mail" type="email" autoComplete="email" required {...props} />;
}

/**
 * A required password field; `isNew` for one being chosen (the browser offers to generate and save it),
 * otherwise the one the person has.
 */
export function PasswordField({ isNew = false, ...props }: FieldProps & { isNew?: boolean }) {
  return (
    <TextField
      type="password"
      autoComplete={isNew ? 'new-password' : 'current-password'}
      required
      {...props}
    />
  );
}
