import AxeBuilder from '@axe-core/playwright';
import { expect, test } from '@playwright/test';
import { DEMO, DEMO_PASSWORD, waitForMail } from '../support/http';

test('the e-mailed sign-in link arrives in the local capture and signs the user in', async ({ page }) => {
  const since = Date.now() - 1000;
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(DEMO.qcTechnician);
  await page.getByRole('button', { name: 'E-mail me a sign-in link instead' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'sign-in link is on its way' })).toBeVisible();
  const mail = await waitForMail(DEMO.qcTechnician, 'sign-in link', since);
  const link = /https?:\/\/\S+/.exec(mail.text)![0];
  await page.goto(link);
  await page.getByRole('button', { name: 'Sign in to Rungbook' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Calder Reach Works' })).toBeVisible();
  await expect(page.getByText('Signed in as QC lab technician (technician)')).toBeVisible();

  // the same link a second time is refused plainly
  await page.context().clearCookies();
  await page.goto(link);
  await page.getByRole('button', { name: 'Sign in to Rungbook' }).click();
  await expect(page.getByRole('alert').filter({ hasText: 'already been used' })).toBeVisible();
});

test('a wrong password shows the generic message and keeps what was typed', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(DEMO.supervisor);
  await page.getByLabel('Password').fill('not the password');
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByRole('alert').filter({ hasText: /\S/ })).toHaveText('The e-mail or password is not right.');
  await expect(page.getByLabel('E-mail')).toHaveValue(DEMO.supervisor);
});

test('an admin signs in, reaches Admin and the page has no serious accessibility problems', async ({ page }) => {
  await page.goto('/admin');
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fadmin/);
  await page.getByLabel('E-mail').fill(DEMO.admin);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByRole('heading', { name: 'Admin' })).toBeVisible();
  await expect(page.getByRole('cell', { name: DEMO.technician, exact: true })).toBeVisible();
  const results = await new AxeBuilder({ page }).analyze();
  const serious = results.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  expect(serious.map((v) => `${v.id}: ${v.help}`)).toEqual([]);
});

test('a technician does not see Admin or Reconcile and is turned away from them', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(DEMO.technician);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sheets' })).toBeVisible();
  await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Admin' })).toHaveCount(0);
  await page.goto('/admin');
  await expect(page.getByRole('heading', { name: 'Not allowed for your role' })).toBeVisible();
});

test('an admin invites a new account; the invitee sets a password from the e-mailed link (mismatch named first) and signs in', async ({ page, browser }) => {
  const invitee = `new.technician.${Date.now()}@calder-reach.test`;
  const since = Date.now() - 1000;
  await page.goto('/sign-in?next=%2Fadmin');
  await page.getByLabel('E-mail').fill(DEMO.admin);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByRole('heading', { name: 'Admin' })).toBeVisible();
  // A bad address is named at the field, and nothing is sent.
  await page.getByLabel('E-mail').fill('not an address');
  await page.getByLabel('Name or role account').fill('Second-shift technician');
  await page.getByRole('button', { name: 'Invite', exact: true }).click();
  await expect(page.getByLabel('E-mail')).toHaveAttribute('aria-invalid', 'true');
  await page.getByLabel('E-mail').fill(invitee);
  await page.getByRole('button', { name: 'Invite', exact: true }).click();
  await expect(page.getByRole('cell', { name: invitee, exact: true })).toBeVisible();

  const mail = await waitForMail(invitee, 'invited to Rungbook', since);
  const link = /https?:\/\/\S+/.exec(mail.text)![0];
  const context = await browser.newContext();
  const guest = await context.newPage();
  await guest.goto(link);
  await guest.getByLabel('New password (at least 10 characters)').fill('a-long-new-password');
  await guest.getByLabel('The same password again').fill('a-different-password');
  await guest.getByRole('button', { name: 'Set password' }).click();
  await expect(guest.getByLabel('The same password again')).toHaveAttribute('aria-invalid', 'true');
  await expect(guest.getByText('The two passwords differ')).toBeVisible();
  await guest.getByLabel('The same password again').fill('a-long-new-password');
  await guest.getByRole('button', { name: 'Set password' }).click();
  await expect(guest.getByRole('status').filter({ hasText: `Your password is set for ${invitee}` })).toBeVisible();
  await guest.getByRole('link', { name: 'Sign in' }).click();
  await guest.getByLabel('E-mail').fill(invitee);
  await guest.getByLabel('Password').fill('a-long-new-password');
  await guest.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(guest.getByText('Signed in as Second-shift technician (technician)')).toBeVisible();
  await context.close();
});

test('an admin makes an API token: a missing name is named at its field; the token is shown once, works on the API, and can be revoked', async ({ page }) => {
  await page.goto('/sign-in?next=%2Fadmin');
  await page.getByLabel('E-mail').fill(DEMO.admin);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByRole('heading', { name: 'Admin' })).toBeVisible();
  await page.getByRole('button', { name: 'Create token' }).click();
  await expect(page.getByLabel('Token name')).toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByTestId('new-token')).toHaveCount(0);
  const name = `Lab balance feed ${Date.now()}`;
  await page.getByLabel('Token name').fill(name);
  await page.getByRole('button', { name: 'Create token' }).click();
  const secret = (await page.getByTestId('new-token').textContent())!.trim();
  expect(secret).toMatch(/^rbt_/);
  await expect(page.getByLabel('Token name')).not.toHaveAttribute('aria-invalid', 'true');
  const asToken = () => page.request.get('/api/v1/editions/current', { headers: { authorization: `Bearer ${secret}` } });
  expect((await asToken()).status()).toBe(200);
  await page.getByRole('button', { name: `Revoke ${name}` }).click();
  await expect(page.getByRole('listitem').filter({ hasText: name }).getByText('revoked')).toBeVisible();
  expect((await asToken()).status()).toBe(401);
});
