import type { ComponentProps } from 'react';

import { FieldMessage } from '../../../components/ui/field-message';
import { useFieldIds } from '../../../components/ui/use-field-ids';

type CheckboxFieldProps = Omit<ComponentProps<'input'>, 'type'> & { label: string; help?: string; error?: string };

/** A yes/no field: the box beside its label, help and problem under it like every other field. */
export function CheckboxField({ label, help, error, id: givenId, ...rest }: CheckboxFieldProps) {
  const { id, helpId, errorId, describedBy } = useFieldIds(Boolean(help), Boolean(error), givenId);
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="flex min-h-11 cursor-pointer items-center gap-3 font-bold text-graphite-900">
        <input id={id} type="checkbox" className="size-5 accent-copper-600" aria-invalid={error ? true : undefined} aria-describedby={describedBy} {...rest} />
        {label}
      </label>
      <FieldMessage id={errorId} helpId={helpId} help={help} error={error} />
    </div>
  );
}
