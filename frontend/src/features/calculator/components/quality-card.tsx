import { capability, individualsChart } from '@tracewright/shared';

import { TextField } from '../../../components/ui/text-field';
import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { parseValueList } from '../utils/parse-value-list';
import { CalcCard } from './calc-card';
import { CapabilityResults } from './capability-results';
import { IndividualsResults } from './individuals-results';
import { NumberField } from './number-field';
import { PasteField } from './paste-field';
import { ResultsPanel } from './results-panel';

const INITIAL = { values: '', lsl: '', usl: '', unit: '' };

export function QualityCard() {
  const { values, bind } = useCalcFields(INITIAL);
  const chartOutcome = computeOutcome(values, (read) => individualsChart(read.parsed('values', parseValueList, [])));
  const capabilityOutcome = computeOutcome(values, (read) => {
    const readings = read.parsed('values', parseValueList, []);
    const limits = { lsl: read.optionalNumber('lsl'), usl: read.optionalNumber('usl') };
    // No limits is a choice, not a mistake: the chart still stands on its own.
    return limits.lsl === undefined && limits.usl === undefined ? null : capability(readings, limits);
  });
  const errors = { ...capabilityOutcome.fieldErrors, ...chartOutcome.fieldErrors };
  const unit = values.unit.trim() || undefined;

  return (
    <CalcCard
      isWide
      title="Control limits and capability"
      description="Readings in the order they were taken, such as line widths or trace resistances."
      source="Source: I-MR chart with d₂ = 1.128 and D₄ = 3.267 (standard table, from memory); Western Electric rules (1956) as stated by Montgomery & Runger; capability after Montgomery."
      fields={
        <>
          <PasteField label="Readings" help="One per line or separated by commas, in time order; use a point for decimals." error={errors.values} {...bind('values')} />
          <TextField label="Unit of the readings (optional)" help="Such as µm or Ω; shown beside the results." autoComplete="off" {...bind('unit')} />
          <NumberField label="Lower specification limit LSL" unit={unit} isOptional isSigned error={errors.lsl} {...bind('lsl')} />
          <NumberField label="Upper specification limit USL" unit={unit} isOptional isSigned error={errors.usl} {...bind('usl')} />
        </>
      }
      results={
        <ResultsPanel label="Quality statistics results" outcome={{ ...chartOutcome, fieldErrors: errors, formError: chartOutcome.formError ?? capabilityOutcome.formError }}>
          <IndividualsResults chart={chartOutcome.result} unit={unit} />
          <CapabilityResults capability={capabilityOutcome.result} hasLimits={values.lsl.trim() !== '' || values.usl.trim() !== ''} />
        </ResultsPanel>
      }
    />
  );
}
