import { useId, useState } from 'react';

import { cureLogDose, type Ink } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { formatDateTime } from '../../../lib/format-date';
import { useBench } from '../hooks/bench-context';
import { useOutboxState } from '../hooks/outbox-context';
import { parseCureLog } from '../utils/cure-log-text';
import { writeDrafts } from '../utils/write-drafts';
import { benchButton } from './bench-button-styles';

type CureLogPanelProps = { stepId: string; inks: Ink[]; canRecord: boolean };

/** The oven log typed line by line, with the cure dose each ink gets from it (shared rule), before it is kept. */
export function CureLogPanel({ stepId, inks, canRecord }: CureLogPanelProps) {
  const { run, record, isWorkable } = useBench();
  const { items } = useOutboxState();
  const [text, setText] = useState('');
  const id = useId();
  const { samples, problems } = parseCureLog(text);
  const kept = items.filter((i) => i.kind === 'cure-log' && i.stepId === stepId && i.runId === run.id);

  const keep = () => {
    if (samples.length < 2 || problems.length > 0) return;
    void record(writeDrafts.cureLog(run.id, stepId, samples)).then((item) => item && setText(''));
  };

  return (
    <section aria-labelledby={id} className="flex flex-col gap-3 rounded-xl border-2 border-graphite-300 bg-white p-4">
      <h2 id={id} className="text-[1.5rem] font-bold">
        Oven log
      </h2>
      <label htmlFor={`${id}-log`} className="font-bold">
        One line per reading: minute, °C
      </label>
      <textarea id={`${id}-log`} value={text} onChange={(e) => setText(e.target.value)} rows={5} placeholder={'0, 25\n5, 120\n10, 150'} className="rounded-lg border-2 border-graphite-500 p-3 font-mono text-[1.25rem]" />
      {problems.map((p) => (
        <p key={p} className="flex items-start gap-2 font-bold text-oxide-700">
          <Icon name="warning" className="mt-0.5 size-5" />
          {p}
        </p>
      ))}
      {samples.length >= 2 && problems.length === 0 ? (
        <ul role="status" className="flex flex-col gap-2">
          {inks.map((ink) => {
            const dose = cureLogDose(samples, ink);
            const tone = !dose.canJudge ? 'text-graphite-700' : dose.isShort ? 'text-oxide-700' : 'text-verdigris-800';
            return (
              <li key={ink.id} className={`flex flex-col ${tone}`}>
                <span className="flex items-center gap-2 font-bold">
                  <Icon name={!dose.canJudge ? 'info' : dose.isShort ? 'warning' : 'check'} className="size-5" />
                  {ink.name}: {dose.percent === null ? 'can’t judge' : `${Math.round(dose.percent)} % of its reference cure`}
                </span>
                <span className="text-base text-graphite-900">{dose.message}</span>
              </li>
            );
          })}
        </ul>
      ) : null}
      {isWorkable && canRecord ? (
        <button type="button" className={benchButton('secondary', 'self-start')} disabled={samples.length < 2 || problems.length > 0} onClick={keep}>
          Keep oven log
        </button>
      ) : null}
      {kept.length > 0 ? <p className="text-graphite-700">Oven log kept at {kept.map((k) => formatDateTime(k.createdAt)).join(', ')}{kept.some((k) => k.status !== 'sent') ? ' (waiting to send)' : ''}.</p> : null}
    </section>
  );
}
