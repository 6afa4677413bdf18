import { useId, type ChangeEvent } from 'react';

import { NumberField } from './number-field';

type Bound = { value: string; onChange: (event: ChangeEvent<HTMLInputElement>) => void };

type SpacingFieldsProps = {
  mode: Bound;
  dpi: Bound;
  spacing: Bound;
  errors: Readonly<Record<string, string>>;
};

const CHOICES = [
  { value: 'dpi', label: 'Resolution in dpi' },
  { value: 'um', label: 'Drop spacing in µm' },
] as const;

/** Drop spacing either as the printer's resolution or measured directly; only the chosen field shows. */
export function SpacingFields({ mode, dpi, spacing, errors }: SpacingFieldsProps) {
  const name = useId();
  return (
    <>
      <fieldset className="flex flex-col gap-1">
        <legend className="font-bold text-graphite-900">Drop spacing given as</legend>
        <div className="flex flex-wrap gap-x-6">
          {CHOICES.map((choice) => (
            <label key={choice.value} className="inline-flex min-h-11 items-center gap-2">
              <input type="radio" name={name} value={choice.value} checked={mode.value === choice.value} onChange={mode.onChange} className="size-5 accent-copper-600" />
              {choice.label}
            </label>
          ))}
        </div>
      </fieldset>
      {mode.value === 'dpi' ? (
        <NumberField label="Resolution" unit="dpi" help="Drop spacing = 25 400 µm ÷ dpi." error={errors.dpi} {...dpi} />
      ) : (
        <NumberField label="Drop spacing" unit="µm" error={errors.dropSpacingUm} {...spacing} />
      )}
    </>
  );
}
