import type { Ink, Printer, VersionSetup } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';
import { recordOptions } from '../utils/record-options';

type ChannelPlanFieldsProps = { printer: Printer | undefined; inks: readonly Ink[]; plan: VersionSetup['channelPlan']; onChange: (plan: VersionSetup['channelPlan']) => void };

/** Which ink each of the printer's channels carries for this recipe. */
export function ChannelPlanFields({ printer, inks, plan, onChange }: ChannelPlanFieldsProps) {
  if (!printer) return <p className="text-sm text-graphite-600">Pick a printer to plan its channels.</p>;
  const inkOn = (channel: string) => plan.find((c) => c.channel === channel)?.inkId ?? null;
  const setInk = (channel: string, inkId: number | null) => {
    const rest = plan.filter((c) => c.channel !== channel);
    const next = inkId === null ? rest : [...rest, { channel, inkId }];
    // Kept in the printer's channel order, so the saved plan reads the way the printer is laid out.
    const order = printer.channels.map((c) => c.name);
    onChange(next.sort((a, b) => order.indexOf(a.channel) - order.indexOf(b.channel)));
  };
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="font-bold text-graphite-900">Channel plan</legend>
      <p className="text-sm text-graphite-600">The ink each channel of {printer.name} carries for this recipe.</p>
      <div className="grid gap-3 sm:grid-cols-2">
        {printer.channels.map((channel) => {
          const current = inkOn(channel.name);
          return (
            <SelectField key={channel.name} label={`Channel ${channel.name}`} value={current ?? ''} onChange={(e) => setInk(channel.name, e.target.value === '' ? null : Number(e.target.value))}>
              <option value="">Nothing loaded</option>
              {recordOptions(inks, current).map((o) => (
                <option key={o.value} value={o.value}>
                  {o.label}
                </option>
              ))}
            </SelectField>
          );
        })}
      </div>
    </fieldset>
  );
}
