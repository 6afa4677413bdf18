import { useEffect, useId, useRef, type KeyboardEvent, type ReactNode } from 'react';
import { createPortal } from 'react-dom';

type ModalDialogProps = { title: string; onClose: () => void; children: ReactNode; wide?: boolean };

const FOCUSABLE = 'input:not([disabled]), textarea:not([disabled]), select:not([disabled]), button:not([disabled]), a[href]';

/**
 * Holds the focus until answered: the first field takes it, Tab cycles inside, Escape cancels,
 * and the focus returns to whatever opened the dialog.
 */
export function ModalDialog({ title, onClose, children, wide = false }: ModalDialogProps) {
  const panelRef = useRef<HTMLDivElement>(null);
  const titleId = useId();

  useEffect(() => {
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    panelRef.current?.querySelector<HTMLElement>(FOCUSABLE)?.focus();
    return () => opener?.focus();
  }, []);

  const onKeyDown = (event: KeyboardEvent) => {
    if (event.key === 'Escape') {
      event.stopPropagation();
      onClose();
      return;
    }
    if (event.key !== 'Tab' || !panelRef.current) return;
    const items = [...panelRef.current.querySelectorAll<HTMLElement>(FOCUSABLE)];
    const edge = event.shiftKey ? items[0] : items[items.length - 1];
    if (document.activeElement === edge) {
      event.preventDefault();
      (event.shiftKey ? items[items.length - 1] : items[0])?.focus();
    }
  };

  return createPortal(
    <div className="fixed inset-0 z-40 flex items-center justify-center bg-graphite-900/50 p-4 print:hidden">
      <div
        ref={panelRef}
        role="dialog"
        aria-modal="true"
        aria-labelledby={titleId}
        onKeyDown={onKeyDown}
        className={`max-h-full w-full overflow-auto rounded-md bg-white p-6 shadow-xl ${wide ? 'max-w-2xl' : 'max-w-lg'}`}
      >
        <h2 id={titleId} className="mb-4 text-xl font-bold">
          {title}
        </h2>
        {children}
      </div>
    </div>,
    document.body,
  );
}
