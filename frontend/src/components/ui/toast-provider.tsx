import { useCallback, useMemo, useRef, useState, type ReactNode } from 'react';

import { Toast } from './toast';
import { ToastContext, type ToastApi, type ToastMessage, type ToastTone } from './toast-context';

/**
 * Two live regions, always mounted so screen readers are listening before a message arrives:
 * polite for confirmations, assertive for problems.
 */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<ToastMessage[]>([]);
  const nextId = useRef(1);

  const dismiss = useCallback((id: number) => setToasts((all) => all.filter((t) => t.id !== id)), []);
  const show = useCallback((text: string, tone: ToastTone = 'pass') => {
    const id = nextId.current++;
    setToasts((all) => [...all, { id, text, tone }]);
  }, []);
  const api = useMemo<ToastApi>(() => ({ show }), [show]);

  const region = (assertive: boolean) => (
    // Problems use aria-live without role="alert", so page-level alerts stay the only "alert" role.
    <div role={assertive ? undefined : 'status'} aria-live={assertive ? 'assertive' : 'polite'}>
      <ul className="flex flex-col gap-2">
        {toasts
          .filter((t) => (t.tone === 'blocked') === assertive)
          .map((t) => (
            <Toast key={t.id} toast={t} onDismiss={dismiss} />
          ))}
      </ul>
    </div>
  );

  return (
    <ToastContext.Provider value={api}>
      {children}
      <div className="pointer-events-none fixed inset-x-4 bottom-4 z-50 ml-auto flex max-w-md flex-col gap-2 [&_li]:pointer-events-auto">
        {region(true)}
        {region(false)}
      </div>
    </ToastContext.Provider>
  );
}
