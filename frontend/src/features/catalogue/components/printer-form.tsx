import { zodResolver } from '@hookform/resolvers/zod';
import { FormProvider, useForm, type DefaultValues, type Path } from 'react-hook-form';
import type { z } from 'zod';

import { PrinterInputSchema, type Printer, type PrinterInput } from '@tracewright/shared';

import { FormError } from '../../../components/ui/form-error';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { formValuesOf } from '../utils/record-values';
import { ChannelsEditor } from './channels-editor';
import { FormActions } from './form-actions';
import { PrinterFields } from './printer-fields';
import { useSaveForm } from './use-save-form';

type PrinterFormValues = z.input<typeof PrinterInputSchema>;
const FIELDS = Object.keys(PrinterInputSchema.shape) as Path<PrinterFormValues>[];
const BASE_PATH = '/equipment/printers';
const NEW_PRINTER: DefaultValues<PrinterFormValues> = { name: '', model: '', channels: [{ name: '', inkId: null }], notes: '' };

export function PrinterForm({ printer }: { printer?: Printer }) {
  const form = useForm<PrinterFormValues, unknown, PrinterInput>({
    resolver: zodResolver(PrinterInputSchema),
    defaultValues: printer ? formValuesOf(printer) : NEW_PRINTER,
  });
  const { submit, isPending } = useSaveForm<'printers', PrinterFormValues>('printers', printer, BASE_PATH);
  const onSubmit = form.handleSubmit((input) => submit(input, form.setError, FIELDS));
  const { register, formState: { errors } } = form;
  const loaded = (printer?.channels ?? []).flatMap((c) => (c.inkId === null ? [] : [c.inkId]));

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate aria-label={printer ? `Edit ${printer.name}` : 'New printer'} className="flex max-w-2xl flex-col gap-8">
        <FormError message={errors.root?.server?.message} />
        <PrinterFields />
        <ChannelsEditor loadedInkIds={loaded} />
        <TextAreaField label="Notes" error={errors.notes?.message} {...register('notes')} />
        <FormActions saveLabel={printer ? 'Save changes' : 'Save printer'} isPending={isPending} cancelPath={printer ? `${BASE_PATH}/${printer.id}` : BASE_PATH} />
      </form>
    </FormProvider>
  );
}
