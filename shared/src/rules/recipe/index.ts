// Public surface of the recipe rules: live process checks, timeline, safety notes, version diff.
export { canonicalJson } from './canonical-json';
export { CURE_DOSE_PASS_PERCENT, cureDose, type CureDose } from './cure-dose-checks';
export { HEAT_MARGIN_C, heatStatus } from './heat-checks';
export { AMBIENT_TEMP_C, heatExposureOf, heatExposures, type HeatExposure } from './heat-exposure';
export { JETTING_STATUS } from './jetting-checks';
export {
  CHECK_FAMILIES,
  CHECK_STATUSES,
  CheckFamilySchema,
  CheckStatusSchema,
  CheckSummarySchema,
  checkSummary,
  ProcessCheckSchema,
  type CheckFamily,
  type CheckStatus,
  type CheckSummary,
  type ProcessCheck,
} from './process-check';
export { recipeChecks } from './recipe-checks';
export type { RecipeCheckInput } from './recipe-context';
export { derivedSafetyNotes, HOT_SURFACE_FROM_C, SafetyNoteSchema, type SafetyNote } from './safety-notes';
export {
  DEFAULT_STEP_MINUTES,
  HANDLING_ALLOWANCE_MINUTES,
  inkUsePerPiece,
  RAMP_START_TEMP_C,
  recipeTimeline,
  stepDurationMinutes,
  stepTime,
  type RecipeTimeline,
  type StepTime,
} from './timeline';
export {
  FieldChangeSchema,
  fieldChanges,
  STEP_DIFF_STATUSES,
  StepDiffSchema,
  versionDiff,
  VersionDiffSchema,
  type FieldChange,
  type StepDiff,
  type VersionDiff,
} from './version-diff';
export { WETTING_PASS_MARGIN_MILLI_N_PER_M, wettingStatus } from './wetting-checks';
export { approvalRefusal, VERSION_MOVES, versionMoveRefusal, type VersionContributors, type VersionMove } from './version-lifecycle';
