import { useFieldArray, useFormContext } from 'react-hook-form';

import type { InkInput } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { Button } from '../../../components/ui/button';
import { FormSection } from './form-section';
import { SolventFields } from './solvent-fields';
import { useFieldProps } from './use-field-props';

const NEW_SOLVENT: NonNullable<InkInput['solvents']>[number] = { name: '', casNumber: null, hazardCodes: [], pictograms: [], signalWord: null };

/** Add and remove the ink's solvents; their cautions appear wherever the ink is used. */
export function SolventsEditor() {
  const { control } = useFormContext<InkInput>();
  const { fields, append, remove } = useFieldArray({ control, name: 'solvents' });
  const { errorOf } = useFieldProps<InkInput>();
  const listError = errorOf('solvents');
  return (
    <FormSection legend="Solvents and hazards" help="Copy these from the supplier's safety data sheet; it stays the authority on handling.">
      {fields.length === 0 ? <p className="text-graphite-700">No solvents recorded.</p> : null}
      {fields.map((item, index) => (
        <SolventFields key={item.id} index={index} onRemove={() => remove(index)} />
      ))}
      {listError ? <p className="text-sm font-bold text-oxide-700">{listError}</p> : null}
      <Button variant="secondary" className="self-start" onClick={() => append(NEW_SOLVENT, { focusName: `solvents.${fields.length}.name` })}>
        <Icon name="plus" />
        Add a solvent
      </Button>
    </FormSection>
  );
}
