import { zodResolver } from '@hookform/resolvers/zod';
import { FormProvider, useForm, type DefaultValues, type Path } from 'react-hook-form';
import type { z } from 'zod';

import { InstrumentInputSchema, type InstrumentInput, type InstrumentView } from '@tracewright/shared';

import { formValuesOf } from '../utils/record-values';
import { CalibratedForm } from './calibrated-form';
import { InstrumentFields } from './instrument-fields';
import { useSaveForm } from './use-save-form';

type Values = z.input<typeof InstrumentInputSchema>;
const FIELDS = Object.keys(InstrumentInputSchema.shape) as Path<Values>[];
const BASE_PATH = '/equipment/instruments';
const NEW: DefaultValues<Values> = { name: '', kind: 'multimeter', serialNumber: '', calibrationDueOn: null, notes: '' };

export function InstrumentForm({ instrument }: { instrument?: InstrumentView }) {
  const defaults = instrument ? (({ status: _s, ...rest }) => rest)(formValuesOf(instrument)) : NEW;
  const form = useForm<Values, unknown, InstrumentInput>({ resolver: zodResolver(InstrumentInputSchema), defaultValues: defaults });
  const { submit, isPending } = useSaveForm<'instruments', Values>('instruments', instrument, BASE_PATH);
  return (
    <FormProvider {...form}>
      <CalibratedForm
        label={instrument ? `Edit ${instrument.name}` : 'New instrument'}
        onSubmit={form.handleSubmit((input) => submit(input, form.setError, FIELDS))}
        saveLabel={instrument ? 'Save changes' : 'Save instrument'}
        isPending={isPending}
        cancelPath={instrument ? `${BASE_PATH}/${instrument.id}` : BASE_PATH}
      >
        <InstrumentFields />
      </CalibratedForm>
    </FormProvider>
  );
}
