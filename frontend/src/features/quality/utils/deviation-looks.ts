import type { DeviationDetail } from '@tracewright/shared';

import type { IconName } from '../../../components/icons/icon-paths';
import type { StatusTone } from '../../../components/ui/status-badge';

type Look = { label: string; tone: StatusTone; icon: IconName };

/** Severity reads as a word with its own icon; the colour only repeats it. */
export const SEVERITY_LOOK: Record<DeviationDetail['severity'], Look> = {
  minor: { label: 'Minor', tone: 'neutral', icon: 'info' },
  major: { label: 'Major', tone: 'warning', icon: 'warning' },
  critical: { label: 'Critical', tone: 'blocked', icon: 'blocked' },
};

export const STATE_LOOK: Record<DeviationDetail['state'], Look> = {
  open: { label: 'Open', tone: 'warning', icon: 'warning' },
  'in-review': { label: 'In review', tone: 'info', icon: 'hourglass' },
  dispositioned: { label: 'Dispositioned', tone: 'neutral', icon: 'ledger' },
  closed: { label: 'Closed', tone: 'pass', icon: 'check' },
};

/** What raised the deviation, in a technician's words. */
export const RULE_WORDS: Record<DeviationDetail['rule'], string> = {
  'reading-out-of-limits': 'Reading out of limits',
  'timer-ended-early': 'Timer stopped early',
  'timer-over-maximum': 'Step ran past its longest time',
  'cure-dose-short': 'Cure dose short',
  'expired-lot': 'Expired lot used',
  'lot-past-pot-life': 'Lot past its pot life',
  'calibration-overdue': 'Equipment past calibration',
  'treatment-wait-exceeded': 'Too long after surface treatment',
  'step-not-done': 'Step not done',
  reported: 'Reported by hand',
};

export const EVENT_WORDS: Record<DeviationDetail['events'][number]['kind'], string> = {
  created: 'Raised',
  assigned: 'Assigned',
  'severity-changed': 'Severity changed',
  comment: 'Comment',
  dispositioned: 'Dispositioned',
  closed: 'Closed',
  'signature-refused': 'Signature refused',
};
