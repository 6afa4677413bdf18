import { Link, useSearchParams } from 'react-router';

import { Icon } from '../../../components/icons/icon';
import { buttonClasses } from '../../../components/ui/button-styles';
import { auditSearchFor } from '../utils/audit-search';

type AuditPagerProps = { page: number; pageSize: number; total: number };

export function AuditPager({ page, pageSize, total }: AuditPagerProps) {
  const [params] = useSearchParams();
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const from = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const to = Math.min(total, page * pageSize);
  const step = (target: number, label: string, icon: 'arrowLeft' | 'chevronRight') =>
    target >= 1 && target <= pages ? (
      <Link to={auditSearchFor(params, target)} className={buttonClasses('secondary')}>
        {icon === 'arrowLeft' ? <Icon name={icon} /> : null}
        {label}
        {icon === 'chevronRight' ? <Icon name={icon} /> : null}
      </Link>
    ) : (
      // Kept in place (not removed) so the buttons do not jump around between pages.
      <span aria-disabled="true" className={buttonClasses('secondary', 'md', 'opacity-50')}>
        {label}
      </span>
    );

  return (
    <nav aria-label="Audit pages" className="mt-4 flex flex-wrap items-center justify-between gap-4">
      <p className="tabular" aria-live="polite">
        Events {from}–{to} of {total} · page {Math.min(page, pages)} of {pages}
      </p>
      <div className="flex gap-2">
        {step(page - 1, 'Previous page', 'arrowLeft')}
        {step(page + 1, 'Next page', 'chevronRight')}
      </div>
    </nav>
  );
}
