import { INSTRUMENT_KINDS, type InstrumentInput } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { INSTRUMENT_KIND_LABELS } from '../utils/catalogue-labels';
import { useFieldProps } from './use-field-props';

export function InstrumentFields() {
  const field = useFieldProps<InstrumentInput>();
  return (
    <>
      <TextField label="Name" autoComplete="off" {...field.text('name')} />
      <SelectField label="Kind" className="max-w-xs" {...field.text('kind')}>
        {INSTRUMENT_KINDS.map((k) => (
          <option key={k} value={k}>
            {INSTRUMENT_KIND_LABELS[k]}
          </option>
        ))}
      </SelectField>
      <TextField label="Serial number" autoComplete="off" spellCheck={false} help="Optional. As on the calibration certificate." className="max-w-sm" {...field.text('serialNumber')} />
    </>
  );
}
