import { randomBytes } from 'node:crypto';

import { expect, test, type Locator, type Page } from '@playwright/test';

import { DEMO_PASSWORD, demoEmail, SCREENSHOTS } from '../fixtures/demo';

async function signIn(page: Page, role: string) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(demoEmail(role));
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { name: /Welcome/ })).toBeVisible();
}

/**
 * A real pointer drag (press, move in small steps, release) so dnd-kit's pointer sensor takes it.
 * The target is looked up once the drag has begun: the "drop here" zone only shows while carrying.
 */
async function drag(page: Page, from: Locator, to: Locator) {
  const a = await from.boundingBox();
  if (!a) throw new Error('drag source is not on screen');
  await page.mouse.move(a.x + a.width / 2, a.y + a.height / 2);
  await page.mouse.down();
  await page.mouse.move(a.x + a.width / 2 + 12, a.y + a.height / 2 + 12, { steps: 4 });
  await to.scrollIntoViewIfNeeded();
  const b = await to.boundingBox();
  if (!b) throw new Error('drop target is not on screen');
  await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2, { steps: 12 });
  await page.mouse.up();
}

const paletteItem = (page: Page, kind: string) => page.getByRole('button', { name: `Add ${kind} step` });
const dropZone = (page: Page) => page.getByText(/drag one here|Drop here to add at the end/);
const stepCard = (page: Page, n: number) => page.getByRole('region', { name: 'Sequence' }).getByRole('button', { name: new RegExp(`^Step ${n}:`) });

// A desk screen tall enough that palette and sequence share the view: a drag never needs a scroll.
test.use({ viewport: { width: 1440, height: 1200 } });

test('when an engineer builds a recipe with a cure too hot for the film, then it is blocked until fixed, and quality releases it with a signature', async ({ page, browser }) => {
  const code = `E2E-${randomBytes(3).toString('hex').toUpperCase()}`;
  await signIn(page, 'engineer');

  // A new recipe opens its first draft in the builder.
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Recipes' }).click();
  await page.getByRole('button', { name: 'New recipe' }).click();
  await page.getByLabel('Code').fill(code);
  await page.getByLabel('Name').fill('Four-step trace test strip');
  await page.getByLabel('Product').fill('Silver test strip on PET');
  await page.getByRole('button', { name: 'Create recipe' }).click();
  await expect(page.getByRole('heading', { name: 'Four-step trace test strip' })).toBeVisible();

  // Setup: the film and the printer (its loaded inks become the channel plan).
  const setup = page.getByRole('button', { name: /Setup/ });
  if ((await setup.getAttribute('aria-expanded')) === 'false') await setup.click();
  await page.getByLabel('Print substrate').selectOption({ label: 'Clear PET film, 125 µm, heat-stabilised' });
  await page.getByLabel('Printer').selectOption({ label: 'Bench printer North' });
  await setup.click();

  // Four steps, each dragged from the palette into the sequence.
  for (const [index, kind] of ['Print pass', 'Dry', 'Cure', 'Inspect'].entries()) {
    await drag(page, paletteItem(page, kind), dropZone(page));
    await expect(page.getByText(`${index + 1} step${index === 0 ? '' : 's'}`, { exact: true })).toBeVisible();
  }
  await expect(stepCard(page, 4)).toBeVisible();

  await stepCard(page, 1).click();
  await page.getByLabel('Step title').fill('Print the silver traces');
  await page.getByLabel('Ink', { exact: true }).selectOption({ label: 'Quillmere QS-30 nanosilver ink' });
  await page.getByLabel('Channel', { exact: true }).selectOption('Ag conductor');
  await page.getByLabel('Resolution (dpi)').fill('1270');
  await page.getByLabel('Passes').fill('2');

  await stepCard(page, 2).click();
  await page.getByLabel('Step title').fill('Dry between layers');
  await page.getByLabel('How').selectOption('hot-plate');
  await page.getByLabel('Temperature (°C)').fill('60');

  // A cure at 170 °C for 30 min: beyond what the PET film takes, even briefly.
  await stepCard(page, 3).click();
  await page.getByLabel('Step title').fill('Cure the silver');
  await page.getByLabel('Heat source').selectOption({ label: 'Convection oven O-1 (oven, up to 250 °C)' });
  await page.getByLabel('Temperature (°C)').fill('170');
  await page.getByLabel('Time at temperature (min)').fill('30');

  await stepCard(page, 4).click();
  await page.getByLabel('Step title').fill('Look at the traces');

  const attention = page.getByRole('list', { name: 'Checks that need attention' });
  const heatBlock = attention.getByRole('listitem').filter({ hasText: 'Blocked' }).filter({ hasText: /170 °C/ });
  await expect(heatBlock.first()).toBeVisible();
  await page.screenshot({ path: `${SCREENSHOTS}recipe-01-blocked.png`, fullPage: true });

  // Fix: 120 °C for 120 min stays at the film's continuous limit and still reaches the silver's cure.
  await stepCard(page, 3).click();
  await page.getByLabel('Temperature (°C)').fill('120');
  await page.getByLabel('Time at temperature (min)').fill('120');
  await expect(attention.getByRole('listitem').filter({ hasText: 'Blocked' })).toHaveCount(0);
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(page.getByText('All changes saved')).toBeVisible();
  await page.getByRole('button', { name: 'Send for review' }).click();
  await expect(page.getByText('In review').first()).toBeVisible();
  const versionUrl = page.url();
  await page.screenshot({ path: `${SCREENSHOTS}recipe-02-in-review.png`, fullPage: true });

  // Quality opens the same version and releases it with an e-signature.
  const qualityContext = await browser.newContext();
  const quality = await qualityContext.newPage();
  await signIn(quality, 'quality');
  await quality.goto(versionUrl);
  await quality.getByRole('button', { name: 'Release' }).click();
  const dialog = quality.getByRole('dialog');
  await expect(dialog.getByText('Approved for production')).toBeVisible();
  await dialog.getByLabel('Your password').fill('not-my-password');
  await dialog.getByRole('button', { name: 'Sign and release' }).click();
  await expect(dialog.getByText(/password/i).nth(1)).toBeVisible();
  await dialog.getByLabel('Your password').fill(DEMO_PASSWORD);
  await dialog.getByRole('button', { name: 'Sign and release' }).click();
  await expect(quality.getByText('Released').first()).toBeVisible();
  await quality.screenshot({ path: `${SCREENSHOTS}recipe-03-released.png`, fullPage: true });
  await qualityContext.close();
});
