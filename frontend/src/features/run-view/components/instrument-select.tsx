import { useId } from 'react';

import { calibrationStatus, type RunDetail } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { localIsoDate } from '../utils/local-date';

type InstrumentSelectProps = { instruments: RunDetail['instruments']; value: string; onChange: (value: string) => void };

/** The meter used; one past its calibration date is named so in the list and under it. */
export function InstrumentSelect({ instruments, value, onChange }: InstrumentSelectProps) {
  const id = useId();
  const today = localIsoDate(Date.now());
  const status = (dueOn: string | null) => calibrationStatus(dueOn, today);
  const chosen = instruments.find((i) => String(i.id) === value);
  const chosenStatus = chosen ? status(chosen.calibrationDueOn) : null;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-bold">
        Instrument
      </label>
      <select id={id} value={value} onChange={(e) => onChange(e.target.value)} className="min-h-14 rounded-lg border-2 border-graphite-500 bg-white px-3 text-[1.25rem]">
        <option value="">No instrument named</option>
        {instruments.map((i) => (
          <option key={i.id} value={String(i.id)}>
            {i.name} ({i.kind}){status(i.calibrationDueOn).state === 'overdue' ? ' — past calibration' : ''}
          </option>
        ))}
      </select>
      {chosenStatus?.state === 'overdue' ? (
        <p className="flex items-start gap-2 font-bold text-oxide-700">
          <Icon name="warning" className="mt-0.5 size-5" />
          Past calibration: {chosenStatus.message} Use another meter if you can; a reading taken with this one is flagged.
        </p>
      ) : null}
    </div>
  );
}
