import { randomBytes } from 'node:crypto';

import { expect, test } from '@playwright/test';

import { firstLink, mailTo } from '../fixtures/captured-mail';
import { DEMO_PASSWORD, demoEmail, SCREENSHOTS } from '../fixtures/demo';

test('when an admin invites an engineer, then the engineer sets a password from the mail and signs in', async ({ page, browser }) => {
  const suffix = randomBytes(4).toString('hex');
  const email = `wren-${suffix}@larkspur-lab.example`;
  const name = `Wren Okonkwo-${suffix}`;

  // Arrange: the admin signs in.
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(demoEmail('admin'));
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { name: /Welcome/ })).toBeVisible();

  // Act: invite a process engineer from the People page.
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'People' }).click();
  await page.getByRole('button', { name: 'Invite a person' }).click();
  const form = page.locator('form').filter({ has: page.getByRole('button', { name: 'Send invitation' }) });
  await form.getByLabel('Name').fill(name);
  await form.getByLabel('E-mail').fill(email);
  await form.getByLabel('Role').selectOption('engineer');
  await form.getByRole('button', { name: 'Send invitation' }).click();
  const row = page.getByRole('row', { name: new RegExp(name) });
  await expect(row).toBeVisible();
  await expect(row.getByText('Invited')).toBeVisible();
  await page.screenshot({ path: `${SCREENSHOTS}invite-01-people.png`, fullPage: true });

  // The invitation arrives at the local SMTP fake with a one-time link.
  const mail = await mailTo(email);
  expect(mail.subject).toContain('invited');
  const link = firstLink(mail.text);

  // The engineer opens the link in their own browser and chooses a password.
  const engineerContext = await browser.newContext();
  const engineer = await engineerContext.newPage();
  await engineer.goto(link);
  await expect(engineer.getByText(email)).toBeVisible();
  await engineer.getByLabel('New password', { exact: true }).fill('solder-paste-4471');
  await engineer.getByLabel('New password again').fill('solder-paste-4471');
  await engineer.screenshot({ path: `${SCREENSHOTS}invite-02-set-password.png`, fullPage: true });
  await engineer.getByRole('button', { name: 'Set password and sign in' }).click();
  await expect(engineer.getByRole('heading', { name: 'Welcome, Wren' })).toBeVisible();

  // Assert: signing out and in again with the new password works; the link is spent.
  await engineer.getByRole('button', { name: 'Sign out' }).click();
  await engineer.getByLabel('E-mail').fill(email);
  await engineer.getByLabel('Password').fill('solder-paste-4471');
  await engineer.getByRole('button', { name: 'Sign in' }).click();
  await expect(engineer.getByRole('heading', { name: 'Welcome, Wren' })).toBeVisible();
  await expect(engineer.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'People' })).toHaveCount(0);
  await engineer.screenshot({ path: `${SCREENSHOTS}invite-03-engineer-home.png`, fullPage: true });
  await engineer.goto(link);
  await expect(engineer.getByText(/already been used/)).toBeVisible();
  await engineerContext.close();
});
