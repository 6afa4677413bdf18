import { BenchIcon } from './bench-icon';

export type TimerState = 'running' | 'ended' | 'stopped';

const WORDS: Record<TimerState, { word: string; icon: 'timer' | 'bell' | 'stop'; classes: string }> = {
  running: { word: 'Running', icon: 'timer', classes: 'border-copper-600 bg-copper-50 text-copper-700' },
  ended: { word: 'Time is up', icon: 'bell', classes: 'border-amber-700 bg-amber-50 text-amber-800' },
  stopped: { word: 'Stopped', icon: 'stop', classes: 'border-graphite-500 bg-graphite-50 text-graphite-700' },
};

/** A timer's state as icon + word (+ colour). */
export function TimerStatus({ state }: { state: TimerState }) {
  const { word, icon, classes } = WORDS[state];
  return (
    <span className={`inline-flex items-center gap-1.5 rounded-full border-2 px-3 py-0.5 text-base font-bold ${classes}`}>
      <BenchIcon name={icon} className="size-5" />
      {word}
    </span>
  );
}
