import { useMemo } from 'react';

import type { DraftContent } from '@tracewright/shared';

import type { ProcessRecords } from '../api/get-process-records';
import { evaluateDraft, type DraftEvaluation } from '../utils/evaluate-draft';

/** Live checks, timeline and cautions, recomputed whenever the working copy changes. */
export function useDraftEvaluation(content: DraftContent, records: ProcessRecords): DraftEvaluation {
  return useMemo(() => evaluateDraft(content, records), [content, records]);
}
