import type { StepDiff } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import type { IconName } from '../../../components/icons/icon-paths';

const LOOK: Record<StepDiff['status'], { word: string; icon: IconName; classes: string }> = {
  added: { word: 'Added', icon: 'plus', classes: 'text-verdigris-800' },
  removed: { word: 'Removed', icon: 'trash', classes: 'text-oxide-800' },
  moved: { word: 'Moved', icon: 'swap', classes: 'text-graphite-800' },
  changed: { word: 'Changed', icon: 'pencil', classes: 'text-amber-800' },
  unchanged: { word: 'Same', icon: 'paused', classes: 'text-graphite-600' },
};

/** How a step differs between two versions, as icon and word. */
export function DiffStatusWord({ diff }: { diff: Pick<StepDiff, 'status' | 'isMoved'> }) {
  const { word, icon, classes } = LOOK[diff.status];
  return (
    <span className={`inline-flex items-center gap-1 font-bold ${classes}`}>
      <Icon name={icon} className="size-4" />
      {word}
      {diff.status === 'changed' && diff.isMoved ? ' and moved' : ''}
    </span>
  );
}
