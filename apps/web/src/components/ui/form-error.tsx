export interface FormErrorProps {
  message?: string;
}

/** The form-level error (not tied to one field), announced as an alert; renders nothing without a message. */
export function FormError({ message }: FormErrorProps) {
  if (!message) return null;
  return (
    <p
      role="alert"
      className="rounded-md border-l-4 border-flare-700 bg-flare-50 px-3 py-2 text-sm font-bold text-flare-700"
    >
      {message}
    </p>
  );
}
