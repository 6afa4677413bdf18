import type { UseFormRegisterReturn } from 'react-hook-form';

import { DISPOSITION_LABELS, type DeviationDetail } from '@tracewright/shared';

import { ChoiceBox } from './choice-box';
import { ChoiceFieldset } from './choice-fieldset';

type PiecePickerProps = { deviation: DeviationDetail; registration: UseFormRegisterReturn; error?: string };

/** The pieces this decision covers; pieces already decided say so beside their code. */
export function PiecePicker({ deviation, registration, error }: PiecePickerProps) {
  if (deviation.pieces.length === 0) return null;
  const decided = new Map(deviation.dispositions.flatMap((d) => d.pieceIds.map((id) => [id, DISPOSITION_LABELS[d.disposition]] as const)));
  return (
    <ChoiceFieldset legend="Pieces" help="Tick the pieces this decision covers. None ticked means every piece the deviation names." error={error}>
      <div className="grid gap-x-6 sm:grid-cols-2 lg:grid-cols-3">
        {deviation.pieces.map((piece) => (
          <ChoiceBox key={piece.id} type="checkbox" value={String(piece.id)} {...registration}>
            <span className="tabular">{piece.code}</span>
            {decided.has(piece.id) ? <span className="text-graphite-700"> (already: {decided.get(piece.id)})</span> : null}
          </ChoiceBox>
        ))}
      </div>
    </ChoiceFieldset>
  );
}
