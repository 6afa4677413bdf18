import { useState, type FormEvent } from 'react';

import { ReasonSchema, type ReadingSpec } from '@tracewright/shared';

import { useBench } from '../hooks/bench-context';
import type { BenchReading } from '../utils/bench-run';
import { liveEvaluation, parseDecimal } from '../utils/reading-eval';
import { writeDrafts } from '../utils/write-drafts';
import { BenchDialog } from './bench-dialog';
import { benchButton } from './bench-button-styles';
import { DecimalInput } from './decimal-input';
import { EvaluationLine } from './evaluation-line';

type CorrectReadingDialogProps = { reading: BenchReading; spec: ReadingSpec; tcrPerK: number | null; onClose: () => void };

/** A correction with its reason; the original stays in the record, struck through. */
export function CorrectReadingDialog({ reading, spec, tcrPerK, onClose }: CorrectReadingDialogProps) {
  const { run, record } = useBench();
  const [valueText, setValueText] = useState('');
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string | null>(null);
  const ambient = reading.ambientTempC === null ? '' : String(reading.ambientTempC);
  const evaluation = liveEvaluation(spec, valueText, ambient, tcrPerK);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const value = parseDecimal(valueText);
    const why = ReasonSchema.safeParse(reason);
    if (value === null || !evaluation) return setError('Enter the right value as a number.');
    if (!why.success) return setError(why.error.issues[0]?.message ?? 'Say why the reading is corrected.');
    const target = reading.id > 0 || !reading.localRef ? reading.id : reading.localRef;
    const meta = { unit: spec.unit, correctedValue: evaluation.correctedValue, outOfLimits: evaluation.outOfLimits, message: evaluation.message };
    void record(writeDrafts.correctReading(run.id, reading.stepId, target, value, why.data, evaluation.outOfLimits, meta)).then((item) => item && onClose());
  };

  return (
    <BenchDialog title={`Correct ${spec.name}`} onClose={onClose}>
      <form onSubmit={submit} noValidate className="flex flex-col gap-4">
        <p>
          Recorded: <span className="font-bold tabular">{reading.value}</span> {spec.unit}. The original stays in the record, struck through.
        </p>
        <DecimalInput label="Right value" unit={spec.unit} value={valueText} onChange={setValueText} />
        <label className="flex flex-col gap-1 font-bold">
          Reason for the correction
          <textarea value={reason} onChange={(e) => setReason(e.target.value)} rows={2} className="min-h-20 rounded-lg border-2 border-graphite-500 p-3 font-normal" />
        </label>
        {evaluation ? <EvaluationLine evaluation={evaluation} unit={spec.unit} /> : null}
        {error ? <p className="font-bold text-oxide-700">{error}</p> : null}
        <div className="flex flex-wrap justify-end gap-2">
          <button type="button" className={benchButton('secondary')} onClick={onClose}>
            Cancel
          </button>
          <button type="submit" className={benchButton(evaluation?.outOfLimits ? 'danger' : 'primary')}>
            {evaluation?.outOfLimits ? 'Correct anyway (out of limits)' : 'Correct reading'}
          </button>
        </div>
      </form>
    </BenchDialog>
  );
}
