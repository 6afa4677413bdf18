import { randomBytes } from 'node:crypto';

import { TEST_PASSWORD, TEST_PIN, type SignedIn } from '../fixtures';
import type { HostileWorld } from './hostile-world';

const CATALOGUE = /^\/api\/(inks|substrates|lots|printers|heat-sources|surface-treaters|instruments)(\/:id(\/(archive|restore))?)?$/;

/** The existing row each catalogue's :id points at. */
function catalogueId(world: HostileWorld, name: string): number {
  const r = world.records;
  const ids: Record<string, number> = {
    inks: r.inkId,
    substrates: r.substrateId,
    lots: world.lotId,
    printers: r.printerId,
    'heat-sources': r.ovenId,
    'surface-treaters': r.treaterId,
    instruments: r.instrumentId,
  };
  return ids[name] ?? 0;
}

/** Values for a route's path parameters that name rows of the hostile world. */
export function existingParams(world: HostileWorld, path: string): Record<string, string> {
  const catalogue = CATALOGUE.exec(path);
  const byPrefix: Array<[RegExp, number]> = [
    [/^\/api\/deviations\//, world.deviationId],
    [/^\/api\/recipe-versions\//, world.draftId],
    [/^\/api\/recipes\//, world.recipeId],
    [/^\/api\/runs\/:id\/(hold|resume|cancel)$/, world.spareRunId],
    [/^\/api\/runs\//, world.runId],
    [/^\/api\/users\//, world.targetUserId],
    [/^\/api\/files\//, 1],
  ];
  const id = catalogue ? catalogueId(world, catalogue[1] ?? '') : (byPrefix.find(([re]) => re.test(path))?.[1] ?? 0);
  return { id: String(id), readingId: String(world.readingId), timerId: String(world.timerId), stepId: 'dry-ag-1', token: 'A'.repeat(43) };
}

/** Reads a catalogue row through the API: its view parses as a valid create or update body. */
async function catalogueBody(world: HostileWorld, path: string, reader: SignedIn): Promise<Record<string, unknown>> {
  const match = CATALOGUE.exec(path);
  const name = match?.[1] ?? '';
  const res = await reader.agent.get(`/api/${name}/${catalogueId(world, name)}`);
  const { id: _id, archived: _archived, updatedAt: _updatedAt, ...view } = res.body as Record<string, unknown>;
  if (match?.[3]) return { version: view.version };
  if (match?.[2]) return view;
  const { version: _version, ...create } = view;
  return { ...create, ...(name === 'lots' ? { lotNumber: `F-${tag()}` } : { name: `Fuzz ${tag()}` }) };
}

const tag = () => randomBytes(4).toString('hex');
const SIGN = { password: TEST_PASSWORD };

/**
 * A body each write route accepts (or refuses only for the state it finds): the seed that the
 * fuzzer mutates field by field, so validation is probed one field at a time, not only as a whole.
 */
export async function validBody(world: HostileWorld, method: string, path: string): Promise<unknown> {
  if (CATALOGUE.test(path)) return catalogueBody(world, path, world.sessions.engineer);
  const r = world.records;
  const key = `${method} ${path}`;
  const bodies: Record<string, unknown> = {
    'post /api/auth/sign-in': { email: world.visitor.user.email, password: TEST_PASSWORD },
    'post /api/auth/pin-switch': { userId: world.pinUserId, pin: TEST_PIN },
    'put /api/auth/pin': { pin: '2468', password: TEST_PASSWORD },
    'post /api/auth/password-reset': { email: world.visitor.user.email },
    'post /api/auth/tokens/complete': { token: 'A'.repeat(43), password: 'a-long-new-password-2026' },
    'post /api/deviations/digest': {},
    'post /api/deviations/:id/assign': { assigneeId: world.sessions.quality.user.id, severity: 'major' },
    'post /api/deviations/:id/comments': { text: 'Checked the corner under the scope.' },
    'post /api/deviations/:id/disposition': { ...SIGN, disposition: 'use-as-is', rationale: 'Within tolerance; no function lost.' },
    'post /api/deviations/:id/close': { ...SIGN, verificationNote: 'Verified.' },
    'post /api/files/artwork': {},
    'post /api/files/photos': {},
    'put /api/recipe-versions/:id': { lockVersion: 1, changeNote: 'Fuzz edit.', steps: [] },
    'post /api/recipe-versions/:id/submit': {},
    'post /api/recipe-versions/:id/release': { ...SIGN, meaning: 'approved for production' },
    'post /api/recipe-versions/:id/send-back': { comment: 'Please check the cure time.' },
    'post /api/recipes': { code: `FZ-${tag().toUpperCase()}`, name: 'Fuzz recipe', product: 'Test strip' },
    'put /api/recipes/:id': { code: `FZ-${tag().toUpperCase()}`, name: 'Fuzz recipe', product: 'Test strip', version: 1 },
    'post /api/recipes/:id/versions': {},
    'post /api/runs': { versionId: world.releasedVersionId, quantity: 2, notes: 'Fuzz run' },
    'post /api/runs/:id/hold': { reason: 'Oven is warming up.' },
    'post /api/runs/:id/resume': { reason: 'Oven is ready.' },
    'post /api/runs/:id/cancel': { reason: 'Film batch was scratched.' },
    'post /api/runs/:id/readings': { stepId: 'inspect-1', specId: 'r-trace', value: 4.4, instrumentId: r.instrumentId },
    'post /api/runs/:id/readings/:readingId/correct': { value: 4.5, reason: 'Misread the meter.' },
    'post /api/runs/:id/cure-logs': { stepId: 'cure-ag-1', samples: [{ minute: 0, tempC: 25 }, { minute: 10, tempC: 110 }] },
    'post /api/runs/:id/lot-confirmations': { stepId: 'print-ag-1', lotId: world.lotId },
    'post /api/runs/:id/nozzle-checks': { stepId: 'print-ag-1', passed: true },
    'post /api/runs/:id/problems': { stepId: 'dry-ag-1', description: 'Film curled at one edge.', severity: 'minor' },
    'post /api/runs/:id/sign-off': SIGN,
    'post /api/runs/:id/steps/:stepId/acknowledge-safety': {},
    'post /api/runs/:id/steps/:stepId/start': {},
    'post /api/runs/:id/steps/:stepId/complete': { note: 'Done.' },
    'post /api/runs/:id/steps/:stepId/not-done': { reason: 'Skipped on purpose for the test.' },
    'post /api/runs/:id/timers': { stepId: 'dry-ag-1', label: 'Dry', plannedSeconds: 420 },
    'post /api/runs/:id/timers/:timerId/stop': { reason: 'Stopped by the fuzzer.' },
    'put /api/settings': { labName: 'Hostile test lab', timeZone: 'UTC', paperSize: 'A4' },
    'post /api/trends/points': { readingId: world.readingId, excluded: true, reason: 'Loose meter lead.' },
    'post /api/trends/freeze': { recipeId: world.releasedRecipeId, specId: 'r-trace', baselineRunIds: [world.runId], reason: 'First baseline.' },
    'post /api/users': { email: `fuzz-${tag()}@lab.example`, name: 'Fuzz person', role: 'operator' },
    'patch /api/users/:id': { name: 'Renamed by fuzz' },
    'post /api/users/:id/invitation': {},
  };
  if (!(key in bodies)) throw new Error(`No valid body for ${key}: add one, so the fuzzer covers the route.`);
  return bodies[key];
}
