import { useFormContext } from 'react-hook-form';

import { TextField } from '../../../components/ui/text-field';
import type { PlanFormValues } from '../utils/plan-form-values';

export function PlanBasicsFields() {
  const {
    register,
    formState: { errors },
  } = useFormContext<PlanFormValues>();
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-2 text-xl font-bold">What to make</legend>
      <TextField
        label="Quantity (pieces)"
        inputMode="numeric"
        help="Each piece gets its own code on the traveller and its own label. 1 to 500."
        error={errors.quantity?.message}
        {...register('quantity')}
      />
      <TextField label="Due date" type="date" help="Optional." error={errors.dueOn?.message} {...register('dueOn')} />
    </fieldset>
  );
}
