import { zodResolver } from '@hookform/resolvers/zod';
import { FormProvider, useForm, type DefaultValues, type Path } from 'react-hook-form';
import type { z } from 'zod';

import { HeatSourceInputSchema, type HeatSourceInput, type HeatSourceView } from '@tracewright/shared';

import { formValuesOf } from '../utils/record-values';
import { CalibratedForm } from './calibrated-form';
import { HeatSourceFields } from './heat-source-fields';
import { useSaveForm } from './use-save-form';

type Values = z.input<typeof HeatSourceInputSchema>;
const FIELDS = Object.keys(HeatSourceInputSchema.shape) as Path<Values>[];
const BASE_PATH = '/equipment/heat-sources';
const NEW: DefaultValues<Values> = { name: '', kind: 'oven', calibrationDueOn: null, notes: '' };

export function HeatSourceForm({ source }: { source?: HeatSourceView }) {
  const defaults = source ? (({ status: _s, ...rest }) => rest)(formValuesOf(source)) : NEW;
  const form = useForm<Values, unknown, HeatSourceInput>({ resolver: zodResolver(HeatSourceInputSchema), defaultValues: defaults });
  const { submit, isPending } = useSaveForm<'heatSources', Values>('heatSources', source, BASE_PATH);
  return (
    <FormProvider {...form}>
      <CalibratedForm
        label={source ? `Edit ${source.name}` : 'New heat source'}
        onSubmit={form.handleSubmit((input) => submit(input, form.setError, FIELDS))}
        saveLabel={source ? 'Save changes' : 'Save heat source'}
        isPending={isPending}
        cancelPath={source ? `${BASE_PATH}/${source.id}` : BASE_PATH}
      >
        <HeatSourceFields />
      </CalibratedForm>
    </FormProvider>
  );
}
