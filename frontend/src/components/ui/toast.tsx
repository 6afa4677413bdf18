import { useEffect } from 'react';

import { Icon } from '../icons/icon';
import type { IconName } from '../icons/icon-paths';
import type { ToastMessage } from './toast-context';

const LOOK: Record<ToastMessage['tone'], { classes: string; icon: IconName; word: string }> = {
  pass: { classes: 'border-verdigris-700 text-verdigris-800', icon: 'check', word: 'Done' },
  blocked: { classes: 'border-oxide-700 text-oxide-800', icon: 'blocked', word: 'Problem' },
  info: { classes: 'border-graphite-500 text-graphite-800', icon: 'info', word: 'Note' },
};

// Problems stay until dismissed: a person away from the screen must still find out.
const PASS_TIMEOUT_MS = 6000;

type ToastProps = { toast: ToastMessage; onDismiss: (id: number) => void };

export function Toast({ toast, onDismiss }: ToastProps) {
  const { classes, icon, word } = LOOK[toast.tone];
  useEffect(() => {
    if (toast.tone === 'blocked') return undefined;
    const timer = window.setTimeout(() => onDismiss(toast.id), PASS_TIMEOUT_MS);
    return () => window.clearTimeout(timer);
  }, [toast, onDismiss]);

  return (
    <li className={`flex items-start gap-3 rounded-md border-2 bg-white p-3 shadow-md ${classes}`}>
      <Icon name={icon} className="mt-0.5 size-5" />
      <p className="flex-1">
        <span className="font-bold">{word}: </span>
        {toast.text}
      </p>
      <button
        type="button"
        onClick={() => onDismiss(toast.id)}
        className="-m-1 inline-flex size-11 items-center justify-center rounded-md text-graphite-700 hover:bg-graphite-100"
      >
        <Icon name="close" title="Dismiss" />
      </button>
    </li>
  );
}
