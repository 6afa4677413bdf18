import { useSuspenseQuery } from '@tanstack/react-query';
import { useFormContext, useWatch } from 'react-hook-form';

import type { LotInput } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';
import { recordsQueryOptions } from '../api/get-records';
import { numberOrNull } from '../utils/form-values';
import { useFieldProps } from './use-field-props';

/**
 * Ink or substrate, then which one. Archived materials take no new lots, so only the one a lot
 * already belongs to is offered among them.
 */
export function LotMaterialFields({ currentId }: { currentId?: number }) {
  const { register, setValue, control } = useFormContext<LotInput>();
  const { errorOf } = useFieldProps<LotInput>();
  const materialType = useWatch({ control, name: 'materialType' });
  const { data: inks } = useSuspenseQuery(recordsQueryOptions('inks'));
  const { data: substrates } = useSuspenseQuery(recordsQueryOptions('substrates'));
  const choices = (materialType === 'ink' ? inks : substrates).filter((m) => !m.archived || m.id === currentId);
  const kindRegistration = register('materialType', {
    // A different kind means a different list: the old pick no longer applies.
    onChange: () => setValue('materialId', null as unknown as number),
  });

  return (
    <>
      <fieldset className="flex flex-col gap-1">
        <legend className="mb-1 font-bold">Material kind</legend>
        <div className="flex flex-wrap gap-6">
          {(['ink', 'substrate'] as const).map((kind) => (
            <label key={kind} className="flex min-h-11 cursor-pointer items-center gap-2">
              <input type="radio" value={kind} className="size-5 accent-copper-600" {...kindRegistration} />
              {kind === 'ink' ? 'Ink' : 'Substrate'}
            </label>
          ))}
        </div>
      </fieldset>
      <SelectField
        label={materialType === 'ink' ? 'Which ink' : 'Which substrate'}
        className="max-w-md"
        error={errorOf('materialId')}
        {...register('materialId', { setValueAs: numberOrNull })}
      >
        <option value="">Pick one…</option>
        {choices.map((m) => (
          <option key={m.id} value={m.id}>
            {m.name}
          </option>
        ))}
      </SelectField>
    </>
  );
}
