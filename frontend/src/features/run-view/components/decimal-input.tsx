import { useId } from 'react';

type DecimalInputProps = { label: string; unit: string; value: string; onChange: (value: string) => void; error?: string | null; autoFocus?: boolean };

/** A big number field with its unit beside it; the tablet shows its number keypad. */
export function DecimalInput({ label, unit, value, onChange, error, autoFocus }: DecimalInputProps) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-bold">
        {label}
      </label>
      <div className="flex items-center gap-2">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          value={value}
          onChange={(e) => onChange(e.target.value)}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          // The operator opened this entry to type into it; the keypad should be up at once.
          autoFocus={autoFocus}
          className="min-h-14 w-44 rounded-lg border-2 border-graphite-500 bg-white px-3 text-[2rem] font-bold tabular"
        />
        <span className="text-[1.5rem] text-graphite-700">{unit}</span>
      </div>
      {error ? (
        <p id={`${id}-error`} className="font-bold text-oxide-700">
          {error}
        </p>
      ) : null}
    </div>
  );
}
