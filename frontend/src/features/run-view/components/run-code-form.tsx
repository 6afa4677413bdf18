import { useId, useState, type FormEvent } from 'react';

import { benchButton } from './bench-button-styles';

/** The way in without a camera: type the run code from the traveller (or its number). */
export function RunCodeForm({ onSubmit, isBusy }: { onSubmit: (code: string) => void; isBusy: boolean }) {
  const id = useId();
  const [code, setCode] = useState('');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (code.trim()) onSubmit(code.trim());
  };
  return (
    <form onSubmit={submit} className="flex flex-col gap-2">
      <label htmlFor={id} className="font-bold">
        Type the run code
      </label>
      <div className="flex flex-wrap gap-2">
        <input
          id={id}
          value={code}
          onChange={(e) => setCode(e.target.value)}
          autoComplete="off"
          autoCapitalize="characters"
          placeholder="R-2026-0007"
          aria-describedby={`${id}-help`}
          className="min-h-14 w-64 rounded-lg border-2 border-graphite-500 bg-white px-3 text-[1.5rem] font-bold tabular"
        />
        <button type="submit" className={benchButton('primary')} disabled={isBusy}>
          Open run
        </button>
      </div>
      <p id={`${id}-help`} className="text-base text-graphite-700">
        It is printed under the QR code on the traveller.
      </p>
    </form>
  );
}
