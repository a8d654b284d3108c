import { useEffect, useEffectEvent, type RefObject } from 'react';

/**
 * Shows the <dialog> in `ref` as a modal while `isOpen`, then calls `onShown` (to put focus inside); when it
 * closes or unmounts, focus goes back where it was.
 */
export function useModal(
  ref: RefObject<HTMLDialogElement | null>,
  onShown: () => void,
  isOpen = true,
): void {
  const shown = useEffectEvent(onShown);
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog || !isOpen) return;
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
  }, [ref, isOpen]);
}
