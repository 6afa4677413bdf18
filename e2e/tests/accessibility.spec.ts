import { expect, test, type Page } from '@playwright/test';

import { apiAs } from '../fixtures/api';
import { expectNoSeriousA11yViolations } from '../fixtures/axe';
import { demoName, demoPin } from '../fixtures/demo';
import { planTouchStripRun, touchStrip } from '../fixtures/runs';
import { signIn } from '../fixtures/sign-in';

const nav = (page: Page) => page.getByRole('navigation', { name: 'Main' });

test.describe('accessibility (axe, WCAG 2.2 A and AA)', () => {
  test('when nobody is signed in, then the sign-in page has no serious or critical problems', async ({ page }) => {
    await page.goto('/sign-in');
    await expect(page.getByRole('button', { name: 'Sign in' })).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'sign-in');
  });

  test('when an engineer works at the desk, then home, recipes, a draft in the builder, runs and materials have no serious or critical problems', async ({ page }) => {
    const { recipeId, latestId } = await touchStrip();
    await signIn(page, 'engineer');
    await expectNoSeriousA11yViolations(page, 'home');

    await nav(page).getByRole('link', { name: 'Recipes' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Recipes' })).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'recipes list');

    await page.goto(`/recipes/${recipeId}/versions/${latestId}`);
    await expect(page.getByRole('region', { name: 'Sequence' })).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'recipe builder (draft)');
    await page.getByRole('region', { name: 'Sequence' }).getByRole('button', { name: /^Step 1:/ }).click();
    await expect(page.getByLabel('Step title')).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'recipe builder (a step selected)');

    await nav(page).getByRole('link', { name: 'Runs' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Runs' })).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'run list');

    await nav(page).getByRole('link', { name: 'Materials' }).click();
    await expect(page).toHaveURL(/\/materials/);
    await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
    await expect(page.getByRole('table').first()).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'materials');
  });

  test('when quality reviews, then the dashboard, the deviation queue, a deviation, a trend, a run record and the audit log have no serious or critical problems', async ({ page }) => {
    const run = await planTouchStripRun();
    const { api, post } = await apiAs('operator');
    const { deviation } = (await post(`/api/runs/${run.id}/problems`, { description: 'Ink pooled at the corner stop', severity: 'minor' })) as { deviation: { id: number } };
    await api.dispose();
    await signIn(page, 'quality');

    await page.goto('/quality');
    await expect(page.getByRole('heading', { name: 'Runs awaiting sign-off' })).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'quality dashboard');

    await nav(page).getByRole('link', { name: 'Deviations' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Deviations' })).toBeVisible();
    await expect(page.getByRole('table')).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'deviations queue');

    await page.goto(`/deviations/${deviation.id}`);
    await expect(page.getByText('Ink pooled at the corner stop').first()).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'deviation detail');

    await nav(page).getByRole('link', { name: 'Trends' }).click();
    await page.getByLabel('Reading spec').selectOption({ index: 1 });
    await expect(page.getByRole('heading', { name: 'Capability' })).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'trends (a spec chosen)');

    await page.goto(`/runs/${run.id}`);
    await expect(page.getByRole('heading', { level: 1, name: `Run ${run.code}` })).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'run record');

    await nav(page).getByRole('link', { name: 'Audit log' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Audit log' })).toBeVisible();
    await expect(page.getByRole('table')).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'audit log');
  });

  test('when an admin manages people, then the people page has no serious or critical problems', async ({ page }) => {
    await signIn(page, 'admin');
    await nav(page).getByRole('link', { name: 'People' }).click();
    await expect(page.getByRole('button', { name: 'Invite a person' })).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'people');
  });

  test('when an operator switches in with a PIN on the tablet, then the PIN page and the run view have no serious or critical problems', async ({ page }) => {
    await page.setViewportSize({ width: 1280, height: 800 });
    const run = await planTouchStripRun();
    // A password sign-in makes the device trusted, so it offers PIN switching.
    await signIn(page, 'engineer');
    await page.goto('/pin');
    await expect(page.getByRole('heading', { name: 'Who is working here?' })).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'PIN switch (roster)');
    await page.getByRole('list', { name: 'People with a PIN' }).getByRole('button', { name: new RegExp(demoName('operator')) }).click();
    await expectNoSeriousA11yViolations(page, 'PIN switch (entry)');
    await page.getByLabel('PIN', { exact: true }).fill(demoPin('operator'));
    await page.getByRole('button', { name: `Switch to ${demoName('operator')}` }).click();
    await expect(page.getByRole('heading', { name: `Welcome, ${demoName('operator').split(' ')[0]}` })).toBeVisible();

    await page.goto(`/run/${run.id}`);
    await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
    await expect(page.getByRole('navigation', { name: 'Step actions' })).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'run view (tablet)');
    await page.getByRole('navigation', { name: 'Step actions' }).getByRole('button', { name: 'Report a problem' }).click();
    await expect(page.getByRole('dialog')).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'run view (report a problem)');
  });
});
