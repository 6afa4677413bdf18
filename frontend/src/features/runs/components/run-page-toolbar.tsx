import type { ReactNode } from 'react';
import { Link } from 'react-router';

import { Icon } from '../../../components/icons/icon';

type RunPageToolbarProps = { back: { to: string; label: string }; children: ReactNode };

/** Screen-only bar above a printable page: the way back and the page's actions, never printed. */
export function RunPageToolbar({ back, children }: RunPageToolbarProps) {
  return (
    <div className="mb-6 flex flex-wrap items-center justify-between gap-3 print:hidden">
      <Link to={back.to} className="inline-flex min-h-11 items-center gap-1 font-bold text-copper-700 underline underline-offset-4">
        <Icon name="arrowLeft" />
        {back.label}
      </Link>
      <div className="flex flex-wrap gap-2">{children}</div>
    </div>
  );
}
