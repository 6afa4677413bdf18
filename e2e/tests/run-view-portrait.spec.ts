import { expect, test } from '@playwright/test';

import { apiAs } from '../fixtures/api';
import { DEMO_PASSWORD, demoEmail, SCREENSHOTS } from '../fixtures/demo';

// A 10-inch tablet held upright, touch on.
test.use({ viewport: { width: 800, height: 1280 }, hasTouch: true });

test('when the tablet is held upright, then the step, its cautions and the action bar fit without sideways scrolling', async ({ page }) => {
  const { api } = await apiAs('engineer');
  const { runs } = (await (await api.get('/api/runs')).json()) as { runs: Array<{ id: number }> };
  await api.dispose();
  const runId = runs[0]?.id;
  if (!runId) throw new Error('no run to open: the demo lab seeds one');

  await page.goto(`/run/${runId}`);
  await page.getByLabel('E-mail').fill(demoEmail('operator'));
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { level: 1 })).toBeVisible();

  const bar = page.getByRole('navigation', { name: 'Step actions' });
  await expect(bar.getByRole('button', { name: 'Report a problem' })).toBeVisible();
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow).toBeLessThanOrEqual(0);
  // Touch targets at the bench: at least 48 × 48 px (our design rule).
  for (const button of await bar.getByRole('button').all()) {
    const box = await button.boundingBox();
    if (box) expect(Math.min(box.width, box.height)).toBeGreaterThanOrEqual(48);
  }
  await page.screenshot({ path: `${SCREENSHOTS}tablet-portrait.png` });
});
