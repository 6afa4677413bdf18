import { zodResolver } from '@hookform/resolvers/zod';
import { FormProvider, useForm, type DefaultValues, type Path } from 'react-hook-form';
import type { z } from 'zod';

import { SurfaceTreaterInputSchema, type SurfaceTreaterInput, type SurfaceTreaterView } from '@tracewright/shared';

import { formValuesOf } from '../utils/record-values';
import { CalibratedForm } from './calibrated-form';
import { SurfaceTreaterFields } from './surface-treater-fields';
import { useSaveForm } from './use-save-form';

type Values = z.input<typeof SurfaceTreaterInputSchema>;
const FIELDS = Object.keys(SurfaceTreaterInputSchema.shape) as Path<Values>[];
const BASE_PATH = '/equipment/surface-treaters';
const NEW: DefaultValues<Values> = { name: '', method: 'plasma', calibrationDueOn: null, notes: '' };

export function SurfaceTreaterForm({ treater }: { treater?: SurfaceTreaterView }) {
  const defaults = treater ? (({ status: _s, ...rest }) => rest)(formValuesOf(treater)) : NEW;
  const form = useForm<Values, unknown, SurfaceTreaterInput>({ resolver: zodResolver(SurfaceTreaterInputSchema), defaultValues: defaults });
  const { submit, isPending } = useSaveForm<'surfaceTreaters', Values>('surfaceTreaters', treater, BASE_PATH);
  return (
    <FormProvider {...form}>
      <CalibratedForm
        label={treater ? `Edit ${treater.name}` : 'New surface treater'}
        onSubmit={form.handleSubmit((input) => submit(input, form.setError, FIELDS))}
        saveLabel={treater ? 'Save changes' : 'Save surface treater'}
        isPending={isPending}
        cancelPath={treater ? `${BASE_PATH}/${treater.id}` : BASE_PATH}
      >
        <SurfaceTreaterFields />
      </CalibratedForm>
    </FormProvider>
  );
}
