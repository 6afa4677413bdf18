import { runProgress, type StepRecordView } from '@tracewright/shared';

import type { BenchRun } from './bench-run';

export type NextAction =
  | { kind: 'start'; blockedBy: string | null }
  | { kind: 'complete' }
  | { kind: 'next-step'; stepId: string; number: number }
  | { kind: 'resume' }
  | { kind: 'finished' }
  | { kind: 'closed'; why: string };

const CLOSED_WORDS = { completed: 'This run is complete.', closed: 'This run is closed.', cancelled: 'This run was cancelled.' } as const;

/**
 * The one large button of the action bar for the step on screen: start it (once its cautions
 * are acknowledged), mark it done, or go on to the next open step (found by the shared run rule).
 */
export function nextAction(run: BenchRun, record: StepRecordView, hasCautions: boolean): NextAction {
  if (run.state === 'completed' || run.state === 'closed' || run.state === 'cancelled') return { kind: 'closed', why: CLOSED_WORDS[run.state] };
  if (run.state === 'on-hold') return { kind: 'resume' };
  if (record.state === 'pending') {
    return { kind: 'start', blockedBy: hasCautions && !record.safetyAcknowledgedAt ? 'Acknowledge the cautions above first.' : null };
  }
  if (record.state === 'in-progress') return { kind: 'complete' };
  const { currentStepId } = runProgress(run.content.steps, run.steps);
  if (currentStepId === null) return { kind: 'finished' };
  return { kind: 'next-step', stepId: currentStepId, number: run.content.steps.findIndex((s) => s.id === currentStepId) + 1 };
}
