import { useId, useRef, type ReactNode } from 'react';
import { Button } from './button';
import { useModal } from './use-modal';

export interface ConfirmDialogProps {
  isOpen: boolean;
  title: string;
  children?: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  /** Use the red button for something that takes a right away or deletes. */
  isDestructive?: boolean;
  isPending?: boolean;
  /** Keeps the confirm button off until the question inside is answered. */
  confirmDisabled?: boolean;
  onConfirm: () => void;
  onCancel: () => void;
}

/**
 * A modal question with two answers, built on the native <dialog>: focus moves into it, Escape cancels,
 * and focus goes back where it was when it closes.
 */
export function ConfirmDialog({
  isOpen,
  title,
  children,
  confirmLabel,
  cancelLabel = 'Cancel',
  isDestructive = false,
  isPending = false,
  confirmDisabled = false,
  onConfirm,
  onCancel,
}: ConfirmDialogProps) {
  const dialogRef = useRef<HTMLDialogElement>(null);
  const cancelRef = useRef<HTMLButtonElement>(null);
  const titleId = useId();
  const bodyId = useId();

  useModal(dialogRef, () => cancelRef.current?.focus(), isOpen);

  if (!isOpen) return null;
  return (
    <dialog
      ref={dialogRef}
      aria-labelledby={titleId}
      aria-describedby={children ? bodyId : undefined}
      onCancel={(event) => {
        event.preventDefault();
        onCancel();
      }}
      className="m-auto w-[min(28rem,calc(100vw-2rem))] rounded-lg border border-sand-300 bg-sand-50 p-0 text-ink-900 shadow-card backdrop:bg-ink-950/50"
    >
      <div className="flex flex-col gap-4 p-5">
        <h2 id={titleId} className="text-xl">
          {title}
        </h2>
        {children && (
          <div id={bodyId} className="text-sm">
            {children}
          </div>
        )}
        <div className="flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">
          <Button ref={cancelRef} variant="secondary" onClick={onCancel} disabled={isPending}>
            {cancelLabel}
          </Button>
          <Button
            variant={isDestructive ? 'danger' : 'primary'}
            onClick={onConfirm}
            isPending={isPending}
            disabled={confirmDisabled}
          >
            {confirmLabel}
          </Button>
        </div>
      </div>
    </dialog>
  );
}
