import type { ReactNode } from 'react';

import { FieldMessage } from '../../../components/ui/field-message';
import { useFieldIds } from '../../../components/ui/use-field-ids';

type ChoiceFieldsetProps = { legend: string; help?: string; error?: string; children: ReactNode };

/** A group of radios or ticks with its legend, help and problem, wired together by id. */
export function ChoiceFieldset({ legend, help, error, children }: ChoiceFieldsetProps) {
  const { id, helpId, errorId, describedBy } = useFieldIds(Boolean(help), Boolean(error));
  return (
    <fieldset id={id} aria-describedby={describedBy} aria-invalid={error ? true : undefined} className="flex flex-col gap-2">
      <legend className="mb-1 font-bold text-graphite-900">{legend}</legend>
      {children}
      <FieldMessage id={errorId} helpId={helpId} help={help} error={error} />
    </fieldset>
  );
}
