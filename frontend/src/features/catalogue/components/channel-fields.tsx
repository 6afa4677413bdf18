import type { Ink, PrinterInput } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { useFieldProps } from './use-field-props';

type ChannelFieldsProps = { index: number; inks: readonly Ink[]; canRemove: boolean; onRemove: () => void };

/** One cartridge channel: its name and the ink loaded in it, or none. */
export function ChannelFields({ index, inks, canRemove, onRemove }: ChannelFieldsProps) {
  const field = useFieldProps<PrinterInput>();
  const n = index + 1;
  return (
    <fieldset className="flex flex-wrap items-start gap-4 rounded-md border border-graphite-300 bg-graphite-50 p-4">
      <legend className="px-1 font-bold">Channel {n}</legend>
      <TextField label={`Name of channel ${n}`} autoComplete="off" className="w-40" {...field.text(`channels.${index}.name`)} />
      <SelectField label={`Ink in channel ${n}`} className="w-56" {...field.number(`channels.${index}.inkId`)}>
        <option value="">Empty</option>
        {inks.map((ink) => (
          <option key={ink.id} value={ink.id}>
            {ink.archived ? `${ink.name} (archived)` : ink.name}
          </option>
        ))}
      </SelectField>
      {canRemove ? (
        <Button variant="secondary" className="mt-8" onClick={onRemove}>
          <Icon name="trash" />
          Remove channel {n}
        </Button>
      ) : null}
    </fieldset>
  );
}
