import { TextAreaField } from '../../../components/ui/text-area-field';
import { fieldError } from '../utils/step-form-types';
import type { KindFieldsProps } from './step-fields-context';

export function InspectFields({ form }: KindFieldsProps) {
  return (
    <>
      <TextAreaField label="What to look at" help="What a good part looks like, and what sends it back." error={fieldError(form, 'params.lookFor')} {...form.register('params.lookFor')} />
      <TextAreaField label="What to measure" help="Readings themselves go under “Readings” below, with their limits." error={fieldError(form, 'params.measure')} {...form.register('params.measure')} />
    </>
  );
}
