import { expect, test, type Page } from '@playwright/test';

import { apiAs } from '../fixtures/api';
import { DEMO_PASSWORD, demoEmail, SCREENSHOTS } from '../fixtures/demo';
import { expectVisibleFocus, tabTo } from '../fixtures/keyboard';
import { draftCopyOfTouchStrip, stepIdsOf } from '../fixtures/recipes';
import { planTouchStripRun, type RunStepRecord } from '../fixtures/runs';

/** The sign-in form, typed and sent from the keyboard. */
async function signInByKeyboard(page: Page, role: string) {
  await tabTo(page, page.getByLabel('E-mail'));
  await page.keyboard.type(demoEmail(role));
  await page.keyboard.press('Tab');
  await expect(page.getByLabel('Password')).toBeFocused();
  await page.keyboard.type(DEMO_PASSWORD);
  await page.keyboard.press('Enter');
}

test.describe('keyboard only', () => {
  test('when an engineer reorders steps with the keyboard in the builder, then the new order is saved', async ({ page }) => {
    const draft = await draftCopyOfTouchStrip();
    const [first, second, third, ...rest] = draft.stepIds;
    await page.goto('/sign-in');
    await signInByKeyboard(page, 'engineer');
    await expect(page.getByRole('heading', { name: /Welcome/ })).toBeVisible();
    await page.goto(`/recipes/${draft.recipeId}/versions/${draft.versionId}`);
    const sequence = page.getByRole('region', { name: 'Sequence' });
    await expect(sequence.getByRole('button', { name: /^Step 1: Wipe the PET sheet/ })).toBeVisible();

    // Tab to the first step's handle, pick it up with Space, carry it down two places, put it down.
    const handle = sequence.getByRole('button', { name: 'Move step 1, Wipe the PET sheet' });
    await tabTo(page, handle);
    await expectVisibleFocus(handle);
    await page.keyboard.press('Space');
    await expect(handle).toHaveAttribute('aria-pressed', 'true');
    await page.keyboard.press('ArrowDown');
    await expect(page.getByText('Step 1, Wipe the PET sheet would go to position 2 of 6.')).toBeAttached();
    await page.keyboard.press('ArrowDown');
    await expect(page.getByText('Step 1, Wipe the PET sheet would go to position 3 of 6.')).toBeAttached();
    await page.keyboard.press('Space');
    await expect(sequence.getByRole('button', { name: /^Step 3: Wipe the PET sheet/ })).toBeVisible();
    await expect(page.getByText('Unsaved changes')).toBeVisible();
    await page.screenshot({ path: `${SCREENSHOTS}keyboard-01-reordered.png`, fullPage: true });

    // Back up to Save and press it.
    const save = page.getByRole('button', { name: 'Save', exact: true });
    await tabTo(page, save, { backwards: true });
    await expectVisibleFocus(save);
    await page.keyboard.press('Enter');
    await expect(page.getByText('All changes saved')).toBeVisible();

    // The server holds the new order, and a reload shows it.
    expect(await stepIdsOf(draft.versionId)).toEqual([second, third, first, ...rest]);
    await page.reload();
    await expect(sequence.getByRole('button', { name: /^Step 3: Wipe the PET sheet/ })).toBeVisible();
  });

  test('when an operator works the tablet with the keyboard only, then a step is acknowledged, started and done', async ({ page }) => {
    await page.setViewportSize({ width: 1280, height: 800 });
    const run = await planTouchStripRun(1);
    const { api } = await apiAs('engineer');
    const planned = (await (await api.get(`/api/runs/${run.id}`)).json()) as { steps: RunStepRecord[]; safetyNotes: Record<string, unknown[]> };
    await api.dispose();
    const stepId = planned.steps[0]?.stepId ?? '';
    const hasCautions = (planned.safetyNotes[stepId] ?? []).length > 0;

    await page.goto(`/run/${run.id}`);
    await signInByKeyboard(page, 'operator');
    await expect(page).toHaveURL(new RegExp(`/run/${run.id}$`));
    await expect(page.getByRole('heading', { level: 1, name: 'Wipe the PET sheet' })).toBeVisible();

    if (hasCautions) {
      const acknowledge = page.getByRole('button', { name: 'I have read these cautions' });
      await tabTo(page, acknowledge);
      await expectVisibleFocus(acknowledge);
      await page.keyboard.press('Enter');
    }
    const start = page.getByRole('button', { name: 'Start step' });
    await expect(start).toBeEnabled();
    await tabTo(page, start);
    await expectVisibleFocus(start);
    await page.keyboard.press('Enter');

    const done = page.getByRole('button', { name: 'Step done' });
    await expect(done).toBeVisible();
    await tabTo(page, done);
    await expectVisibleFocus(done);
    await page.keyboard.press('Space');
    await expect(done).toBeHidden();

    // The server has the step done (the outbox sends it at once while online).
    const { api: quality } = await apiAs('quality');
    await expect
      .poll(async () => ((await (await quality.get(`/api/runs/${run.id}`)).json()) as { steps: RunStepRecord[] }).steps.find((s) => s.stepId === stepId)?.state)
      .toBe('done');
    await quality.dispose();
    await expect(page.getByRole('button', { name: 'All saved' })).toBeVisible();
    await page.screenshot({ path: `${SCREENSHOTS}keyboard-02-tablet-step-done.png` });
  });
});
