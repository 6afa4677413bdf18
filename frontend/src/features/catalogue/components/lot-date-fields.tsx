import type { LotInput } from '@tracewright/shared';

import { TextAreaField } from '../../../components/ui/text-area-field';
import { TextField } from '../../../components/ui/text-field';
import { useFieldProps } from './use-field-props';

/** Lot number and its dates; an empty optional date is sent as null, meaning "not yet" or "none". */
export function LotDateFields() {
  const field = useFieldProps<LotInput>();
  return (
    <>
      <TextField label="Lot number" autoComplete="off" spellCheck={false} help="As printed on the label." className="max-w-sm" {...field.text('lotNumber')} />
      <TextField label="Received" type="date" className="max-w-xs" {...field.text('receivedOn')} />
      <TextField label="Opened" type="date" help="Optional. Leave empty while it is sealed." className="max-w-xs" {...field.optionalText('openedOn')} />
      <TextField label="Expires" type="date" help="Optional. From the label or certificate." className="max-w-xs" {...field.optionalText('expiresOn')} />
      <TextAreaField label="Notes" {...field.text('notes')} />
    </>
  );
}
