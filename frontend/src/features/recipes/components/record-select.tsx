import { SelectField } from '../../../components/ui/select-field';
import { toIdOrNull } from '../utils/number-input';
import type { RecordOption } from '../utils/record-options';
import { fieldError, type StepFormApi, type StepPath } from '../utils/step-form-types';

type RecordSelectProps = { form: StepFormApi; name: StepPath; label: string; options: readonly RecordOption[]; emptyLabel: string; help?: string };

/** Picks one of the lab's records by id; the empty choice is "none" (null). */
export function RecordSelect({ form, name, label, options, emptyLabel, help }: RecordSelectProps) {
  return (
    <SelectField label={label} help={help} error={fieldError(form, name)} {...form.register(name, { setValueAs: toIdOrNull })}>
      <option value="">{emptyLabel}</option>
      {options.map((o) => (
        <option key={o.value} value={o.value}>
          {o.label}
        </option>
      ))}
    </SelectField>
  );
}
