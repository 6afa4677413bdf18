import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';

import { FreezeLimitsInputSchema, type Trend } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { FormError } from '../../../components/ui/form-error';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { useToast } from '../../../components/ui/use-toast';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useFreezeLimits } from '../api/freeze-limits';
import { ChoiceBox } from './choice-box';
import { ChoiceFieldset } from './choice-fieldset';
import { DetailSection } from './detail-section';

// Ticks hold text; the request takes the shared FreezeLimitsInput (run ids as numbers).
const FreezeFormSchema = z.object({
  baselineRunIds: z.array(z.string()).min(1, 'Pick at least one run for the baseline.'),
  reason: FreezeLimitsInputSchema.shape.reason,
});

/** Fix the limits to a stable stretch of runs, so later runs are judged against it. */
export function FreezeLimitsForm({ trend }: { trend: Trend }) {
  const freeze = useFreezeLimits();
  const toast = useToast();
  const runs = [...new Map(trend.points.map((p) => [p.runId, p.runCode])).entries()];
  const { register, handleSubmit, setError, reset, formState } = useForm({
    resolver: zodResolver(FreezeFormSchema),
    defaultValues: { baselineRunIds: (trend.frozen?.baselineRunIds ?? []).map(String), reason: '' },
  });
  const { errors } = formState;

  const onSubmit = handleSubmit(({ baselineRunIds, reason }) =>
    freeze.mutate(
      { recipeId: trend.recipe.id, specId: trend.spec.id, baselineRunIds: baselineRunIds.map(Number), reason },
      {
        onSuccess: () => {
          reset({ baselineRunIds, reason: '' });
          toast.show(`Limits frozen from ${baselineRunIds.length} run(s).`);
        },
        onError: (error) => applyApiErrorToForm(error, setError, ['baselineRunIds', 'reason']),
      },
    ),
  );

  return (
    <DetailSection title="Freeze limits" className="print:hidden">
      <form noValidate onSubmit={onSubmit} className="flex max-w-2xl flex-col gap-4 rounded-md border-2 border-graphite-300 bg-white p-4">
        <FormError message={errors.root?.server?.message} />
        <ChoiceFieldset legend="Baseline runs" help="Runs from a stretch when the process ran as it should." error={errors.baselineRunIds?.message}>
          <div className="grid gap-x-6 sm:grid-cols-2 lg:grid-cols-3">
            {runs.map(([id, code]) => (
              <ChoiceBox key={id} type="checkbox" value={String(id)} {...register('baselineRunIds')}>
                <span className="tabular">{code}</span>
              </ChoiceBox>
            ))}
          </div>
        </ChoiceFieldset>
        <TextAreaField label="Reason for freezing" rows={2} error={errors.reason?.message} {...register('reason')} />
        <div>
          <Button type="submit" isPending={freeze.isPending} pendingLabel="Freezing…">
            Freeze limits
          </Button>
        </div>
      </form>
    </DetailSection>
  );
}
