import { randomBytes } from 'node:crypto';

import { expect } from 'vitest';

import { HeatSourceInputSchema, InkInputSchema, PrinterInputSchema, SubstrateInputSchema } from '@tracewright/shared';

import { HeatSourceModel } from '../src/models/heat-source.model';
import { InkModel } from '../src/models/ink.model';
import { PrinterChannelModel } from '../src/models/printer-channel.model';
import { PrinterModel } from '../src/models/printer.model';
import { SubstrateModel } from '../src/models/substrate.model';
import { SurfaceTreaterModel } from '../src/models/surface-treater.model';
import type { SignedIn } from './fixtures';

// Invented, plausible values: they exercise the API and make the shared checks pass, nothing more.

export interface ProcessRecords {
  inkId: number;
  substrateId: number;
  printerId: number;
  ovenId: number;
  treaterId: number;
}

const tag = () => randomBytes(4).toString('hex');

/** Unique, uppercase recipe codes, e.g. "T-3F9A0C1B". */
export const uniqueCode = (prefix = 'T') => `${prefix}-${tag().toUpperCase()}`;

/** A silver ink, a PET-like film, a printer with channel Ag loaded with the ink, an oven and a treater. */
export async function createProcessRecords(): Promise<ProcessRecords> {
  const ink = await InkModel.create(
    InkInputSchema.parse({
      name: `Test silver ${tag()}`,
      function: 'conductor',
      viscosityMilliPaS: 12,
      surfaceTensionMilliNPerM: 31,
      densityKgPerM3: 1310,
      solidsWtPercent: 30,
      sheetResistanceOhmPerSq: 0.09,
      cureReferenceTempC: 150,
      cureReferenceMinutes: 30,
      activationEnergyKJPerMol: 60,
      solvents: [{ name: 'Ethanol', casNumber: '64-17-5', hazardCodes: ['H225'], pictograms: ['GHS02'], signalWord: 'Danger' }],
    }),
  );
  const substrate = await SubstrateModel.create(
    SubstrateInputSchema.parse({
      name: `Test PET ${tag()}`,
      substrateClass: 'pet-film',
      thicknessUm: 125,
      surfaceEnergyDispersiveMilliNPerM: 40.5,
      surfaceEnergyPolarMilliNPerM: 4.5,
      maxContinuousTempC: 120,
      maxShortExposureTempC: 150,
      maxShortExposureSeconds: 60,
    }),
  );
  const { channels: _channels, ...printerColumns } = PrinterInputSchema.parse({
    name: `Test printer ${tag()}`,
    nozzleDiameterUm: 21,
    dropVolumePl: 10,
    jettingSpeedMetresPerSecond: 6,
    nativeDpi: 1270,
    channels: [{ name: 'Ag', inkId: ink.id }],
  });
  const printer = await PrinterModel.create(printerColumns);
  await PrinterChannelModel.create({ printerId: printer.id, position: 0, name: 'Ag', inkId: ink.id });
  const oven = await HeatSourceModel.create(HeatSourceInputSchema.parse({ name: `Test oven ${tag()}`, kind: 'oven', maxTempC: 250 }));
  const treater = await SurfaceTreaterModel.create({ name: `Test plasma ${tag()}`, method: 'plasma', calibrationDueOn: null, notes: '' });
  return { inkId: ink.id, substrateId: substrate.id, printerId: printer.id, ovenId: oven.id, treaterId: treater.id };
}

/**
 * Print silver, cure it, measure a trace: every shared check passes with the records above
 * (110 °C for 200 min gives the silver its full Arrhenius dose and stays 10 °C under the film's limit).
 */
export function passingContent(r: ProcessRecords, changes: { cureMinutes?: number; changeNote?: string } = {}) {
  return {
    substrateId: r.substrateId,
    printerId: r.printerId,
    channelPlan: [{ channel: 'Ag', inkId: r.inkId }],
    heatSourceIds: [r.ovenId],
    changeNote: changes.changeNote ?? 'First issue.',
    steps: [
      { id: 'print-ag-1', kind: 'print-pass', title: 'Print silver traces', params: { inkId: r.inkId, channel: 'Ag', dpi: 1270, passes: 2 } },
      { id: 'cure-ag-1', kind: 'cure', title: 'Cure silver', params: { heatSourceId: r.ovenId, temperatureC: 110, minutes: changes.cureMinutes ?? 200 } },
      {
        id: 'inspect-1',
        kind: 'inspect',
        title: 'Measure the trace',
        params: { measure: 'Trace resistance, pad to pad' },
        readingSpecs: [{ id: 'r-trace', name: 'Trace resistance', unit: 'Ω', target: 4.5, lowerLimit: 2, upperLimit: 9, traceLengthMm: 100, traceWidthMm: 1 }],
      },
    ],
  };
}

export const write = (who: SignedIn, method: 'post' | 'put', url: string, body?: object) =>
  who.agent[method](url).set('X-CSRF-Token', who.csrf).send(body);

/** Creates a recipe as `who` and returns its id and its draft v1 id. */
export async function createRecipe(who: SignedIn, code = uniqueCode()): Promise<{ recipeId: number; draftId: number; code: string }> {
  const res = await write(who, 'post', '/api/recipes', { code, name: `Recipe ${code}`, product: 'Test strip' });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return { recipeId: res.body.id, draftId: res.body.versions[0].id, code };
}

/** Saves `content` into a draft at its current lock version; expects success. */
export async function saveDraft(who: SignedIn, versionId: number, content: object) {
  const current = await who.agent.get(`/api/recipe-versions/${versionId}`);
  const res = await write(who, 'put', `/api/recipe-versions/${versionId}`, { ...content, lockVersion: current.body.lockVersion });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body;
}
