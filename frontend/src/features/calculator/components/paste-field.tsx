import type { ComponentProps } from 'react';

import { FieldMessage } from '../../../components/ui/field-message';
import { fieldClasses } from '../../../components/ui/field-styles';
import { useFieldIds } from '../../../components/ui/use-field-ids';

type PasteFieldProps = ComponentProps<'textarea'> & { label: string; help?: string; error?: string };

/** A box for pasted readings (from a spreadsheet or a logger export), with help and problems under it. */
export function PasteField({ label, help, error, rows = 6, ...textareaProps }: PasteFieldProps) {
  const { id, helpId, errorId, describedBy } = useFieldIds(Boolean(help), Boolean(error));
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-bold text-graphite-900">
        {label}
      </label>
      <textarea
        id={id}
        rows={rows}
        spellCheck={false}
        className={fieldClasses(Boolean(error), 'tabular')}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        {...textareaProps}
      />
      <FieldMessage id={errorId} helpId={helpId} help={help} error={error} />
    </div>
  );
}
