import { useEffect, useEffectEvent, useRef, type ReactNode } from 'react';
import { cn } from '@/lib/cn';

export interface ModalProps {
  /** The id of the modal's heading. */
  labelledBy: string;
  describedBy?: string | undefined;
  /** Puts focus inside once the modal shows. */
  onShown: () => void;
  /** Escape (the browser's cancel). */
  onCancel: () => void;
  width?: 'narrow' | 'normal';
  children: ReactNode;
}

/**
 * A modal on the native <dialog>: it shows on mount, `onShown` moves focus in, Escape calls `onCancel`, and
 * focus goes back where it was when it unmounts.
 */
export function Modal({
  labelledBy,
  describedBy,
  onShown,
  onCancel,
  width = 'normal',
  children,
}: ModalProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const shown = useEffectEvent(onShown);
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    const returnFocusTo =
      document.activeElement instanceof HTMLElement ? document.activeElement : null;
    // jsdom and a few old browsers lack showModal; the open attribute still shows the dialog there.
    if (typeof dialog.showModal === 'function') dialog.showModal();
    else dialog.setAttribute('open', '');
    shown();
    return () => {
      if (typeof dialog.close === 'function' && dialog.open) dialog.close();
      else dialog.removeAttribute('open');
      returnFocusTo?.focus();
    };
  }, []);
  return (
    <dialog
      ref={ref}
      aria-labelledby={labelledBy}
      aria-describedby={describedBy}
      onCancel={(event) => {
        event.preventDefault();
        onCancel();
      }}
      className={cn(
        'm-auto rounded-lg border border-sand-300 bg-sand-50 p-0 text-ink-900 shadow-card backdrop:bg-ink-950/50',
        width === 'narrow' ? 'w-[min(28rem,calc(100vw-2rem))]' : 'w-[min(30rem,calc(100vw-2rem))]',
      )}
    >
      {children}
    </dialog>
  );
}
