import type { ComponentProps } from 'react';

import { FieldMessage } from './field-message';
import { fieldClasses } from './field-styles';
import { useFieldIds } from './use-field-ids';

type SelectFieldProps = ComponentProps<'select'> & { label: string; help?: string; error?: string; hideLabel?: boolean };

export function SelectField({ label, help, error, hideLabel = false, id: givenId, className = '', children, ...selectProps }: SelectFieldProps) {
  const { id, helpId, errorId, describedBy } = useFieldIds(Boolean(help), Boolean(error), givenId);
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className={hideLabel ? 'sr-only' : 'font-bold text-graphite-900'}>
        {label}
      </label>
      <select
        id={id}
        className={fieldClasses(Boolean(error), 'pr-2')}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        {...selectProps}
      >
        {children}
      </select>
      <FieldMessage id={errorId} helpId={helpId} help={help} error={error} />
    </div>
  );
}
