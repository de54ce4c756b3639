import AxeBuilder from '@axe-core/playwright';
import { expect, type Page, test } from '@playwright/test';
import { STARTER_EDITION_VALUES } from '../../db/seed/starter-edition';
import { closeDb, makeSite } from '../support/db';
import { DEMO, DEMO_PASSWORD } from '../support/http';
import { test as pwaTest, waitForControllingWorker, waitForStoredPages } from './pwa-support';

const HEADER = 'action,species,phase,charge,property,coordination,value,std_uncertainty,unit,structure,hydration_scale,source,from_memory,note';

async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeVisible();
}

async function expectNoSeriousA11yIssues(page: Page) {
  const results = await new AxeBuilder({ page }).analyze();
  const serious = results.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  expect(serious.map((v) => `${v.id}: ${v.help} — ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join(' | ')}`)).toEqual([]);
}

test.afterAll(closeDb);

test('a technician browses the edition in force: search, filter, sort, pages, and one value’s history', async ({ page }) => {
  await signIn(page, DEMO.technician);
  await page.goto('/reference');
  await expect(page.getByText('No. 2', { exact: true })).toBeVisible();
  const count = page.getByRole('status').filter({ hasText: 'values' });
  await expect(count).toHaveText(`${STARTER_EDITION_VALUES.length} of ${STARTER_EDITION_VALUES.length} values`);
  await expectNoSeriousA11yIssues(page);

  await page.getByLabel('Search').fill('CaCl2 formation');
  // CaCl2, CaCl2·2H2O and CaCl2·6H2O each have one enthalpy of formation in the starter edition.
  await expect(count).toHaveText(`3 of ${STARTER_EDITION_VALUES.length} values`);
  await page.getByLabel('Search').fill('');

  await page.getByLabel('Property').selectOption('ionic_radius');
  await page.getByLabel('Species starts with').fill('Ca2');
  // Ca2+ has radii for CN 6 and CN 8 in the starter edition (Shannon 1976).
  await expect(count).toHaveText(`2 of ${STARTER_EDITION_VALUES.length} values`);
  await page.getByRole('button', { name: /^Value/ }).click();
  const firstValue = page.getByRole('table', { name: /Values of edition No\. 2/ }).getByRole('row').nth(1);
  await expect(firstValue).toContainText('100');
  await page.getByRole('button', { name: /^Value/ }).click();
  await expect(firstValue).toContainText('112');

  await page.getByLabel('Property').selectOption('');
  await page.getByLabel('Species starts with').fill('');
  await expect(page.getByText(/Page 1 of \d+/)).toBeVisible();
  await page.getByRole('button', { name: 'Next page' }).click();
  await expect(page.getByText(/Page 2 of \d+/)).toBeVisible();

  await page.getByLabel('Search').fill('Li ionization_energy_1');
  await page.getByRole('link', { name: /History of Li \(g\) First ionization energy/ }).click();
  await expect(page.getByRole('heading', { name: /History: Li \(g\)/ })).toBeVisible();
  const rows = page.getByRole('table', { name: 'The value in each edition' }).getByRole('row');
  await expect(rows.filter({ hasText: 'No. 1' })).toContainText('520 kJ/mol');
  await expect(rows.filter({ hasText: 'No. 2' })).toContainText('520.2 kJ/mol');
});

test('a draft is made, filled from a CSV (a bad file changes nothing), submitted, and approved by a supervisor', async ({ page, browser }) => {
  const site = await makeSite('ed-e2e');
  await signIn(page, site.users.technician.email, site.password);
  await page.goto('/editions');
  await expectNoSeriousA11yIssues(page);
  await page.getByRole('button', { name: 'Start a new draft' }).click();
  await expect(page.getByRole('heading', { name: 'Edition No. 1' })).toBeVisible();
  await expect(page.getByText('Draft', { exact: true })).toBeVisible();

  const file = page.getByLabel('CSV file');
  const bad = [HEADER, 'set,CaO,cr,0,enthalpy_of_formation,,-634.9,,kJ/mol,,,CRC section 5,no,', 'set,CaO,cr,0,enthalpy_of_formation,,"-634,9",,kJ/mol,,,,no,'].join('\n');
  await file.setInputFiles({ name: 'bad.csv', mimeType: 'text/csv', buffer: Buffer.from(bad) });
  await page.getByRole('button', { name: 'Preview the changes' }).click();
  const errors = page.getByRole('table', { name: 'Errors by row and column' });
  await expect(errors.getByRole('row').filter({ hasText: 'value' })).toContainText('3');
  await expect(errors.getByRole('row').filter({ hasText: 'source' })).toContainText('3');

  const good = [
    HEADER,
    'set,CaO,cr,0,enthalpy_of_formation,,-634.9,,kJ/mol,,,CRC Handbook section 5,no,',
    'set,Ca,g,0,ionization_energy_1,,6.11315547,,eV,,,NIST ASD,no,',
    'set,O2-,g,-2,ionic_radius,6,1.40,,Å,,,Shannon 1976,no,',
  ].join('\n');
  await file.setInputFiles({ name: 'good.csv', mimeType: 'text/csv', buffer: Buffer.from('\ufeff' + good) });
  await page.getByRole('button', { name: 'Preview the changes' }).click();
  await expect(page.getByText('Preview (nothing applied yet):')).toBeVisible();
  await expect(page.getByText('3 added')).toBeVisible();
  await page.getByRole('button', { name: 'Apply 3 changes' }).click();
  await expect(page.getByText('Applied to the draft:')).toBeVisible();
  const values = page.getByRole('table', { name: 'Values of edition No. 1' });
  await expect(values.getByRole('row').filter({ hasText: 'O2-' })).toContainText('140 pm');
  await expect(values.getByRole('row').filter({ hasText: 'First ionization energy' })).toContainText('589.8'); // NIST ASD: Ca 6.11315547 eV = 589.83 kJ/mol

  await page.getByLabel(/What this edition changes/).fill('First edition of this site: CaO, Ca and the oxide radius.');
  await page.getByRole('button', { name: 'Save the summary' }).click();
  await expect(page.getByText('Summary saved.')).toBeVisible();
  await expectNoSeriousA11yIssues(page);
  await page.getByRole('button', { name: 'Submit edition No. 1 for review' }).click();
  await expect(page.getByText('Submitted for review')).toBeVisible();
  await expect(page.getByText('In review', { exact: true })).toBeVisible();
  const url = page.url();

  const supervisor = await browser.newContext({ viewport: { width: 768, height: 1024 }, hasTouch: true });
  const sp = await supervisor.newPage();
  await signIn(sp, site.users.supervisor.email, site.password);
  await sp.goto(url);
  await expect(sp.getByRole('heading', { name: 'Review' })).toBeVisible();
  await expectNoSeriousA11yIssues(sp);
  await sp.getByRole('button', { name: 'Send back to draft' }).click();
  await expect(sp.getByText(/give the author a reason/)).toBeVisible(); // the form refuses an empty reason
  await sp.getByRole('button', { name: 'Approve edition No. 1' }).click();
  await expect(sp.getByText(/now in force/)).toBeVisible();
  await expect(sp.getByText('In force', { exact: true })).toBeVisible();
  await sp.goto('/reference');
  await expect(sp.getByRole('status').filter({ hasText: 'values' })).toHaveText('3 of 3 values');
  await supervisor.close();
});

test('a draft is discarded in two steps (a stray tap does nothing) and stays listed as discarded', async ({ page }) => {
  const site = await makeSite('ed-discard');
  await signIn(page, site.users.technician.email, site.password);
  await page.goto('/editions');
  await page.getByRole('button', { name: 'Start a new draft' }).click();
  await expect(page.getByRole('heading', { name: 'Edition No. 1' })).toBeVisible();
  await page.getByLabel(/What this edition changes/).fill('A start that will be given up.');
  await page.getByRole('button', { name: 'Save the summary' }).click();
  await expect(page.getByText('Summary saved.')).toBeVisible();
  await page.getByRole('button', { name: 'Discard edition No. 1…' }).click();
  await page.getByRole('button', { name: 'Keep it' }).click();
  await expect(page.getByText('Draft', { exact: true })).toBeVisible();
  await page.getByRole('button', { name: 'Discard edition No. 1…' }).click();
  await page.getByRole('button', { name: 'Yes, discard edition No. 1' }).click();
  await expect(page.getByText(/Discarded: kept here, readable/)).toBeVisible();
  await expect(page.getByText('Discarded', { exact: true })).toBeVisible();
  await expect(page.getByRole('button', { name: /Submit edition No. 1/ })).toHaveCount(0);
  await page.goto('/editions');
  await expect(page.getByText('Discarded', { exact: true })).toBeVisible();
  await expectNoSeriousA11yIssues(page);
});

pwaTest('the Reference screen reads the device’s copy of the edition in force, so it works offline', async ({ page, context }) => {
  await signIn(page, DEMO.qcTechnician);
  await page.goto('/reference');
  await expect(page.getByText(/This device’s copy, downloaded/)).toBeVisible({ timeout: 20_000 });
  await waitForControllingWorker(page);
  await page.reload();
  await waitForStoredPages(page, ['/reference']);
  await context.setOffline(true);
  await page.reload();
  await expect(page.getByRole('heading', { level: 1, name: 'Reference' })).toBeVisible();
  await expect(page.getByText(/This device’s copy, downloaded/)).toBeVisible();
  await expect(page.getByRole('status').filter({ hasText: 'values' })).toHaveText(`${STARTER_EDITION_VALUES.length} of ${STARTER_EDITION_VALUES.length} values`);
  await page.getByLabel('Search').fill('Cl- hydration');
  await expect(page.getByRole('status').filter({ hasText: 'values' })).toHaveText(`1 of ${STARTER_EDITION_VALUES.length} values`);
  await context.setOffline(false);
});
