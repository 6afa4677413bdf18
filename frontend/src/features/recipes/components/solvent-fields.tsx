import { TextField } from '../../../components/ui/text-field';
import { fieldError } from '../utils/step-form-types';
import { CodeListInput } from './code-list-input';
import { SolventSignalWord } from './solvent-signal-word';
import type { KindFieldsProps } from './step-fields-context';

const EMPTY_SOLVENT = { name: '', casNumber: null, hazardCodes: [], pictograms: [], signalWord: null };

/** The wipe's solvent with its GHS codes, so the step carries the right cautions. */
export function SolventFields({ form }: KindFieldsProps) {
  const solvent = form.watch('params.solvent');
  if (!solvent) {
    return (
      <button type="button" className="self-start font-bold text-copper-700 underline underline-offset-4" onClick={() => form.setValue('params.solvent', EMPTY_SOLVENT, { shouldDirty: true })}>
        Name the solvent
      </button>
    );
  }
  return (
    <fieldset className="flex flex-col gap-4 rounded-md border border-graphite-300 p-4">
      <legend className="px-1 font-bold">Solvent</legend>
      <TextField label="Solvent name" error={fieldError(form, 'params.solvent.name')} {...form.register('params.solvent.name')} />
      <TextField
        label="CAS number"
        help="Like 67-63-0. Leave empty if unknown."
        error={fieldError(form, 'params.solvent.casNumber')}
        {...form.register('params.solvent.casNumber', { setValueAs: (v: unknown) => (typeof v === 'string' && v.trim() !== '' ? v.trim() : null) })}
      />
      <CodeListInput form={form} name="params.solvent.hazardCodes" label="Hazard codes" help="From the safety data sheet, like H225, H319." />
      <CodeListInput form={form} name="params.solvent.pictograms" label="Pictogram codes" help="GHS01 to GHS09, like GHS02, GHS07." />
      <SolventSignalWord form={form} />
      <button type="button" className="self-start font-bold text-copper-700 underline underline-offset-4" onClick={() => form.setValue('params.solvent', null, { shouldDirty: true })}>
        No solvent
      </button>
    </fieldset>
  );
}
