import type { ComponentProps } from 'react';

import { TextField } from '../../../components/ui/text-field';

type NumberFieldProps = Omit<ComponentProps<'input'>, 'type'> & {
  label: string;
  /** Shown in the label, so the unit is read out with the field's name. */
  unit?: string;
  isOptional?: boolean;
  /** Temperatures and coefficients can be negative: offer a keyboard with a minus key. */
  isSigned?: boolean;
  help?: string;
  error?: string;
};

/** A typed number: text, not type="number", so a decimal comma works and our own message explains a typo. */
export function NumberField({ label, unit, isOptional = false, isSigned = false, ...inputProps }: NumberFieldProps) {
  const suffix = [unit, isOptional ? 'optional' : null].filter(Boolean).join(', ');
  return (
    <TextField
      label={suffix ? `${label} (${suffix})` : label}
      type="text"
      inputMode={isSigned ? 'text' : 'decimal'}
      autoComplete="off"
      spellCheck={false}
      className="tabular"
      {...inputProps}
    />
  );
}
