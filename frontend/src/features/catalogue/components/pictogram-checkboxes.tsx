import { useFormContext } from 'react-hook-form';

import { GHS_PICTOGRAMS, PICTOGRAM_NAMES, type InkInput } from '@tracewright/shared';

/** The nine GHS pictogram codes as checkboxes; the form keeps the ticked codes as a list. */
export function PictogramCheckboxes({ index, error }: { index: number; error?: string }) {
  const { register } = useFormContext<InkInput>();
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 font-bold text-graphite-900">Pictograms</legend>
      <div className="grid gap-x-6 sm:grid-cols-2">
        {GHS_PICTOGRAMS.map((code) => (
          <label key={code} className="flex min-h-11 cursor-pointer items-center gap-3">
            <input type="checkbox" value={code} className="size-5 shrink-0 accent-copper-600" {...register(`solvents.${index}.pictograms`)} />
            <span>
              <span className="font-bold">{code}</span> {PICTOGRAM_NAMES[code]}
            </span>
          </label>
        ))}
      </div>
      {error ? <p className="text-sm font-bold text-oxide-700">{error}</p> : null}
    </fieldset>
  );
}
