import type { ReactNode } from 'react';

import { Icon } from '../icons/icon';
import type { IconName } from '../icons/icon-paths';

type NoticeProps = { tone?: 'info' | 'pass' | 'warning'; title: string; children?: ReactNode; role?: 'status' | 'note' };

const TONES: Record<NonNullable<NoticeProps['tone']>, { classes: string; icon: IconName }> = {
  info: { classes: 'border-graphite-500 bg-white text-graphite-800', icon: 'info' },
  pass: { classes: 'border-verdigris-700 bg-verdigris-50 text-verdigris-800', icon: 'check' },
  warning: { classes: 'border-amber-700 bg-amber-50 text-amber-800', icon: 'warning' },
};

/** A calm block of explanation: what happened and what to do next. */
export function Notice({ tone = 'info', title, children, role }: NoticeProps) {
  const { classes, icon } = TONES[tone];
  return (
    <div role={role} className={`flex items-start gap-3 rounded-md border-2 p-4 ${classes}`}>
      <Icon name={icon} className="mt-0.5 size-6" />
      <div className="space-y-2">
        <p className="font-bold">{title}</p>
        {children}
      </div>
    </div>
  );
}
