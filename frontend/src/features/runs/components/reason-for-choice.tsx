import type { UseFormRegisterReturn } from 'react-hook-form';

import type { ChoiceIssue, ChoiceIssueRule } from '@tracewright/shared';

import type { IconName } from '../../../components/icons/icon-paths';
import { StatusBadge } from '../../../components/ui/status-badge';
import { TextAreaField } from '../../../components/ui/text-area-field';

const ISSUE_LOOK: Record<ChoiceIssueRule, { label: string; icon: IconName }> = {
  'expired-lot': { label: 'Expired', icon: 'blocked' },
  'lot-past-pot-life': { label: 'Past pot life', icon: 'hourglass' },
  'calibration-overdue': { label: 'Calibration overdue', icon: 'blocked' },
};

type ReasonForChoiceProps = {
  issues: ChoiceIssue[];
  /** The API asked for a reason the form did not foresee (its clock or records differ). */
  isAsked: boolean;
  noun: 'lot' | 'machine' | 'instrument';
  registration: UseFormRegisterReturn;
  error?: string;
};

/** What the run rules say about a chosen lot or machine, and the reason needed to use it anyway. */
export function ReasonForChoice({ issues, isAsked, noun, registration, error }: ReasonForChoiceProps) {
  if (issues.length === 0 && !isAsked) return null;
  return (
    <div className="flex flex-col gap-3 rounded-md border-2 border-amber-700 bg-amber-50 p-3 text-graphite-900">
      <ul className="flex flex-col gap-2">
        {issues.map((issue) => (
          <li key={issue.rule} className="flex flex-wrap items-start gap-2">
            <StatusBadge tone="blocked" label={ISSUE_LOOK[issue.rule].label} icon={ISSUE_LOOK[issue.rule].icon} />
            <span>{issue.message}</span>
          </li>
        ))}
      </ul>
      <TextAreaField
        label={`Reason for using this ${noun}`}
        help="Planning the run with it raises a deviation, which quality reviews."
        rows={2}
        error={error}
        {...registration}
      />
    </div>
  );
}
