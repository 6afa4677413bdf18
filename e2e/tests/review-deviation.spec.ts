import { expect, test } from '@playwright/test';

import { apiAs } from '../fixtures/api';
import { DEMO_PASSWORD, demoEmail, SCREENSHOTS } from '../fixtures/demo';

test('when quality filters the queue and opens an operator’s deviation, then it is dispositioned with a signature, and the trend shows its spec', async ({ page }) => {
  // An operator reports a problem on the demo run, as the tablet would.
  const { api, post } = await apiAs('operator');
  const { runs } = (await (await api.get('/api/runs')).json()) as { runs: Array<{ id: number; code: string }> };
  const run = runs[runs.length - 1];
  if (!run) throw new Error('the demo lab seeds a run');
  const stamp = `mark${Date.now()}`;
  const title = `Smudge on key 2, ${stamp}`;
  await post(`/api/runs/${run.id}/problems`, { description: title, severity: 'minor', pieceIds: [] });
  await api.dispose();

  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(demoEmail('quality'));
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { name: /Welcome/ })).toBeVisible();

  // The queue, filtered to minor deviations and the reported text.
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Deviations' }).click();
  await page.getByRole('button', { name: /Minor/ }).click();
  await page.getByLabel('Search text').fill(stamp);
  await page.getByRole('button', { name: 'Show deviations' }).click();
  await expect(page).toHaveURL(/severity=minor/);
  await expect(page.getByText('Deviations 1–1 of 1')).toBeVisible();
  await page.getByRole('table').getByRole('link', { name: 'Problem reported' }).click();
  await expect(page.getByText(title).first()).toBeVisible();
  await page.screenshot({ path: `${SCREENSHOTS}quality-01-deviation.png`, fullPage: true });

  // Disposition "use as is" with a rationale, signed with the password.
  await page.getByRole('radio', { name: /Use as is/ }).check();
  await page.getByLabel('Rationale').fill('Cosmetic mark outside the sensing area; function unaffected.');
  await page.getByRole('button', { name: 'Sign disposition…' }).click();
  const dialog = page.getByRole('dialog');
  await dialog.getByLabel('Your password').fill(DEMO_PASSWORD);
  await dialog.getByRole('button', { name: 'Sign disposition' }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByText('Dispositioned', { exact: true }).first()).toBeVisible();
  await expect(page.getByText(/Cosmetic mark outside the sensing area/).first()).toBeVisible();
  await page.screenshot({ path: `${SCREENSHOTS}quality-02-dispositioned.png`, fullPage: true });

  // The trend of a reading spec of the same recipe, with its capability figures.
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Trends' }).click();
  await page.getByLabel('Reading spec').selectOption({ index: 1 });
  await expect(page.getByRole('heading', { name: 'Capability' })).toBeVisible();
  await expect(page.getByText(/Provisional/).first()).toBeVisible();
  await page.screenshot({ path: `${SCREENSHOTS}quality-03-trend.png`, fullPage: true });
});
