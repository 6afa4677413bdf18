import { useFieldArray } from 'react-hook-form';

import { Button } from '../../../components/ui/button';
import { newId } from '../utils/step-id';
import type { StepFormApi } from '../utils/step-form-types';
import { ReadingSpecFields } from './reading-spec-fields';

const blankSpec = () => ({
  id: newId('reading'),
  name: '',
  unit: '',
  target: null,
  lowerLimit: null,
  upperLimit: null,
  required: true,
  perPiece: false,
  traceLengthMm: null,
  traceWidthMm: null,
});

/** The readings an operator records in this step, each with its unit and limits. */
export function ReadingSpecsEditor({ form }: { form: StepFormApi }) {
  const { fields, append, remove } = useFieldArray({ control: form.control, name: 'readingSpecs' });
  return (
    <section aria-labelledby="readings-title" className="flex flex-col gap-3">
      <h3 id="readings-title" className="text-base font-bold text-graphite-800">
        Readings
      </h3>
      {fields.length === 0 ? <p className="text-sm text-graphite-600">No readings in this step.</p> : null}
      {fields.map((field, i) => (
        <ReadingSpecFields key={field.id} form={form} index={i} onRemove={() => remove(i)} />
      ))}
      <Button variant="secondary" className="self-start" onClick={() => append(blankSpec())}>
        Add a reading
      </Button>
    </section>
  );
}
