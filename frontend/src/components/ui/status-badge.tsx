import { Icon } from '../icons/icon';
import type { IconName } from '../icons/icon-paths';

export type StatusTone = 'pass' | 'warning' | 'blocked' | 'neutral' | 'info';

const TONES: Record<StatusTone, { classes: string; icon: IconName }> = {
  pass: { classes: 'border-verdigris-700 bg-verdigris-50 text-verdigris-800', icon: 'check' },
  warning: { classes: 'border-amber-700 bg-amber-50 text-amber-800', icon: 'warning' },
  blocked: { classes: 'border-oxide-700 bg-oxide-50 text-oxide-800', icon: 'blocked' },
  neutral: { classes: 'border-graphite-500 bg-graphite-50 text-graphite-700', icon: 'paused' },
  info: { classes: 'border-copper-600 bg-copper-50 text-copper-700', icon: 'info' },
};

type StatusBadgeProps = { tone: StatusTone; label: string; icon?: IconName };

/** Status is never colour alone: the icon and the word say it, the colour only repeats it. */
export function StatusBadge({ tone, label, icon }: StatusBadgeProps) {
  const { classes, icon: toneIcon } = TONES[tone];
  return (
    <span className={`inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-sm font-bold ${classes}`}>
      <Icon name={icon ?? toneIcon} className="size-4" />
      {label}
    </span>
  );
}
