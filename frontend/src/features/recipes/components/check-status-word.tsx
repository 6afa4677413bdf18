import type { CheckStatus } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import type { IconName } from '../../../components/icons/icon-paths';

const LOOK: Record<CheckStatus, { word: string; icon: IconName; classes: string }> = {
  pass: { word: 'Pass', icon: 'check', classes: 'text-verdigris-800' },
  warning: { word: 'Warning', icon: 'warning', classes: 'text-amber-800' },
  blocked: { word: 'Blocked', icon: 'blocked', classes: 'text-oxide-800' },
};

/** "Pass", "Warning" or "Blocked" with its icon: the word carries the status, colour repeats it. */
export function CheckStatusWord({ status }: { status: CheckStatus }) {
  const { word, icon, classes } = LOOK[status];
  return (
    <span className={`inline-flex shrink-0 items-center gap-1 font-bold ${classes}`}>
      <Icon name={icon} className="size-5" />
      {word}
    </span>
  );
}
