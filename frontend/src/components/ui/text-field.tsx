import type { ComponentProps } from 'react';

import { FieldMessage } from './field-message';
import { fieldClasses } from './field-styles';
import { useFieldIds } from './use-field-ids';

type TextFieldProps = ComponentProps<'input'> & { label: string; help?: string; error?: string };

/** Label above, field, help and error under: one column, as every form here is laid out. */
export function TextField({ label, help, error, id: givenId, className = '', ...inputProps }: TextFieldProps) {
  const { id, helpId, errorId, describedBy } = useFieldIds(Boolean(help), Boolean(error), givenId);
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="font-bold text-graphite-900">
        {label}
      </label>
      <input
        id={id}
        className={fieldClasses(Boolean(error))}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        {...inputProps}
      />
      <FieldMessage id={errorId} helpId={helpId} help={help} error={error} />
    </div>
  );
}
