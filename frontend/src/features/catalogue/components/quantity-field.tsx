import type { ComponentProps } from 'react';

import { TextField } from '../../../components/ui/text-field';

type QuantityFieldProps = Omit<ComponentProps<typeof TextField>, 'label'> & { label: string; unit: string };

/**
 * A number with its unit in the label, typed as text with a decimal keypad: `type="number"` would
 * swallow a decimal comma and change the value on a stray scroll.
 */
export function QuantityField({ label, unit, ...rest }: QuantityFieldProps) {
  return <TextField label={`${label} (${unit})`} inputMode="decimal" autoComplete="off" spellCheck={false} className="max-w-md" {...rest} />;
}
