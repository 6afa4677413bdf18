import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState } from 'react';
import { FormProvider, useForm, type FieldPath } from 'react-hook-form';
import { Link, useNavigate } from 'react-router';

import type { PlanRunInput, ProcessCheck } from '@tracewright/shared';
import type { RecipeVersionView } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { buttonClasses } from '../../../components/ui/button-styles';
import { FormError } from '../../../components/ui/form-error';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { useToast } from '../../../components/ui/use-toast';
import { usePlanRun } from '../api/plan-run';
import { placePlanError } from '../utils/plan-api-errors';
import { planFormSchema } from '../utils/plan-form-schema';
import { planChoices, planDefaults, type PlanFormValues } from '../utils/plan-form-values';
import { planIssues, type PlanClock, type PlanSources } from '../utils/plan-issues';
import { BlockingChecksList } from './blocking-checks-list';
import { InstrumentChoices } from './instrument-choices';
import { PlanBasicsFields } from './plan-basics-fields';
import { PlanLotsFieldset } from './plan-lots-fieldset';
import { PlanMachinesFieldset } from './plan-machines-fieldset';

type PlanRunFormProps = { version: RecipeVersionView; sources: PlanSources; clock: PlanClock };

export function PlanRunForm({ version, sources, clock }: PlanRunFormProps) {
  const navigate = useNavigate();
  const toast = useToast();
  const plan = usePlanRun();
  const [checks, setChecks] = useState<ProcessCheck[]>([]);
  const [askedReasons, setAskedReasons] = useState<ReadonlySet<string>>(new Set());
  const schema = useMemo(() => planFormSchema((values) => planIssues(values, sources, clock)), [sources, clock]);
  const form = useForm({
    resolver: zodResolver(schema),
    defaultValues: planDefaults(version.content, sources.instruments.map((i) => i.id)),
  });
  const { register, handleSubmit, setError, watch, formState } = form;
  const values = watch() as PlanFormValues;
  const issues = planIssues(values, sources, clock);

  const onSubmit = handleSubmit((output) => {
    const { lots, equipment, paths } = planChoices(output);
    const input: PlanRunInput = { versionId: version.id, quantity: output.quantity, dueOn: output.dueOn || null, lots, equipment, notes: output.notes };
    setChecks([]);
    plan.mutate(input, {
      onSuccess: (run) => {
        toast.show(`Run ${run.code} is planned. Print its traveller for the bench.`);
        void navigate(`/runs/${run.id}/traveller`);
      },
      onError: (error) => {
        const placed = placePlanError(error, { input, paths });
        const reasonPaths = placed.fields.map((f) => f.path).filter((path) => path.endsWith('.reason'));
        setAskedReasons((asked) => new Set([...asked, ...reasonPaths]));
        for (const field of placed.fields) setError(field.path as FieldPath<PlanFormValues>, { type: 'server', message: field.message });
        if (placed.root) setError('root.server', { type: 'server', message: placed.root });
        setChecks(placed.checks);
      },
    });
  });

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate aria-label={`Plan a run of ${version.recipe.code}`} className="flex flex-col gap-8">
        <p className="text-graphite-700">
          <span className="font-bold">{version.recipe.code}</span> {version.recipe.name}, version {version.number}: {version.content.steps.length} steps.
        </p>
        <FormError message={formState.errors.root?.server?.message} />
        <BlockingChecksList checks={checks} />
        <PlanBasicsFields />
        <PlanLotsFieldset slots={values.lots} sources={sources} issues={issues.lots} askedReasons={askedReasons} />
        <PlanMachinesFieldset slots={values.machines} sources={sources} issues={issues.machines} askedReasons={askedReasons} />
        <InstrumentChoices instruments={sources.instruments} issues={issues.instruments} askedReasons={askedReasons} />
        <TextAreaField label="Notes for the bench" help="Printed on the traveller. Optional." error={formState.errors.notes?.message} {...register('notes')} />
        <div className="flex flex-wrap gap-3">
          <Button type="submit" isPending={plan.isPending} pendingLabel="Planning…">
            Plan the run
          </Button>
          <Link to="/runs" className={buttonClasses('secondary')}>
            Cancel
          </Link>
        </div>
      </form>
    </FormProvider>
  );
}
