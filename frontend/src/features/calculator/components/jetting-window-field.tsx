import { type ComponentProps } from 'react';

import { DEFAULT_JETTING_WINDOW, JETTING_WINDOWS } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';

const WINDOWS = Object.values(JETTING_WINDOWS);

type JettingWindowFieldProps = Omit<ComponentProps<'select'>, 'children'> & { value: string; error?: string };

/** Which published printable window Z is judged against; the help says which length Z rests on. */
export function JettingWindowField({ value, error, ...selectProps }: JettingWindowFieldProps) {
  const chosen = WINDOWS.find((w) => w.id === value);
  return (
    <SelectField
      label="Printable window"
      value={value}
      error={error}
      help={chosen ? `Length used for Z: ${chosen.lengthConvention}` : undefined}
      {...selectProps}
    >
      {WINDOWS.map((w) => (
        <option key={w.id} value={w.id}>
          {`${w.label} (${w.source})${w.id === DEFAULT_JETTING_WINDOW ? ', the default' : ''}`}
        </option>
      ))}
    </SelectField>
  );
}
