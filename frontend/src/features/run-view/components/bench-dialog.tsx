import { useEffect, useId, useRef, type KeyboardEvent, type ReactNode } from 'react';
import { createPortal } from 'react-dom';

import { Icon } from '../../../components/icons/icon';
import { benchButton } from './bench-button-styles';

type BenchDialogProps = { title: string; onClose: () => void; children: ReactNode; tone?: 'plain' | 'warning'; wide?: boolean };

const FOCUSABLE = 'input:not([disabled]), textarea:not([disabled]), select:not([disabled]), button:not([disabled]), a[href]';

/**
 * A bench-sized dialog that holds the focus until answered: the first field (or button) takes
 * the focus, Tab stays inside, Escape closes, and the focus returns to what opened it.
 */
export function BenchDialog({ title, onClose, children, tone = 'plain', wide = false }: BenchDialogProps) {
  const panelRef = useRef<HTMLDivElement>(null);
  const titleId = useId();

  useEffect(() => {
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    const panel = panelRef.current;
    const first = panel?.querySelector<HTMLElement>('[data-autofocus]') ?? panel?.querySelector<HTMLElement>(`.dialog-body :is(${FOCUSABLE})`);
    first?.focus();
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
    const first = items[0];
    const last = items[items.length - 1];
    if (event.shiftKey && document.activeElement === first) {
      event.preventDefault();
      last?.focus();
    } else if (!event.shiftKey && document.activeElement === last) {
      event.preventDefault();
      first?.focus();
    }
  };

  const edge = tone === 'warning' ? 'border-4 border-amber-700' : 'border-2 border-graphite-300';
  return createPortal(
    <div className="fixed inset-0 z-50 flex items-end justify-center bg-graphite-900/60 p-3 sm:items-center">
      <div
        ref={panelRef}
        role="dialog"
        aria-modal="true"
        aria-labelledby={titleId}
        onKeyDown={onKeyDown}
        className={`max-h-full w-full overflow-auto rounded-xl bg-white p-5 text-[1.25rem] text-graphite-900 shadow-xl ${edge} ${wide ? 'max-w-3xl' : 'max-w-xl'}`}
      >
        <div className="mb-4 flex items-start justify-between gap-4">
          <h2 id={titleId} className="text-[1.75rem] font-bold leading-tight">
            {title}
          </h2>
          <button type="button" onClick={onClose} className={benchButton('secondary', '', 'compact')} aria-label="Close">
            <Icon name="close" className="size-6" />
          </button>
        </div>
        <div className="dialog-body">{children}</div>
      </div>
    </div>,
    document.body,
  );
}
