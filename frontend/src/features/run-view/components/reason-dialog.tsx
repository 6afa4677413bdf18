import { useId, useState, type FormEvent, type ReactNode } from 'react';

import { ReasonSchema } from '@tracewright/shared';

import { BenchDialog } from './bench-dialog';
import { benchButton } from './bench-button-styles';

type ReasonDialogProps = {
  title: string;
  label: string;
  submitLabel: string;
  onSubmit: (reason: string) => void;
  onClose: () => void;
  children?: ReactNode;
};

/** Asks why (at least a few words, by the shared rule) before a write that raises a deviation. */
export function ReasonDialog({ title, label, submitLabel, onSubmit, onClose, children }: ReasonDialogProps) {
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string | null>(null);
  const id = useId();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = ReasonSchema.safeParse(reason);
    if (!parsed.success) return setError(parsed.error.issues[0]?.message ?? 'Give a reason.');
    onSubmit(parsed.data);
  };

  return (
    <BenchDialog title={title} onClose={onClose} tone="warning">
      <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
        {children}
        <label htmlFor={id} className="font-bold">
          {label}
        </label>
        <textarea
          id={id}
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          rows={3}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className="min-h-28 w-full rounded-lg border-2 border-graphite-500 bg-white p-3 text-[1.25rem]"
        />
        {error ? (
          <p id={`${id}-error`} className="font-bold text-oxide-700">
            {error}
          </p>
        ) : null}
        <div className="flex flex-wrap justify-end gap-2">
          <button type="button" onClick={onClose} className={benchButton('secondary')}>
            Cancel
          </button>
          <button type="submit" className={benchButton('primary')}>
            {submitLabel}
          </button>
        </div>
      </form>
    </BenchDialog>
  );
}
