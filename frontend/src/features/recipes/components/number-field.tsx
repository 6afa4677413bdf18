import { TextField } from '../../../components/ui/text-field';
import { toNumberOrNull } from '../utils/number-input';
import { fieldError, type StepFormApi, type StepPath } from '../utils/step-form-types';

type NumberFieldProps = { form: StepFormApi; name: StepPath; label: string; unit?: string; help?: string; className?: string };

/** A quantity with its unit in the label; empty means "not given" where the schema allows it. */
export function NumberField({ form, name, label, unit, help, className }: NumberFieldProps) {
  return (
    <TextField
      label={unit ? `${label} (${unit})` : label}
      inputMode="decimal"
      autoComplete="off"
      help={help}
      error={fieldError(form, name)}
      className={className}
      {...form.register(name, { setValueAs: toNumberOrNull })}
    />
  );
}
