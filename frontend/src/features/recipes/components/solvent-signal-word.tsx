import { SelectField } from '../../../components/ui/select-field';
import { fieldError, type StepFormApi } from '../utils/step-form-types';

/** GHS signal word: Danger, Warning, or none. */
export function SolventSignalWord({ form }: { form: StepFormApi }) {
  return (
    <SelectField
      label="Signal word"
      error={fieldError(form, 'params.solvent.signalWord')}
      {...form.register('params.solvent.signalWord', { setValueAs: (v: unknown) => (v === '' || v === null ? null : v) })}
    >
      <option value="">None</option>
      <option value="Danger">Danger</option>
      <option value="Warning">Warning</option>
    </SelectField>
  );
}
