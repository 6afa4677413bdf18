import type { RunAction } from './run-actions';

/** The words of each state change: its button, its confirming button, the toast after, the help. */
export const ACTION_WORDS: Record<RunAction, { button: string; confirm: string; done: (code: string) => string; help: string }> = {
  hold: { button: 'Put on hold', confirm: 'Put the run on hold', done: (c) => `Run ${c} is on hold.`, help: 'The bench sees this reason until the run resumes.' },
  resume: { button: 'Resume', confirm: 'Resume the run', done: (c) => `Run ${c} is going again.`, help: 'Say what was put right.' },
  cancel: { button: 'Cancel run', confirm: 'Cancel the run', done: (c) => `Run ${c} is cancelled.`, help: 'A cancelled run cannot be started again.' },
};
