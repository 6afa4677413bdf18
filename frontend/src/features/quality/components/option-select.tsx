import type { ComponentProps } from 'react';

import { SelectField } from '../../../components/ui/select-field';

type OptionSelectProps = Omit<ComponentProps<typeof SelectField>, 'children'> & {
  anyLabel: string;
  options: readonly { id: number | string; label: string }[] | undefined;
  /** Set while the options could not be read; the field still works with what it holds. */
  isUnavailable?: boolean;
};

/**
 * A choice from a list fetched on the side. While the list is missing, a chosen value still shows
 * (by its id), so a bookmarked filter is never silently dropped.
 */
export function OptionSelect({ anyLabel, options, isUnavailable = false, help, ...rest }: OptionSelectProps) {
  const chosen = rest.value === undefined ? '' : String(rest.value);
  const isKnown = chosen === '' || (options ?? []).some((o) => String(o.id) === chosen);
  return (
    <SelectField help={isUnavailable ? 'The list could not be loaded; reload the page to try again.' : help} {...rest}>
      <option value="">{anyLabel}</option>
      {isKnown ? null : <option value={chosen}>Chosen: {chosen}</option>}
      {(options ?? []).map((o) => (
        <option key={o.id} value={String(o.id)}>
          {o.label}
        </option>
      ))}
    </SelectField>
  );
}
