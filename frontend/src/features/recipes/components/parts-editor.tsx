import { useFieldArray } from 'react-hook-form';

import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { toNumberOrNull } from '../utils/number-input';
import { fieldError, type StepFormApi } from '../utils/step-form-types';

/** The parts placed in this step: what, how many, where. */
export function PartsEditor({ form }: { form: StepFormApi }) {
  const { fields, append, remove } = useFieldArray({ control: form.control, name: 'params.parts' });
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="font-bold">Parts</legend>
      {fields.length === 0 ? <p className="text-sm text-graphite-600">No parts listed yet.</p> : null}
      <ol className="flex flex-col gap-3">
        {fields.map((field, i) => (
          <li key={field.id} className="grid gap-3 rounded-md border border-graphite-300 p-3 sm:grid-cols-[2fr_1fr]">
            <TextField label={`Part ${i + 1}`} error={fieldError(form, `params.parts.${i}.name`)} {...form.register(`params.parts.${i}.name`)} />
            <TextField label={`Quantity of part ${i + 1}`} inputMode="numeric" error={fieldError(form, `params.parts.${i}.quantity`)} {...form.register(`params.parts.${i}.quantity`, { setValueAs: toNumberOrNull })} />
            <TextField label={`Placement of part ${i + 1}`} className="sm:col-span-2" error={fieldError(form, `params.parts.${i}.placement`)} {...form.register(`params.parts.${i}.placement`)} />
            <Button variant="secondary" className="justify-self-start" onClick={() => remove(i)}>
              Remove part {i + 1}
            </Button>
          </li>
        ))}
      </ol>
      <Button variant="secondary" className="self-start" onClick={() => append({ name: '', quantity: 1, placement: '' })}>
        Add a part
      </Button>
    </fieldset>
  );
}
