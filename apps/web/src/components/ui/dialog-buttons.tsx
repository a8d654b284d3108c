import type { ReactNode, Ref } from 'react';
import { Button } from './button';

export interface DialogButtonsProps {
  onCancel: () => void;
  cancelLabel?: string;
  cancelRef?: Ref<HTMLButtonElement>;
  /** Keeps Cancel off while the answer is being sent. */
  isPending?: boolean;
  /** The answering button. */
  children: ReactNode;
}

/** The foot of a dialog: Cancel, then the answer (stacked with the answer on top on a phone). */
export function DialogButtons({
  onCancel,
  cancelLabel = 'Cancel',
  cancelRef,
  isPending = false,
  children,
}: DialogButtonsProps) {
  return (
    <div className="flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">
      <Button ref={cancelRef} variant="secondary" onClick={onCancel} disabled={isPending}>
        {cancelLabel}
      </Button>
      {children}
    </div>
  );
}
