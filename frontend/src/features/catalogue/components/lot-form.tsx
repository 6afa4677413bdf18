import { zodResolver } from '@hookform/resolvers/zod';
import { FormProvider, useForm, type DefaultValues, type Path } from 'react-hook-form';
import type { z } from 'zod';

import { LotInputSchema, type LotInput, type LotView } from '@tracewright/shared';

import { FormError } from '../../../components/ui/form-error';
import { formValuesOf } from '../utils/record-values';
import { FormActions } from './form-actions';
import { LotMaterialFields } from './lot-material-fields';
import { LotDateFields } from './lot-date-fields';
import { useSaveForm } from './use-save-form';

type LotFormValues = z.input<typeof LotInputSchema>;
const FIELDS = Object.keys(LotInputSchema.shape) as Path<LotFormValues>[];
const BASE_PATH = '/materials/lots';
const NEW_LOT: DefaultValues<LotFormValues> = { materialType: 'ink', lotNumber: '', receivedOn: '', openedOn: null, expiresOn: null, notes: '' };

function lotDefaults(lot: LotView | undefined): DefaultValues<LotFormValues> {
  if (!lot) return NEW_LOT;
  const { materialName: _name, status: _status, ...values } = formValuesOf(lot);
  return values;
}

export function LotForm({ lot }: { lot?: LotView }) {
  const form = useForm<LotFormValues, unknown, LotInput>({ resolver: zodResolver(LotInputSchema), defaultValues: lotDefaults(lot) });
  const { submit, isPending } = useSaveForm<'lots', LotFormValues>('lots', lot, BASE_PATH);
  const onSubmit = form.handleSubmit((input) => submit(input, form.setError, FIELDS));
  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate aria-label={lot ? `Edit lot ${lot.lotNumber}` : 'New lot'} className="flex max-w-xl flex-col gap-6">
        <FormError message={form.formState.errors.root?.server?.message} />
        <LotMaterialFields currentId={lot?.materialId} />
        <LotDateFields />
        <FormActions saveLabel={lot ? 'Save changes' : 'Save lot'} isPending={isPending} cancelPath={lot ? `${BASE_PATH}/${lot.id}` : BASE_PATH} />
      </form>
    </FormProvider>
  );
}
