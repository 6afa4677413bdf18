import { zodResolver } from '@hookform/resolvers/zod';
import { FormProvider, useForm, type DefaultValues, type Path } from 'react-hook-form';
import type { z } from 'zod';

import { InkInputSchema, type Ink, type InkInput } from '@tracewright/shared';

import { FormError } from '../../../components/ui/form-error';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { FormActions } from './form-actions';
import { InkFluidFields } from './ink-fluid-fields';
import { InkIdentityFields } from './ink-identity-fields';
import { InkProcessFields } from './ink-process-fields';
import { SolventsEditor } from './solvents-editor';
import { useSaveForm } from './use-save-form';
import { formValuesOf } from '../utils/record-values';

const FIELDS = Object.keys(InkInputSchema.shape) as Path<InkFormValues>[];
const BASE_PATH = '/materials/inks';

// Numbers start empty (not 0) for a new ink: an unset value must be typed, never assumed.
type InkFormValues = z.input<typeof InkInputSchema>;
const NEW_INK: DefaultValues<InkFormValues> = { name: '', manufacturer: '', function: 'conductor', storageNotes: '', solvents: [], notes: '' };

/** New or edit: every field of the shared ink schema, checked by it here and again by the server. */
export function InkForm({ ink }: { ink?: Ink }) {
  const form = useForm<InkFormValues, unknown, InkInput>({ resolver: zodResolver(InkInputSchema), defaultValues: ink ? formValuesOf(ink) : NEW_INK });
  const { submit, isPending } = useSaveForm<'inks', InkFormValues>('inks', ink, BASE_PATH);
  const onSubmit = form.handleSubmit((input) => submit(input, form.setError, FIELDS));

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate aria-label={ink ? `Edit ${ink.name}` : 'New ink'} className="flex max-w-2xl flex-col gap-8">
        <FormError message={form.formState.errors.root?.server?.message} />
        <InkIdentityFields />
        <InkFluidFields />
        <InkProcessFields />
        <SolventsEditor />
        <TextAreaField label="Notes" help="Anything the next engineer should know about this ink." error={form.formState.errors.notes?.message} {...form.register('notes')} />
        <FormActions saveLabel={ink ? 'Save changes' : 'Save ink'} isPending={isPending} cancelPath={ink ? `${BASE_PATH}/${ink.id}` : BASE_PATH} />
      </form>
    </FormProvider>
  );
}
