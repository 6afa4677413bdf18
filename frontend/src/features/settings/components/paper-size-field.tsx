import { useId } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';

import { PAPER_SIZES } from '@tracewright/shared';

import { FieldMessage } from '../../../components/ui/field-message';

const HELP: Record<(typeof PAPER_SIZES)[number], string> = {
  A4: '210 × 297 mm',
  Letter: '216 × 279 mm (8.5 × 11 in)',
};

type PaperSizeFieldProps = { registration: UseFormRegisterReturn; error?: string };

export function PaperSizeField({ registration, error }: PaperSizeFieldProps) {
  const id = useId();
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={`${id}-help${error ? ` ${id}-error` : ''}`}>
      <legend className="mb-1 font-bold">Paper size</legend>
      {PAPER_SIZES.map((size) => (
        <label key={size} className="flex min-h-11 items-center gap-3">
          <input type="radio" value={size} className="size-5 accent-copper-600" {...registration} />
          <span>
            <span className="font-bold">{size}</span> <span className="text-graphite-600">{HELP[size]}</span>
          </span>
        </label>
      ))}
      <FieldMessage id={`${id}-error`} helpId={`${id}-help`} help="Used for travellers and run records." error={error} />
    </fieldset>
  );
}
