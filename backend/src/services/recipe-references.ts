import { Op, type Transaction } from 'sequelize';

import type { DraftContent, HeatSource, Ink, Printer, RecipeCheckInput, Substrate } from '@tracewright/shared';

import { unprocessable } from '../errors/app-error';
import { HeatSourceModel } from '../models/heat-source.model';
import { InkModel } from '../models/ink.model';
import { PrinterChannelModel } from '../models/printer-channel.model';
import { PrinterModel } from '../models/printer.model';
import { StoredFileModel } from '../models/stored-file.model';
import { SubstrateModel } from '../models/substrate.model';
import { SurfaceTreaterModel } from '../models/surface-treater.model';
import { toHeatSourceDto, toPrinterDto } from './equipment-dto';
import { toInkDto, toSubstrateDto } from './material-dto';

/** The records a version's content points at, loaded once for the checks and the existence test. */
export interface LoadedReferences {
  inks: Ink[];
  substrates: Substrate[];
  printers: Printer[];
  heatSources: HeatSource[];
  treaterIds: ReadonlySet<number>;
  artworkFileIds: ReadonlySet<number>;
}

/** One reference in the content: where it sits (dotted path, as the form names fields) and what it names. */
interface Reference {
  field: string;
  kind: 'ink' | 'substrate' | 'printer' | 'heat source' | 'surface treater' | 'artwork file';
  id: number;
  /** e.g. "Step 3 “Print silver”", or "The setup". */
  where: string;
}

function referencesOf(content: DraftContent): Reference[] {
  const setup = 'The setup';
  const refs: Reference[] = [];
  const add = (field: string, kind: Reference['kind'], id: number | null, where = setup) => {
    if (id !== null) refs.push({ field, kind, id, where });
  };
  add('substrateId', 'substrate', content.substrateId);
  add('receivingSubstrateId', 'substrate', content.receivingSubstrateId);
  add('printerId', 'printer', content.printerId);
  content.channelPlan.forEach((c, i) => add(`channelPlan.${i}.inkId`, 'ink', c.inkId, `Channel ${c.channel} of the plan`));
  content.heatSourceIds.forEach((id, i) => add(`heatSourceIds.${i}`, 'heat source', id));
  content.treaterIds.forEach((id, i) => add(`treaterIds.${i}`, 'surface treater', id));
  content.steps.forEach((step, i) => {
    const where = `Step ${i + 1} “${step.title}”`;
    const at = (name: string) => `steps.${i}.params.${name}`;
    if (step.kind === 'print-pass') {
      add(at('inkId'), 'ink', step.params.inkId, where);
      add(at('artworkFileId'), 'artwork file', step.params.artworkFileId, where);
    }
    if (step.kind === 'surface-treatment') add(at('treaterId'), 'surface treater', step.params.treaterId, where);
    if (step.kind === 'dry' || step.kind === 'cure' || step.kind === 'transfer') add(at('heatSourceId'), 'heat source', step.params.heatSourceId, where);
  });
  return refs;
}

const idsOf = (refs: Reference[], kind: Reference['kind']) => [...new Set(refs.filter((r) => r.kind === kind).map((r) => r.id))];

/** Loads every record the content names (archived ones too: the checks warn about those). */
export async function loadReferences(content: DraftContent, transaction?: Transaction): Promise<LoadedReferences> {
  const refs = referencesOf(content);
  const byIds = (kind: Reference['kind']) => ({ where: { id: { [Op.in]: idsOf(refs, kind) } }, transaction });
  const [inks, substrates, printers, heatSources, treaters, files] = await Promise.all([
    InkModel.findAll(byIds('ink')),
    SubstrateModel.findAll(byIds('substrate')),
    PrinterModel.findAll({ ...byIds('printer'), include: [{ model: PrinterChannelModel, as: 'channels' }] }),
    HeatSourceModel.findAll(byIds('heat source')),
    SurfaceTreaterModel.findAll({ ...byIds('surface treater'), attributes: ['id'] }),
    StoredFileModel.findAll({ ...byIds('artwork file'), attributes: ['id'] }),
  ]);
  return {
    inks: inks.map(toInkDto),
    substrates: substrates.map(toSubstrateDto),
    printers: printers.map(toPrinterDto),
    heatSources: heatSources.map(toHeatSourceDto),
    treaterIds: new Set(treaters.map((t) => t.id)),
    artworkFileIds: new Set(files.map((f) => f.id)),
  };
}

/**
 * Refuses content naming records that do not exist, with a 422 whose field errors use the form's
 * dotted paths (e.g. `steps.2.params.inkId`), each message naming the step or setup field.
 */
export function assertReferencesExist(content: DraftContent, loaded: LoadedReferences): void {
  const known: Record<Reference['kind'], (id: number) => boolean> = {
    ink: (id) => loaded.inks.some((r) => r.id === id),
    substrate: (id) => loaded.substrates.some((r) => r.id === id),
    printer: (id) => loaded.printers.some((r) => r.id === id),
    'heat source': (id) => loaded.heatSources.some((r) => r.id === id),
    'surface treater': (id) => loaded.treaterIds.has(id),
    'artwork file': (id) => loaded.artworkFileIds.has(id),
  };
  const missing = referencesOf(content).filter((ref) => !known[ref.kind](ref.id));
  if (missing.length === 0) return;
  const fieldErrors = Object.fromEntries(
    missing.map((ref) => [ref.field, [`${ref.where}: there is no ${ref.kind} with id ${ref.id}. Pick one from the list.`]]),
  );
  const first = fieldErrors[missing[0]?.field ?? ''] ?? [];
  const more = missing.length > 1 ? ` (and ${missing.length - 1} more)` : '';
  throw unprocessable(`${first[0]}${more}`, { formErrors: [], fieldErrors });
}

/** What the shared checks read. */
export function checkInputOf(content: DraftContent, loaded: LoadedReferences): RecipeCheckInput {
  const { steps, ...setup } = content;
  return { setup, steps, inks: loaded.inks, substrates: loaded.substrates, printers: loaded.printers, heatSources: loaded.heatSources };
}
