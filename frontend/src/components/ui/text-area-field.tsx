import type { ComponentProps } from 'react';

import { FieldMessage } from './field-message';
import { fieldClasses } from './field-styles';
import { useFieldIds } from './use-field-ids';

type TextAreaFieldProps = ComponentProps<'textarea'> & { label: string; help?: string; error?: string };

/** A multi-line field laid out like TextField: label above, help and problem under; className sizes the whole field. */
export function TextAreaField({ label, help, error, id: givenId, rows = 3, className = '', ...rest }: TextAreaFieldProps) {
  const { id, helpId, errorId, describedBy } = useFieldIds(Boolean(help), Boolean(error), givenId);
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="font-bold text-graphite-900">
        {label}
      </label>
      <textarea id={id} rows={rows} className={fieldClasses(Boolean(error))} aria-invalid={error ? true : undefined} aria-describedby={describedBy} {...rest} />
      <FieldMessage id={errorId} helpId={helpId} help={help} error={error} />
    </div>
  );
}
