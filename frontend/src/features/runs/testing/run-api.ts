import { http, HttpResponse } from 'msw';

import type { HeatSourceView, Ink, InstrumentView, LotView, Printer, RunDetail, RunSignOffView, Substrate, SurfaceTreaterView } from '@tracewright/shared';
import type { RecipeSummary, RecipeVersionView } from '@tracewright/shared';
import { stateInWords } from '@tracewright/shared';

import { aHeatSource, aLot, anInk, anInstrument, aPrinter, aSubstrate } from './catalogue-records';
import { aReleasedRecipe, aReleasedVersion } from './plan-records';
import { aRunDetail } from './run-fixtures';

/** A run's sign-off as the API reports it: not signed, and refused unless the run is completed. */
export function aSignOffView(run: RunDetail, overrides: Partial<RunSignOffView> = {}): RunSignOffView {
  const isCompleted = run.state === 'completed';
  return {
    runId: run.id,
    runCode: run.code,
    runState: run.state,
    contentHash: 'c0ffee'.padEnd(64, '0'),
    canSignOff: isCompleted,
    refusal: isCompleted ? null : `Run ${run.code} is ${stateInWords(run.state)}; only a completed run can be signed off.`,
    undecided: [],
    signature: null,
    ...overrides,
  };
}

/** The run's sign-off, read by the run record. */
export const signOffApi = (run: RunDetail, view: RunSignOffView = aSignOffView(run)) => http.get(`/api/runs/${run.id}/sign-off`, () => HttpResponse.json(view));

/** What the run record, traveller and labels read: the run, its sign-off, and heat sources for the cautions. */
export function runPagesApi({ run = aRunDetail(), heatSources = [aHeatSource()] }: { run?: RunDetail; heatSources?: HeatSourceView[] } = {}) {
  return [
    http.get(`/api/runs/${run.id}`, () => HttpResponse.json(run)),
    signOffApi(run),
    http.get('/api/heat-sources', () => HttpResponse.json({ heatSources })),
  ];
}

type PlanApi = {
  recipes?: RecipeSummary[];
  version?: RecipeVersionView;
  lots?: LotView[];
  inks?: Ink[];
  substrates?: Substrate[];
  printers?: Printer[];
  heatSources?: HeatSourceView[];
  treaters?: SurfaceTreaterView[];
  instruments?: InstrumentView[];
};

export const GOOD_INK_LOT = aLot({ id: 7, lotNumber: 'AN9-2611' });
export const PET_LOT = aLot({ id: 9, materialType: 'substrate', materialId: 1, materialName: 'Clear PET 125', lotNumber: 'PET-0042' });

/** Everything the plan page reads, with one released version (TRACE-1 v2) by default. */
export function planApi(api: PlanApi = {}) {
  const version = api.version ?? aReleasedVersion();
  return [
    http.get('/api/recipes', () => HttpResponse.json({ recipes: api.recipes ?? [aReleasedRecipe()] })),
    http.get(`/api/recipe-versions/${version.id}`, () => HttpResponse.json(version)),
    http.get('/api/lots', () => HttpResponse.json({ lots: api.lots ?? [GOOD_INK_LOT, PET_LOT] })),
    http.get('/api/inks', () => HttpResponse.json({ inks: api.inks ?? [anInk()] })),
    http.get('/api/substrates', () => HttpResponse.json({ substrates: api.substrates ?? [aSubstrate()] })),
    http.get('/api/printers', () => HttpResponse.json({ printers: api.printers ?? [aPrinter()] })),
    http.get('/api/heat-sources', () => HttpResponse.json({ heatSources: api.heatSources ?? [aHeatSource()] })),
    http.get('/api/surface-treaters', () => HttpResponse.json({ surfaceTreaters: api.treaters ?? [] })),
    http.get('/api/instruments', () => HttpResponse.json({ instruments: api.instruments ?? [anInstrument()] })),
  ];
}
