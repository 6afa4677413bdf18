// Public surface of the quality rules: deviation review and disposition, closing, run sign-off,
// trend figures, queue search and ages, lab-day ranges and the audit export.
export { auditCsv, AUDIT_CSV_HEADER, type AuditCsvRow } from './audit-csv';
export { closeBlockers, type CloseBlocker, type CloseContext } from './close-rules';
export { ageBucket, ageDays, type AgeBucket } from './deviation-age';
export {
  canActOnDeviation,
  DEVIATION_ACTION_STATES,
  DEVIATION_ACTIONS,
  deviationActionRefusal,
  deviationStateAfter,
  type DeviationAction,
  type DeviationState,
} from './deviation-transitions';
export {
  dispositionCoverage,
  dispositionIssues,
  isLotRelated,
  LOT_RULES,
  type DispositionContext,
  type DispositionRequest,
  type FieldIssue,
  type PieceCoverage,
} from './disposition-rules';
export { labDayRange, labDayStart } from './lab-day-range';
export { FULLTEXT_MIN_WORD, textSearchPlan, type TextSearchPlan } from './queue-search';
export { DECIDED_DEVIATION_STATES, runSignOffCheck, type SignOffCheck } from './run-sign-off';
export {
  baselineLimits,
  judgedValue,
  latestPointNotes,
  LOW_CPK,
  LOW_CPK_MIN_POINTS,
  PROVISIONAL_BELOW_POINTS,
  selectTrendReadings,
  trendFigures,
  type PointNote,
  type SpecLimitsView,
  type TrendFigures,
  type TrendReading,
} from './trend-figures';
