import { createHash, randomBytes } from 'node:crypto';

import { expect, test, type Page } from '@playwright/test';
import { PNG } from 'pngjs';

import { apiAs } from '../fixtures/api';
import { DEMO_PASSWORD, demoEmail, SCREENSHOTS } from '../fixtures/demo';
import { planTouchStripRun } from '../fixtures/runs';

test.use({ viewport: { width: 1280, height: 800 }, hasTouch: true });

/** A small PNG of random pixels: its bytes, hence its SHA-256, belong to this test alone. */
function uniquePhoto(): { buffer: Buffer; sha256: string } {
  const png = new PNG({ width: 32, height: 32 });
  randomBytes(png.data.length).copy(png.data);
  for (let i = 3; i < png.data.length; i += 4) png.data[i] = 255;
  const buffer = PNG.sync.write(png);
  return { buffer, sha256: createHash('sha256').update(buffer).digest('hex') };
}

interface RunView {
  state: string;
  steps: Array<{ stepId: string; state: string; nozzleCheck: { passed: boolean; photoFileId: number | null } | null }>;
  readings: Array<{ stepId: string; specId: string; value: number }>;
  safetyNotes: Record<string, unknown[]>;
}

/** Acknowledges the step's cautions when it has any, then starts it. */
async function startStep(page: Page, hasCautions: boolean) {
  if (hasCautions) await page.getByRole('button', { name: 'I have read these cautions' }).click();
  await page.getByRole('button', { name: 'Start step' }).click();
  await expect(page.getByRole('button', { name: 'Step done' })).toBeVisible();
}

async function recordReading(page: Page, name: string, value: string) {
  await page.getByRole('button', { name: new RegExp(`^Record reading: ${name}`) }).first().click();
  await page.getByRole('textbox', { name: new RegExp(name) }).fill(value);
  await page.getByRole('button', { name: 'Record reading', exact: true }).click();
  await expect(page.getByRole('list', { name: new RegExp(`^${name} for piece`) })).toContainText(value);
}

const OFFLINE_STEPS = ['print-keys', 'attach-tail', 'inspect-keys'];
const READINGS = [
  { specId: 'r-key-1', name: 'Key 1 trace resistance', value: 5.6 },
  { specId: 'r-key-4', name: 'Key 4 trace resistance', value: 8.3 },
  { specId: 'iso-keys', name: 'Key-to-key isolation', value: 45 },
];

test('when an operator does three steps offline with readings and a photo, reloading on the way, then back online the server has each record once, in order', async ({ page, context }) => {
  // A fresh one-piece run whose first steps are done: the tablet opens on the print pass.
  const run = await planTouchStripRun(1);
  const { api, post } = await apiAs('operator');
  for (const stepId of ['wipe-pet', 'dry-keys', 'cure-keys']) {
    await post(`/api/runs/${run.id}/steps/${stepId}/acknowledge-safety`, {});
    await post(`/api/runs/${run.id}/steps/${stepId}/start`, {});
    await post(`/api/runs/${run.id}/steps/${stepId}/complete`, {});
  }
  const planned = (await (await api.get(`/api/runs/${run.id}`)).json()) as RunView;
  await api.dispose();
  const hasCautions = (stepId: string) => (planned.safetyNotes[stepId] ?? []).length > 0;

  await page.goto(`/run/${run.id}`);
  await page.getByLabel('E-mail').fill(demoEmail('operator'));
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Print the key electrodes and traces' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'All saved' })).toBeVisible();
  // The service worker controls the page, and holds who is signed in, before the network goes.
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
  await page.waitForFunction(async () => (await caches.match('/api/auth/session')) !== undefined);

  await context.setOffline(true);

  // 1. The print pass: a nozzle check with a photo of the pattern, then done.
  const photo = uniquePhoto();
  await startStep(page, hasCautions('print-keys'));
  await page.getByLabel('Photo of the pattern (optional)').setInputFiles({ name: 'nozzle-pattern.png', mimeType: 'image/png', buffer: photo.buffer });
  await expect(page.getByRole('img', { name: 'Photo 1' })).toBeVisible();
  await page.getByRole('button', { name: 'Nozzle check passed' }).click();
  await expect(page.getByText(/^Passed at/)).toBeVisible();
  await page.getByRole('button', { name: 'Step done' }).click();

  // 2. Fit the connector tail: the tablet moves on to it by itself.
  await expect(page.getByRole('heading', { level: 1, name: 'Fit the connector tail' })).toBeVisible();
  await startStep(page, hasCautions('attach-tail'));
  await page.getByRole('button', { name: 'Step done' }).click();
  await expect(page.getByRole('button', { name: /writes waiting/ })).toBeVisible();

  // A reload with no network: the service worker serves the app, the tablet keeps the run and its writes.
  await page.reload();
  // 3. Inspect and measure, where the reloaded tablet opens: one reading of each kind for the one piece.
  await expect(page.getByRole('heading', { level: 1, name: 'Inspect and measure' })).toBeVisible();
  await expect(page.getByRole('button', { name: /writes waiting/ })).toBeVisible();
  await page.screenshot({ path: `${SCREENSHOTS}tablet-04-offline-reload.png` });
  await startStep(page, hasCautions('inspect-keys'));
  for (const reading of READINGS) await recordReading(page, reading.name, String(reading.value));
  await page.getByRole('button', { name: 'Step done' }).click();
  await expect(page.getByRole('button', { name: /writes waiting/ })).toBeVisible();
  await page.screenshot({ path: `${SCREENSHOTS}tablet-05-offline-done.png` });

  // Back online: the outbox drains.
  await context.setOffline(false);
  await expect(page.getByRole('button', { name: 'All saved' })).toBeVisible({ timeout: 30_000 });

  // The server: each of the three steps completed once, in the order done; each reading once; the photo stored once.
  const { api: quality } = await apiAs('quality');
  const after = (await (await quality.get(`/api/runs/${run.id}`)).json()) as RunView;
  const completions = (await (
    await quality.get('/api/audit-events', { params: { entityType: 'run', entityId: String(run.id), action: 'run-step.completed', pageSize: 200 } })
  ).json()) as { events: Array<{ id: number; after: { stepId?: string } }> };
  const uploads = (await (await quality.get('/api/audit-events', { params: { entityType: 'file', action: 'file.uploaded', pageSize: 200 } })).json()) as {
    events: Array<{ entityId: string | number; after: { sha256?: string } }>;
  };
  await quality.dispose();

  const doneInOrder = [...completions.events].sort((a, b) => a.id - b.id).map((e) => e.after.stepId);
  expect(doneInOrder).toEqual(['wipe-pet', 'dry-keys', 'cure-keys', ...OFFLINE_STEPS]);
  expect(after.steps.filter((s) => OFFLINE_STEPS.includes(s.stepId)).map((s) => s.state)).toEqual(['done', 'done', 'done']);
  expect(after.state).toBe('completed');
  expect(after.readings.map((r) => [r.specId, r.value]).sort()).toEqual(READINGS.map((r) => [r.specId, r.value]).sort());
  const stored = uploads.events.filter((e) => e.after.sha256 === photo.sha256);
  expect(stored).toHaveLength(1);
  expect(after.steps.find((s) => s.stepId === 'print-keys')?.nozzleCheck).toEqual({ passed: true, photoFileId: Number(stored[0]?.entityId), at: expect.any(String) });
});
