import { useId, useRef, type ReactNode } from 'react';
import { Button } from './button';
import { DialogButtons } from './dialog-buttons';
import { Modal } from './modal';

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
  const cancelRef = useRef<HTMLButtonElement>(null);
  const titleId = useId();
  const bodyId = useId();

  if (!isOpen) return null;
  return (
    <Modal
      labelledBy={titleId}
      describedBy={children ? bodyId : undefined}
      onShown={() => cancelRef.current?.focus()}
      onCancel={onCancel}
      width="narrow"
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
        <DialogButtons
          onCancel={onCancel}
          cancelLabel={cancelLabel}
          cancelRef={cancelRef}
          isPending={isPending}
        >
          <Button
            variant={isDestructive ? 'danger' : 'primary'}
            onClick={onConfirm}
            isPending={isPending}
            disabled={confirmDisabled}
          >
            {confirmLabel}
          </Button>
        </DialogButtons>
      </div>
    </Modal>
  );
}
