import { useFormContext, useWatch } from 'react-hook-form';

import type { InkInput } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { HazardCodesField } from './hazard-codes-field';
import { PictogramCheckboxes } from './pictogram-checkboxes';
import { useFieldProps } from './use-field-props';

type SolventFieldsProps = { index: number; onRemove: () => void };

/** One solvent of the ink: its name, CAS number and the hazard data from its safety data sheet. */
export function SolventFields({ index, onRemove }: SolventFieldsProps) {
  const field = useFieldProps<InkInput>();
  const { control } = useFormContext<InkInput>();
  const name = useWatch({ control, name: `solvents.${index}.name` });
  const title = `Solvent ${index + 1}`;
  return (
    <fieldset className="flex flex-col gap-4 rounded-md border border-graphite-300 bg-graphite-50 p-4">
      <legend className="px-1 font-bold">{name ? `${title}: ${name}` : title}</legend>
      <TextField label="Solvent name" autoComplete="off" {...field.text(`solvents.${index}.name`)} />
      <TextField label="CAS number" autoComplete="off" spellCheck={false} help="Optional, e.g. 64-17-5." className="max-w-xs" {...field.optionalText(`solvents.${index}.casNumber`)} />
      <HazardCodesField index={index} error={field.errorOf(`solvents.${index}.hazardCodes`)} />
      <PictogramCheckboxes index={index} error={field.errorOf(`solvents.${index}.pictograms`)} />
      <SelectField label="Signal word" className="max-w-xs" {...field.optionalText(`solvents.${index}.signalWord`)}>
        <option value="">None</option>
        <option value="Danger">Danger</option>
        <option value="Warning">Warning</option>
      </SelectField>
      <Button variant="secondary" className="self-start" onClick={onRemove}>
        <Icon name="trash" />
        Remove {name ? name : title.toLowerCase()}
      </Button>
    </fieldset>
  );
}
