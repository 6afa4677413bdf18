import type { VersionSetup } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';
import { TextAreaField } from '../../../components/ui/text-area-field';
import type { ProcessRecords } from '../api/get-process-records';
import type { SetupChange } from '../utils/draft-reducer';
import { describeHeatSource, recordOptions } from '../utils/record-options';
import { TREATMENT_METHOD_LABELS } from '../utils/step-labels';
import { ChannelPlanFields } from './channel-plan-fields';
import { RecordChecklist } from './record-checklist';

type SetupPanelProps = { setup: VersionSetup; records: ProcessRecords; isEditable: boolean; onChange: (change: SetupChange) => void };

const idOrNull = (value: string) => (value === '' ? null : Number(value));

/** What the version was proven with: materials, printer and its channels, heat and treatment. */
export function SetupPanel({ setup, records, isEditable, onChange }: SetupPanelProps) {
  const printer = records.printers.find((p) => p.id === setup.printerId);
  const substrateOptions = (current: number | null) => recordOptions(records.substrates, current);
  const onPrinter = (printerId: number | null) => {
    const picked = records.printers.find((p) => p.id === printerId);
    // A new printer starts from the inks it has loaded now; the plan is the engineer's to change.
    const loaded = picked?.channels.filter((c) => c.inkId !== null).map((c) => ({ channel: c.name, inkId: c.inkId as number })) ?? [];
    onChange({ printerId, channelPlan: loaded });
  };

  return (
    <fieldset disabled={!isEditable} className="grid min-w-0 gap-6 lg:grid-cols-2">
      <legend className="sr-only">Setup</legend>
      <div className="flex flex-col gap-4">
        <SelectField label="Print substrate" value={setup.substrateId ?? ''} onChange={(e) => onChange({ substrateId: idOrNull(e.target.value) })}>
          <option value="">Pick the substrate printed on</option>
          {substrateOptions(setup.substrateId).map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Receiving material"
          help="For transfers: what the print ends up on after the press."
          value={setup.receivingSubstrateId ?? ''}
          onChange={(e) => onChange({ receivingSubstrateId: idOrNull(e.target.value) })}
        >
          <option value="">None (no transfer)</option>
          {substrateOptions(setup.receivingSubstrateId).map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </SelectField>
        <SelectField label="Printer" value={setup.printerId ?? ''} onChange={(e) => onPrinter(idOrNull(e.target.value))}>
          <option value="">Pick the printer</option>
          {recordOptions(records.printers, setup.printerId).map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </SelectField>
        <ChannelPlanFields printer={printer} inks={records.inks} plan={setup.channelPlan} onChange={(channelPlan) => onChange({ channelPlan })} />
      </div>
      <div className="flex flex-col gap-4">
        <RecordChecklist
          legend="Heat sources"
          help="The ovens, hot plates and presses this version was proven with."
          empty="No heat sources on record."
          items={recordOptions(records.heatSources, setup.heatSourceIds, describeHeatSource).map((o) => ({ id: o.value, label: o.label }))}
          chosen={setup.heatSourceIds}
          onChange={(heatSourceIds) => onChange({ heatSourceIds })}
        />
        <RecordChecklist
          legend="Surface treaters"
          help="The treaters this version was proven with."
          empty="No surface treaters on record."
          items={recordOptions(records.surfaceTreaters, setup.treaterIds, (t) => `${t.name} (${TREATMENT_METHOD_LABELS[t.method]})`).map((o) => ({ id: o.value, label: o.label }))}
          chosen={setup.treaterIds}
          onChange={(treaterIds) => onChange({ treaterIds })}
        />
        <TextAreaField label="What changed in this version" help="For quality and the history: what is new and why." value={setup.changeNote} onChange={(e) => onChange({ changeNote: e.target.value })} />
      </div>
    </fieldset>
  );
}
