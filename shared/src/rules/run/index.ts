// Public surface of the run rules: readings, timers, planning choices, deviations, cure logs,
// treatment waits, progress and codes, the readings export and the traveller.
export { cureLogDose, type CureLogDose } from './cure-log';
export { DEFAULT_DEVIATION_SEVERITY, deviationDraft, type DeviationContexts, type DeviationDraft } from './deviation-drafts';
export {
  evaluateReading,
  isResistanceUnit,
  readingLimitsText,
  RESISTANCE_REFERENCE_TEMP_C,
  type ReadingContext,
  type ReadingEvaluation,
} from './reading-evaluation';
export { csvCell, READINGS_CSV_HEADER, readingsCsv, type ReadingCsvRow } from './readings-csv';
export {
  equipmentChoiceIssues,
  lotChoiceIssues,
  missingReasons,
  type ChoiceIssue,
  type ChoiceIssueRule,
  type EquipmentChoice,
  type LotChoice,
} from './run-choices';
export {
  allowedRunTransitions,
  canTransition,
  pieceCodes,
  RUN_TRANSITIONS,
  runCode,
  runProgress,
  type RunProgress,
  type StepRecordState,
} from './run-progress';
export { stepParameterTexts, stepTimeText, type TravellerContext } from './step-parameters';
export { numberText, quantityText, type StepRef } from './text-format';
export { timerElapsedSeconds, timerOutcome, timerRemainingSeconds, type RunTimer, type TimerOutcome } from './timer-rules';
export { travellerSteps, type TravellerReading, type TravellerStep } from './traveller';
export { treatmentWaitExceeded, type StepCompletion, type TreatmentWait } from './treatment-wait';
export { materialsUsed, type MaterialsUsed } from './materials-used';
export { substitutedContent, versionMachines, type MachineRef, type Substitution, type VersionMachineKind } from './machine-substitution';
