import { expect, test } from '@playwright/test';

import { apiAs } from '../fixtures/api';
import { DEMO_PASSWORD, demoName, SCREENSHOTS } from '../fixtures/demo';
import { completeEveryStep, planTouchStripRun } from '../fixtures/runs';
import { signIn } from '../fixtures/sign-in';

test('when quality filters the queue and dispositions an operator’s deviation, then the run is signed off with a signature shown on its record, and the trend shows its spec', async ({ page }) => {
  // A fresh run: the operator reports a problem on it, then finishes every step, as the tablet would.
  const run = await planTouchStripRun();
  const { api, post } = await apiAs('operator');
  const stamp = `mark${Date.now()}`;
  const title = `Smudge on key 2, ${stamp}`;
  await post(`/api/runs/${run.id}/problems`, { description: title, severity: 'minor', pieceIds: [] });
  await api.dispose();
  await completeEveryStep(run.id);

  await signIn(page, 'quality');

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

  // The overview lists the finished run as awaiting sign-off, every deviation decided; its record opens from there.
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Deviations' }).click();
  await page.getByRole('link', { name: /Quality overview/ }).click();
  const awaiting = page.getByRole('region', { name: 'Runs awaiting sign-off' });
  const row = awaiting.getByRole('row').filter({ has: page.getByRole('link', { name: run.code, exact: true }) });
  await expect(row.getByText('All decided')).toBeVisible();
  await row.getByRole('link', { name: run.code, exact: true }).click();
  await expect(page.getByRole('heading', { level: 1, name: `Run ${run.code}` })).toBeVisible();

  // Sign-off: the password again, then the record shows the signature's name, date and time, and meaning.
  const signOff = page.getByRole('region', { name: 'Quality sign-off' });
  await signOff.getByRole('button', { name: 'Sign off run…' }).click();
  const signDialog = page.getByRole('dialog', { name: `Sign off run ${run.code}` });
  await signDialog.getByLabel('Your password').fill(DEMO_PASSWORD);
  await signDialog.getByRole('button', { name: 'Sign off run' }).click();
  await expect(signDialog).toBeHidden();
  const manifest = signOff.getByRole('definition');
  await expect(manifest.filter({ hasText: demoName('quality') })).toHaveCount(1);
  await expect(manifest.filter({ hasText: 'run record approved' })).toHaveCount(1);
  await expect(manifest.filter({ hasText: /^\d{4}-\d\d-\d\d \d\d:\d\d/ })).toHaveCount(1);
  await expect(page.getByText('Closed', { exact: true }).first()).toBeVisible();
  await page.screenshot({ path: `${SCREENSHOTS}quality-04-signed-off.png`, fullPage: true });

  // The server holds one sign-off of this run, and the run is closed.
  const { api: quality } = await apiAs('quality');
  const view = (await (await quality.get(`/api/runs/${run.id}/sign-off`)).json()) as { runState: string; signature: { signedBy: string; meaning: string } | null };
  await quality.dispose();
  expect(view).toMatchObject({ runState: 'closed', signature: { signedBy: demoName('quality'), meaning: 'run record approved' } });

  // The trend of a reading spec of the same recipe, with its capability figures.
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Trends' }).click();
  await page.getByLabel('Reading spec').selectOption({ index: 1 });
  await expect(page.getByRole('heading', { name: 'Capability' })).toBeVisible();
  await expect(page.getByText(/Provisional/).first()).toBeVisible();
  await page.screenshot({ path: `${SCREENSHOTS}quality-03-trend.png`, fullPage: true });
});
