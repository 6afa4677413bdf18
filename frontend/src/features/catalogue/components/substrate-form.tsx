import { zodResolver } from '@hookform/resolvers/zod';
import { FormProvider, useForm, type DefaultValues, type Path } from 'react-hook-form';
import type { z } from 'zod';

import { SubstrateInputSchema, type Substrate, type SubstrateInput } from '@tracewright/shared';

import { FormError } from '../../../components/ui/form-error';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { formValuesOf } from '../utils/record-values';
import { FormActions } from './form-actions';
import { SubstrateHeatFields } from './substrate-heat-fields';
import { SubstrateIdentityFields } from './substrate-identity-fields';
import { SubstrateSurfaceFields } from './substrate-surface-fields';
import { useSaveForm } from './use-save-form';

type SubstrateFormValues = z.input<typeof SubstrateInputSchema>;
const FIELDS = Object.keys(SubstrateInputSchema.shape) as Path<SubstrateFormValues>[];
const BASE_PATH = '/materials/substrates';
const NEW_SUBSTRATE: DefaultValues<SubstrateFormValues> = { name: '', manufacturer: '', substrateClass: 'pet-film', isTransferCarrier: false, notes: '' };

export function SubstrateForm({ substrate }: { substrate?: Substrate }) {
  const form = useForm<SubstrateFormValues, unknown, SubstrateInput>({
    resolver: zodResolver(SubstrateInputSchema),
    defaultValues: substrate ? formValuesOf(substrate) : NEW_SUBSTRATE,
  });
  const { submit, isPending } = useSaveForm<'substrates', SubstrateFormValues>('substrates', substrate, BASE_PATH);
  const onSubmit = form.handleSubmit((input) => submit(input, form.setError, FIELDS));

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate aria-label={substrate ? `Edit ${substrate.name}` : 'New substrate'} className="flex max-w-2xl flex-col gap-8">
        <FormError message={form.formState.errors.root?.server?.message} />
        <SubstrateIdentityFields />
        <SubstrateSurfaceFields />
        <SubstrateHeatFields />
        <TextAreaField label="Notes" error={form.formState.errors.notes?.message} {...form.register('notes')} />
        <FormActions
          saveLabel={substrate ? 'Save changes' : 'Save substrate'}
          isPending={isPending}
          cancelPath={substrate ? `${BASE_PATH}/${substrate.id}` : BASE_PATH}
        />
      </form>
    </FormProvider>
  );
}
