import { describe, expect, it } from 'vitest';

import { PrinterInputSchema } from '../../schemas/equipment.schema';
import { InkInputSchema, SubstrateInputSchema } from '../../schemas/material.schema';
import { DraftContentSchema } from '../../schemas/recipe.schema';
import { CHECK_FAMILIES, ProcessCheckSchema } from './process-check';
import { recipeChecks } from './recipe-checks';
import { buildFortyStepRecipe, makeInput, steps } from './test-fixtures';

describe('recipeChecks', () => {
  it('when the 40-step fixture is checked, then every check parses, ids are unique and every family speaks', () => {
    const checks = recipeChecks(buildFortyStepRecipe());
    for (const check of checks) expect(ProcessCheckSchema.parse(check)).toEqual(check);
    expect(new Set(checks.map((c) => c.id)).size).toBe(checks.length);
    expect(new Set(checks.map((c) => c.family))).toEqual(new Set(CHECK_FAMILIES));
  });

  it('when checks come back, then they are grouped by family in the panel order', () => {
    const order = recipeChecks(buildFortyStepRecipe()).map((c) => CHECK_FAMILIES.indexOf(c.family));
    expect(order).toEqual([...order].sort((a, b) => a - b));
  });

  it('when the same input is checked twice, then the answer is the same (pure)', () => {
    const input = buildFortyStepRecipe();
    expect(recipeChecks(input)).toEqual(recipeChecks(input));
  });

  it('when a record holds a value no material has, then that check warns instead of failing the panel', () => {
    // Printer speeds are positive by schema; a stored 0 slipped past the form must not break the panel.
    const input = makeInput({ steps: [steps.print('p')] });
    input.printers = [{ ...(input.printers[0] as (typeof input.printers)[number]), jettingSpeedMetresPerSecond: 0 }];
    const jetting = recipeChecks(input).find((c) => c.id === 'jettability:p');
    expect(jetting).toMatchObject({ status: 'warning', why: expect.stringContaining("Can't check this") });
  });
});

describe('buildFortyStepRecipe', () => {
  it('when the bench fixture is built, then it is a valid draft of 40 steps with valid records', () => {
    const input = buildFortyStepRecipe();
    expect(DraftContentSchema.parse({ ...input.setup, steps: input.steps }).steps).toHaveLength(40);
    for (const ink of input.inks) InkInputSchema.parse(ink);
    for (const substrate of input.substrates) SubstrateInputSchema.parse(substrate);
    for (const printer of input.printers) PrinterInputSchema.parse(printer);
  });
});
