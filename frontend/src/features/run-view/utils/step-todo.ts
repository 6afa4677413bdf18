import type { RecipeStep, StepRecordView } from '@tracewright/shared';

import type { BenchRun } from './bench-run';

/**
 * What the screen still asks for before "Step done": required readings (per piece when asked),
 * the nozzle check and the ink lot of a print pass, and any timer still running. A reminder
 * only: the server decides what a completed step needs.
 * @example stepTodo(printStep, record, run) // → ['Record the nozzle check', 'Confirm the ink lot']
 */
export function stepTodo(step: RecipeStep, record: StepRecordView, run: Pick<BenchRun, 'readings' | 'pieces' | 'lots' | 'timers'>): string[] {
  const todo: string[] = [];
  const current = run.readings.filter((r) => r.stepId === step.id && r.supersededById === null);
  for (const spec of step.readingSpecs.filter((s) => s.required)) {
    const mine = current.filter((r) => r.specId === spec.id);
    if (!spec.perPiece) {
      if (mine.length === 0) todo.push(`Record ${spec.name}`);
      continue;
    }
    const missing = run.pieces.filter((p) => !mine.some((r) => r.pieceId === p.id)).length;
    if (missing > 0) todo.push(`Record ${spec.name} for ${missing} more piece${missing === 1 ? '' : 's'}`);
  }
  if (step.kind === 'print-pass') {
    if (step.params.nozzleCheckRequired && !record.nozzleCheck) todo.push('Record the nozzle check');
    const inkLots = run.lots.filter((l) => l.materialType === 'ink' && l.materialId === step.params.inkId);
    if (inkLots.length > 0 && !inkLots.some((l) => record.confirmedLotIds.includes(l.lotId))) todo.push('Confirm the ink lot');
  }
  if (run.timers.some((t) => t.stepId === step.id && t.stoppedAt === null)) todo.push('Stop the timer');
  return todo;
}
