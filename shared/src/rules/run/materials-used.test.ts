import { describe, expect, it } from 'vitest';

import type { RecipeStep } from '../../schemas/recipe-step.schema';
import { materialsUsed } from './materials-used';

const printWith = (id: string, inkId: number) =>
  ({ id, kind: 'print-pass', title: 'Print', instructions: '', minMinutes: null, maxMinutes: null, handsOnMinutes: null, readingSpecs: [], safetyNotes: [], params: { inkId, channel: 'C1', artworkFileId: null, dpi: 1270, passes: 1, platenTempC: null, nozzleCheckRequired: true, printedAreaFraction: null, pieceAreaMm2: null } }) as RecipeStep;

describe('materialsUsed', () => {
  it.each([
    ['when the plan and the passes name the same ink, then it is listed once, plan first', [{ channel: 'C1', inkId: 3 }], [printWith('p-0001', 5), printWith('p-0002', 3)], 2, null, [3, 5], [2]],
    ['when a transfer names a receiving material, then both substrates are used', [], [], 2, 7, [], [2, 7]],
    ['when nothing is chosen yet, then nothing is used', [], [], null, null, [], []],
  ])('%s', (_name, channelPlan, steps, substrateId, receivingSubstrateId, inkIds, substrateIds) => {
    expect(materialsUsed({ channelPlan, steps, substrateId, receivingSubstrateId })).toEqual({ inkIds, substrateIds });
  });
});
