import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { fieldError, type StepFormApi } from '../utils/step-form-types';
import { CheckboxField } from './checkbox-field';
import { NumberField } from './number-field';

type ReadingSpecFieldsProps = { form: StepFormApi; index: number; onRemove: () => void };

/** One reading: name and unit, target and limits, and for a trace its length and width. */
export function ReadingSpecFields({ form, index: i, onRemove }: ReadingSpecFieldsProps) {
  const name = (form.watch(`readingSpecs.${i}.name`) as string | undefined) || `Reading ${i + 1}`;
  const at = (field: string) => `readingSpecs.${i}.${field}` as const;
  return (
    <fieldset className="flex flex-col gap-4 rounded-md border border-graphite-300 p-4">
      <legend className="px-1 font-bold">{name}</legend>
      <div className="grid gap-4 sm:grid-cols-[2fr_1fr]">
        <TextField label="Reading name" error={fieldError(form, at('name'))} {...form.register(`readingSpecs.${i}.name`)} />
        <TextField label="Unit" help="Like Ω, °C, °." error={fieldError(form, at('unit'))} {...form.register(`readingSpecs.${i}.unit`)} />
      </div>
      <div className="grid gap-4 sm:grid-cols-3">
        <NumberField form={form} name={`readingSpecs.${i}.target`} label="Target" />
        <NumberField form={form} name={`readingSpecs.${i}.lowerLimit`} label="Lower limit" />
        <NumberField form={form} name={`readingSpecs.${i}.upperLimit`} label="Upper limit" />
      </div>
      <div className="flex flex-wrap gap-6">
        <CheckboxField label="Required" {...form.register(`readingSpecs.${i}.required`)} />
        <CheckboxField label="For each piece" help="Otherwise once for the run." {...form.register(`readingSpecs.${i}.perPiece`)} />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField form={form} name={`readingSpecs.${i}.traceLengthMm`} label="Trace length" unit="mm" help="For a resistance reading: the expected value is worked out." />
        <NumberField form={form} name={`readingSpecs.${i}.traceWidthMm`} label="Trace width" unit="mm" />
      </div>
      <Button variant="secondary" className="self-start" onClick={onRemove}>
        Remove {name}
      </Button>
    </fieldset>
  );
}
