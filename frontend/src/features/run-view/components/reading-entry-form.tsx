import { useState, type FormEvent } from 'react';

import { isResistanceUnit, type ReadingSpec } from '@tracewright/shared';

import { useBench } from '../hooks/bench-context';
import { liveEvaluation, parseDecimal } from '../utils/reading-eval';
import { writeDrafts } from '../utils/write-drafts';
import { benchButton } from './bench-button-styles';
import { DecimalInput } from './decimal-input';
import { EvaluationLine } from './evaluation-line';
import { InstrumentSelect } from './instrument-select';
import { OutOfLimitsDialog } from './out-of-limits-dialog';

type ReadingEntryFormProps = { stepId: string; spec: ReadingSpec; piece: { id: number; code: string } | null; tcrPerK: number | null; onDone: () => void };

/**
 * Entering one reading: the value, the room temperature for a resistance (the value corrected to
 * 20 °C shows as it is typed), the meter, and a confirmation before an out-of-limit value is kept.
 */
export function ReadingEntryForm({ stepId, spec, piece, tcrPerK, onDone }: ReadingEntryFormProps) {
  const { run, record } = useBench();
  const [valueText, setValueText] = useState('');
  const [ambientText, setAmbientText] = useState('');
  const [instrument, setInstrument] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [isConfirming, setIsConfirming] = useState(false);
  const needsAmbient = isResistanceUnit(spec.unit);
  const evaluation = liveEvaluation(spec, valueText, needsAmbient ? ambientText : '', tcrPerK);

  const keep = (confirmOutOfLimits: boolean) => {
    const value = parseDecimal(valueText);
    if (value === null || !evaluation) return;
    const fields = { stepId, specId: spec.id, pieceId: piece?.id ?? null, value, instrumentId: instrument ? Number(instrument) : null, ambientTempC: needsAmbient ? parseDecimal(ambientText) : null, confirmOutOfLimits };
    const meta = { unit: spec.unit, correctedValue: evaluation.correctedValue, outOfLimits: evaluation.outOfLimits, message: evaluation.message };
    void record(writeDrafts.recordReading(run.id, fields, meta)).then((item) => item && onDone());
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (parseDecimal(valueText) === null) return setError(`Enter the ${spec.name.toLowerCase()} as a number, like 12.5.`);
    if (needsAmbient && ambientText.trim() !== '' && parseDecimal(ambientText) === null) return setError('Enter the room temperature as a number, like 21.5.');
    setError(null);
    if (evaluation?.outOfLimits) return setIsConfirming(true);
    keep(false);
  };

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4 rounded-lg border-2 border-copper-600 bg-copper-50 p-4">
      <div className="flex flex-wrap gap-4">
        <DecimalInput label={piece ? `${spec.name}, piece ${piece.code}` : spec.name} unit={spec.unit} value={valueText} onChange={setValueText} error={error} autoFocus />
        {needsAmbient ? <DecimalInput label="Room temperature" unit="°C" value={ambientText} onChange={setAmbientText} /> : null}
      </div>
      <InstrumentSelect instruments={run.instruments} value={instrument} onChange={setInstrument} />
      {evaluation ? <EvaluationLine evaluation={evaluation} unit={spec.unit} /> : null}
      <div className="flex flex-wrap gap-2">
        <button type="submit" className={benchButton('primary')}>
          Record reading
        </button>
        <button type="button" className={benchButton('secondary')} onClick={onDone}>
          Cancel
        </button>
      </div>
      {isConfirming && evaluation ? (
        <OutOfLimitsDialog
          message={evaluation.message}
          onClose={() => setIsConfirming(false)}
          onConfirm={() => {
            setIsConfirming(false);
            keep(true);
          }}
        />
      ) : null}
    </form>
  );
}
