import { get, type Path, type UseFormReturn } from 'react-hook-form';
import type { z } from 'zod';

import type { RecipeStep, RecipeStepSchema } from '@tracewright/shared';

/** The step form holds what the person typed; the step schema turns it into a RecipeStep. */
export type StepFormValues = z.input<typeof RecipeStepSchema>;
export type StepFormApi = UseFormReturn<StepFormValues, unknown, RecipeStep>;
export type StepPath = Path<StepFormValues>;

/** The message for one field, wherever in the step it sits (params, readings, parts). */
export function fieldError(form: StepFormApi, name: string): string | undefined {
  const error: unknown = get(form.formState.errors, name);
  return typeof error === 'object' && error !== null && 'message' in error && typeof error.message === 'string' ? error.message : undefined;
}
