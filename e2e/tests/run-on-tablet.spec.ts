import { expect, test, type Page } from '@playwright/test';

import { apiAs } from '../fixtures/api';
import { DEMO_PASSWORD, demoEmail, SCREENSHOTS } from '../fixtures/demo';

test.use({ viewport: { width: 1280, height: 800 }, hasTouch: true });

interface RecipeList {
  recipes: Array<{ code: string; releasedVersion: { id: number } | null }>;
}

/** Plans a fresh run of the demo's released touch-strip recipe, as an engineer would. */
async function planRun(): Promise<number> {
  const { api, post } = await apiAs('engineer');
  const { recipes } = (await (await api.get('/api/recipes')).json()) as RecipeList;
  const versionId = recipes.find((r) => r.code === 'TOUCH-4K')?.releasedVersion?.id;
  if (!versionId) throw new Error('the demo lab has no released TOUCH-4K');
  const run = (await post('/api/runs', { versionId, quantity: 2 })) as { id: number };
  await api.dispose();
  return run.id;
}

/**
 * Walks to a step by title: forward first, back from the end if the tablet opened past it. Each
 * move is a navigation (the step is in the address), so it waits for "Step n of N" to change
 * before looking again: a slow loader must not make it walk past the step unseen.
 */
async function goToStep(page: Page, title: string) {
  const heading = page.getByRole('heading', { level: 1, name: title });
  const position = page.getByRole('banner').getByText(/^Step \d+ of \d+$/);
  let direction: 'Next step' | 'Previous step' = 'Next step';
  for (let i = 0; i < 16; i += 1) {
    const before = await position.textContent();
    if (await heading.isVisible()) return;
    if (direction === 'Next step' && (await page.getByRole('button', { name: 'Next step' }).isDisabled())) direction = 'Previous step';
    await page.getByRole('button', { name: direction }).click();
    await expect(position).not.toHaveText(before ?? '');
  }
  await expect(heading).toBeVisible();
}

test('when an operator runs steps on a tablet, then timers survive a reload, an out-of-limit reading raises a deviation, and an offline completion arrives once', async ({ page, context }) => {
  const runId = await planRun();

  // Opening the run's URL asks for a sign-in, then lands on the run.
  await page.goto(`/run/${runId}`);
  await page.getByLabel('E-mail').fill(demoEmail('operator'));
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(new RegExp(`/run/${runId}$`));

  // The drying step heats to 60 °C: its cautions must be acknowledged before it can start.
  await goToStep(page, 'Dry on the hot plate');
  await expect(page.getByRole('button', { name: 'Start step' })).toBeDisabled();
  await page.getByRole('button', { name: 'I have read these cautions' }).click();
  await page.getByRole('button', { name: 'Start step' }).click();
  await page.getByRole('button', { name: /Start timer/ }).click();
  const tray = page.getByRole('region', { name: 'Running timers' });
  await expect(tray).toBeVisible();
  await page.screenshot({ path: `${SCREENSHOTS}tablet-01-timer.png` });

  // The timer lives on the server: a reload shows it still running.
  await expect(page.getByRole('button', { name: 'All saved' })).toBeVisible();
  await page.reload();
  await expect(page.getByRole('region', { name: 'Running timers' })).toBeVisible();

  // Stopping before the shortest time asks why, and the server raises a deviation.
  await goToStep(page, 'Dry on the hot plate');
  await page.getByRole('button', { name: 'Stop timer' }).first().click();
  await page.getByRole('dialog').getByLabel('Reason').fill('Sheet already dry to the touch');
  await page.getByRole('dialog').getByRole('button', { name: 'Stop timer' }).click();
  await expect(page.getByRole('heading', { name: 'Deviations on this step' })).toBeVisible();

  // Offline: the completion waits in the outbox, then reaches the server once when back online.
  await context.setOffline(true);
  await page.getByRole('button', { name: 'Step done' }).click();
  await expect(page.getByRole('button', { name: /1 write waiting/ })).toBeVisible();
  await page.screenshot({ path: `${SCREENSHOTS}tablet-02-offline.png` });
  await context.setOffline(false);
  await expect(page.getByRole('button', { name: 'All saved' })).toBeVisible({ timeout: 30_000 });

  // An out-of-limit reading is confirmed by the operator and raises a deviation.
  await goToStep(page, 'Inspect and measure');
  if (await page.getByRole('button', { name: 'Start step' }).isEnabled()) await page.getByRole('button', { name: 'Start step' }).click();
  await page.getByRole('button', { name: /^Record reading: Key 1 trace resistance, piece/ }).first().click();
  await page.getByRole('textbox', { name: /Key 1 trace resistance, piece/ }).fill('50');
  await page.getByRole('button', { name: 'Record reading', exact: true }).click();
  await expect(page.getByRole('dialog', { name: 'This reading is out of limits' })).toBeVisible();
  await page.getByRole('button', { name: 'Record anyway' }).click();
  await expect(page.getByRole('heading', { name: 'Deviations on this step' })).toBeVisible();
  await expect(page.getByText(/out of limits/i).first()).toBeVisible();
  await page.screenshot({ path: `${SCREENSHOTS}tablet-03-deviation.png` });

  // The server holds exactly one completion of the drying step, and every write arrived.
  const { api } = await apiAs('quality');
  const run = (await (await api.get(`/api/runs/${runId}`)).json()) as {
    steps: Array<{ stepId: string; state: string; completedAt: string | null }>;
    readings: Array<{ value: number; outOfLimits: boolean }>;
    deviations: Array<{ rule: string }>;
  };
  expect(run.steps.filter((s) => s.stepId === 'dry-keys' && s.state === 'done')).toHaveLength(1);
  expect(run.readings.filter((r) => r.value === 50 && r.outOfLimits)).toHaveLength(1);
  expect(run.deviations.map((d) => d.rule)).toEqual(expect.arrayContaining(['timer-ended-early', 'reading-out-of-limits']));
  const audit = (await (await api.get('/api/audit-events', { params: { entityType: 'run', entityId: String(runId), action: 'run-step.completed', pageSize: 200 } })).json()) as { events: Array<{ after: { stepId?: string } }> };
  expect(audit.events.filter((e) => e.after.stepId === 'dry-keys')).toHaveLength(1);
  await api.dispose();
});
