import { useState } from 'react';
import { useController, useFormContext } from 'react-hook-form';

import type { InkInput } from '@tracewright/shared';

import { TextField } from '../../../components/ui/text-field';
import { splitCodes } from '../utils/form-values';

type HazardCodesFieldProps = { index: number; error?: string };

/**
 * Codes typed as one line ("H225, H319"); the form keeps them as the list the schema checks.
 * The text stays as typed, so a trailing comma is not swallowed mid-entry.
 */
export function HazardCodesField({ index, error }: HazardCodesFieldProps) {
  const { control } = useFormContext<InkInput>();
  const { field } = useController({ control, name: `solvents.${index}.hazardCodes` });
  const [text, setText] = useState(() => (field.value ?? []).join(', '));
  return (
    <TextField
      label="Hazard codes"
      autoComplete="off"
      spellCheck={false}
      help="From section 2 of the safety data sheet, separated by commas, e.g. H225, H319."
      error={error}
      name={field.name}
      ref={field.ref}
      value={text}
      onBlur={field.onBlur}
      onChange={(e) => {
        setText(e.target.value);
        field.onChange(splitCodes(e.target.value));
      }}
    />
  );
}
