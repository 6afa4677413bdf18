import { useId } from 'react';

/** Ids for a field, its help and its error, plus the `aria-describedby` that joins whichever exist. */
export function useFieldIds(hasHelp: boolean, hasError: boolean, givenId?: string) {
  const generated = useId();
  const id = givenId ?? generated;
  const helpId = `${id}-help`;
  const errorId = `${id}-error`;
  const describedBy = [hasHelp ? helpId : null, hasError ? errorId : null].filter(Boolean).join(' ') || undefined;
  return { id, helpId, errorId, describedBy };
}
