import type { OutboxItem, WriteKind } from '../outbox/outbox-types';

const LABELS: Record<WriteKind, string> = {
  'acknowledge-safety': 'Cautions acknowledged',
  'start-step': 'Step started',
  'complete-step': 'Step done',
  'step-not-done': 'Step closed as not done',
  'start-timer': 'Timer started',
  'stop-timer': 'Timer stopped',
  'record-reading': 'Reading recorded',
  'correct-reading': 'Reading corrected',
  'cure-log': 'Oven log entered',
  'confirm-lot': 'Ink lot confirmed',
  'nozzle-check': 'Nozzle check recorded',
  'upload-photo': 'Photo',
  'report-problem': 'Problem reported',
  'hold-run': 'Run put on hold',
  'resume-run': 'Run resumed',
};

/** What a waiting write was, in the operator's words, with its step when it has one. */
export function writeLabel(item: Pick<OutboxItem, 'kind' | 'meta'>): string {
  const step = typeof item.meta.stepLabel === 'string' ? ` — ${item.meta.stepLabel}` : '';
  return `${LABELS[item.kind]}${step}`;
}
