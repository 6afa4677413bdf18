import { useSuspenseQuery } from '@tanstack/react-query';
import { useFieldArray, useFormContext } from 'react-hook-form';

import type { PrinterInput } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { Button } from '../../../components/ui/button';
import { recordsQueryOptions } from '../api/get-records';
import { ChannelFields } from './channel-fields';
import { FormSection } from './form-section';
import { useFieldProps } from './use-field-props';

/**
 * Add, name and load the printer's channels. Archived inks are offered only where one is already
 * loaded (the server refuses loading a newly archived one).
 */
export function ChannelsEditor({ loadedInkIds }: { loadedInkIds: readonly number[] }) {
  const { control } = useFormContext<PrinterInput>();
  const { fields, append, remove } = useFieldArray({ control, name: 'channels' });
  const { errorOf } = useFieldProps<PrinterInput>();
  const { data: allInks } = useSuspenseQuery(recordsQueryOptions('inks'));
  const inks = allInks.filter((ink) => !ink.archived || loadedInkIds.includes(ink.id));
  const listError = errorOf('channels');

  return (
    <FormSection legend="Channels" help="Name each cartridge channel as the printer does, and say which ink it holds.">
      {fields.map((item, index) => (
        <ChannelFields key={item.id} index={index} inks={inks} canRemove={fields.length > 1} onRemove={() => remove(index)} />
      ))}
      {listError ? <p className="text-sm font-bold text-oxide-700">{listError}</p> : null}
      <Button
        variant="secondary"
        className="self-start"
        disabled={fields.length >= 16}
        onClick={() => append({ name: '', inkId: null }, { focusName: `channels.${fields.length}.name` })}
      >
        <Icon name="plus" />
        Add a channel
      </Button>
    </FormSection>
  );
}
