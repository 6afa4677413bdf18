import type { VersionSetup } from '@tracewright/shared';

import type { ProcessRecords } from '../api/get-process-records';
import type { StepFormApi } from '../utils/step-form-types';

/** What every kind's fields need: the form, the lab's records, and the version's setup. */
export type KindFieldsProps = { form: StepFormApi; records: ProcessRecords; setup: VersionSetup };
