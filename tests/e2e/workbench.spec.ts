import { readFile } from 'node:fs/promises';
import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Browser, type Page } from '@playwright/test';
import { closeDb } from '../support/db';
import { DEMO_PASSWORD } from '../support/http';
import { demoSiteUser, pdfText } from './workbench-support';

test.describe.configure({ timeout: 120_000 });
test.afterAll(closeDb);

async function signedInPage(browser: Browser, email: string): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 768, height: 1024 }, hasTouch: true, acceptDownloads: true });
  const page = await context.newPage();
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeVisible();
  return page;
}

/** Open a new sheet and wait until this device has the edition in force (its first sync). */
async function newSheet(page: Page, kind: string) {
  await page.goto(`/sheets/new?kind=${kind}`);
  await expect(page.getByText('This device has no reference edition yet')).toHaveCount(0, { timeout: 20_000 });
}

async function noSeriousViolations(page: Page) {
  const results = await new AxeBuilder({ page }).analyze();
  const serious = results.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  expect(serious.map((v) => `${v.id}: ${v.help} — ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
}

test('a cycle sheet: override with a reason, solve for an electron affinity, switch convention, save, submit, signed off by another supervisor, PDF', async ({ browser }) => {
  const stamp = Date.now().toString(36);
  const title = `CaCl2 brine feed check ${stamp}`;
  const lot = `CR-${stamp}`;
  const tech = await signedInPage(browser, await demoSiteUser('technician', 'Workbench dissolver technician'));
  await newSheet(tech, 'cycle');
  await tech.getByLabel('Title').fill(title);
  await tech.getByLabel('Formula of the salt').fill('CaCl2');
  const result = tech.getByTestId('result-value');
  await expect(result).toContainText('kJ/mol');
  await expect(tech.getByTestId('ladder')).toBeVisible();

  // Override the first ionization energy of Ca: the reason is asked for, inline, at that step.
  await tech.getByRole('button', { name: 'Override First ionization energy of Ca' }).click();
  const ie = tech.getByRole('group', { name: 'Override for First ionization energy of Ca' });
  await ie.getByLabel(/^Value/).fill('589.9');
  await expect(ie.getByRole('alert')).toContainText('Give the reason');
  await tech.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(tech.getByRole('alert').filter({ hasText: 'every override needs its reason' })).toBeVisible();
  await expect(ie.getByLabel(/^Value/)).toHaveValue('589.9');
  await ie.getByLabel('Reason for the override').fill('Rechecked against the spectroscopic table');
  await expect(ie.getByRole('alert')).toHaveCount(0);

  // Solve for the electron affinity: the lattice value is now needed, and asked for where it goes.
  await tech.getByLabel('Solve for').selectOption({ label: 'First electron-gain enthalpy of Cl (electron affinity)' });
  const lattice = tech.getByRole('group', { name: 'Value for Lattice enthalpy of CaCl2' });
  await expect(lattice.getByRole('alert')).toContainText('No value for “Lattice enthalpy of CaCl2”');
  await lattice.getByLabel(/^Value/).fill('2258');
  await lattice.getByLabel('Source of this value').fill('QC lab handbook check value');
  await expect(tech.getByText('Electron affinity (the opposite sign)')).toBeVisible();
  // First electron-gain enthalpy of Cl is negative (about −349 kJ/mol — from memory)
  await expect(result).toHaveText(/^−3\d\d(\.\d+)?( ± [\d.]+)? kJ\/mol$/);
  const egText = await result.textContent();

  // The lattice sign convention: the typed lattice value keeps its meaning, the answer stays the same.
  await tech.getByText('Formation (−)').click();
  await expect(lattice.getByLabel(/^Value/)).toHaveValue('-2258');
  await expect(result).toHaveText(egText!);
  await expect(tech.getByText('Lattice enthalpy (formation): −2258')).toBeVisible();
  await expect(tech.locator('[data-step="lattice_enthalpy:CaCl2"][data-direction="down"]')).toBeVisible();

  await tech.getByLabel('Lot or batch reference').fill(lot);
  await tech.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(tech).toHaveURL(/\/sheets\/open\?id=[0-9a-f-]{36}$/);
  await expect(tech.getByRole('heading', { level: 1, name: title })).toBeVisible();
  await expect(tech.getByRole('group', { name: 'Value for Lattice enthalpy of CaCl2' }).getByLabel('Source of this value')).toHaveValue('QC lab handbook check value');

  // Find it in the list, open it and submit it.
  await tech.goto('/sheets');
  await tech.getByRole('searchbox', { name: 'Search' }).fill(stamp);
  await expect(tech.getByRole('row')).toHaveCount(2);
  await tech.getByRole('link', { name: title }).click();
  await tech.getByRole('button', { name: 'Submit for sign-off' }).click();
  await expect(tech.getByTestId('sheet-status')).toHaveText('Submitted');
  await expect(tech.getByTestId('sync-state')).toHaveText('synced', { timeout: 30_000 });
  // A technician cannot sign off.
  await expect(tech.getByRole('button', { name: 'Sign off' })).toBeDisabled();

  // A supervisor other than the author signs it off on their own device.
  const sup = await signedInPage(browser, await demoSiteUser('supervisor', 'Workbench QC supervisor'));
  await sup.goto('/sheets');
  await sup.getByRole('searchbox', { name: 'Search' }).fill(stamp);
  await expect(sup.getByRole('link', { name: title })).toBeVisible({ timeout: 30_000 });
  await sup.getByLabel('Status').selectOption({ label: 'Submitted' });
  await sup.getByRole('link', { name: title }).click();
  await sup.getByRole('button', { name: 'Sign off' }).click();
  await expect(sup.getByTestId('sheet-status')).toHaveText('Signed off');
  await expect(sup.getByTestId('sync-state')).toHaveText('synced', { timeout: 30_000 });
  await expect(sup.getByRole('button', { name: 'Save', exact: true })).toHaveCount(0);
  await expect(sup.getByText('signed off and locked')).toBeVisible();
  await expect(sup.getByRole('heading', { name: 'Bench entries' })).toBeVisible();
  await noSeriousViolations(sup);

  // The PDF record, read back as text.
  const [download] = await Promise.all([sup.waitForEvent('download'), sup.getByRole('button', { name: 'Export PDF' }).click()]);
  const text = await pdfText(await readFile((await download.path())!));
  for (const want of [title, lot, 'First ionization energy of Ca', 'OVERRIDE', 'Rechecked against the spectroscopic table', 'QC lab handbook check value', 'First electron-gain enthalpy of Cl', 'Convention:', 'formation', 'Basis:', 'Ladder', 'Model check', 'Signed off by Workbench QC supervisor']) {
    expect(text).toContain(want);
  }

  // The author's device learns of the sign-off and locks the sheet too.
  await tech.reload();
  await expect(tech.getByTestId('sheet-status')).toHaveText('Signed off', { timeout: 30_000 });
  // A later change starts a new sheet version linked to the signed-off one.
  const signedUrl = tech.url();
  await tech.getByRole('button', { name: 'Start a new version' }).click();
  await expect(tech.getByText('sheet version 2')).toBeVisible();
  await expect(tech.getByTestId('sheet-status')).toHaveText('Draft');
  expect(tech.url()).not.toBe(signedUrl);
  await expect(tech.getByRole('link', { name: 'open the signed-off version' })).toHaveAttribute('href', new URL(signedUrl).pathname + new URL(signedUrl).search);
  await tech.context().close();
  await sup.context().close();
});

test('a new sheet of any kind starts without error messages; a wrong formula then names what is wrong', async ({ browser }) => {
  const page = await signedInPage(browser, await demoSiteUser('technician', 'Workbench new-sheet technician'));
  await newSheet(page, 'cycle');
  await expect(page.getByText('Not solved yet — type the formula of the salt to begin.')).toBeVisible();
  await expect(page.getByRole('main').getByRole('alert')).toHaveCount(0);
  await expect(page.getByLabel('Formula of the salt')).not.toHaveAttribute('aria-invalid', 'true');
  await page.getByLabel('Formula of the salt').fill('Qq2');
  await expect(page.getByRole('main').getByRole('alert').first()).toBeVisible();
  await expect(page.getByLabel('Formula of the salt')).toHaveAttribute('aria-invalid', 'true');
  await newSheet(page, 'dissolution');
  await expect(page.getByText('Not solved yet — type the formula of the salt to begin.')).toBeVisible();
  await expect(page.getByLabel('Salt (anhydrous or a hydrate)')).not.toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByRole('main').getByRole('alert')).toHaveCount(0);
  await newSheet(page, 'reaction');
  await expect(page.getByText('Not solved yet — write the reaction to begin.')).toBeVisible();
  await expect(page.getByRole('main').getByRole('alert')).toHaveCount(0);
  await newSheet(page, 'calorimetry');
  await expect(page.getByText('Not solved yet — fill in the run above to begin.')).toBeVisible();
  await expect(page.getByRole('main').getByRole('alert')).toHaveCount(0);
  await page.context().close();
});

test('the author of a sheet cannot sign it off, even as a supervisor', async ({ browser }) => {
  const page = await signedInPage(browser, await demoSiteUser('supervisor', 'Workbench shift supervisor'));
  await newSheet(page, 'cycle');
  await page.getByLabel('Title').fill(`KBr own sheet ${Date.now().toString(36)}`);
  await page.getByLabel('Formula of the salt').fill('KBr');
  await expect(page.getByTestId('result-value')).toContainText('kJ/mol');
  await page.getByRole('button', { name: 'Submit for sign-off' }).click();
  await expect(page.getByTestId('sheet-status')).toHaveText('Submitted');
  await expect(page.getByRole('button', { name: 'Sign off' })).toBeDisabled();
  await expect(page.getByTestId('signoff-why')).toHaveText('You wrote this sheet: a supervisor other than its author signs it off.');
  await page.context().close();
});

test('an unbalanced reaction is refused naming the element, and the typed reaction is kept', async ({ browser }) => {
  const page = await signedInPage(browser, await demoSiteUser('technician', 'Workbench technician'));
  await newSheet(page, 'reaction');
  const reaction = 'CaO(cr) + HCl(aq) -> CaCl2(aq) + H2O(l)';
  await page.getByLabel('Reaction', { exact: true }).fill(reaction);
  await expect(page.getByRole('alert').filter({ hasText: 'does not balance' })).toContainText(/^(Cl|H) does not balance/);
  await expect(page.getByLabel('Reaction', { exact: true })).toHaveValue(reaction);
  await page.getByLabel('Reaction', { exact: true }).fill('CaO(cr) + 2 HCl(aq) -> CaCl2(aq) + H2O(l)');
  await expect(page.getByTestId('result-value')).toContainText('kJ/mol');
  await page.context().close();
});

test('a calorimetry sheet names the hexahydrate for an endothermic run', async ({ browser }) => {
  const page = await signedInPage(browser, await demoSiteUser('technician', 'Workbench QC technician'));
  await newSheet(page, 'calorimetry');
  // An invented run: 10.954 g (0.0500 mol of CaCl2·6H2O, 219.07 g/mol) into 100 g of water, 25.00 → 23.50 °C.
  // Over (110.954 g × 4.184 J/(g·K)) that is +13.9 kJ/mol absorbed, near the hexahydrate and far from CaCl2 (about −81).
  await page.getByLabel('Salt the lot should be').fill('CaCl2');
  await page.getByLabel('Sample mass (g)').fill('10.954');
  await page.getByLabel('Water mass (g)').fill('100');
  await page.getByLabel('Temperature before mixing (°C)').fill('25.00');
  await page.getByLabel('Temperature after mixing (°C)').fill('23.50');
  await expect(page.getByTestId('verdict')).toContainText('CaCl2·6H2O');
  await noSeriousViolations(page);
  await page.context().close();
});

test('the main screens have no serious or critical accessibility problems', async ({ browser }) => {
  const page = await signedInPage(browser, await demoSiteUser('technician', 'Workbench technician'));
  await page.goto('/sheets');
  await expect(page.getByRole('heading', { level: 1, name: 'Sheets' })).toBeVisible();
  await noSeriousViolations(page);

  await newSheet(page, 'cycle');
  await page.getByLabel('Formula of the salt').fill('MgCl2');
  await expect(page.getByTestId('ladder')).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Model check' })).toBeVisible();
  await noSeriousViolations(page);

  await newSheet(page, 'dissolution');
  await page.getByLabel('Salt (anhydrous or a hydrate)').fill('CaCl2');
  await expect(page.getByTestId('final-temperature')).toContainText('°C');
  // The cautions sit beside the batch-heat numbers.
  await expect(page.getByRole('complementary', { name: 'Cautions' })).toContainText('upper bound');
  await noSeriousViolations(page);

  // Bad input: a formula that is not a binary ionic compound is named at the formula, and kept.
  await newSheet(page, 'cycle');
  await page.getByLabel('Formula of the salt').fill('CH4');
  await expect(page.getByRole('alert').first()).toBeVisible();
  await expect(page.getByLabel('Formula of the salt')).toHaveValue('CH4');
  await page.context().close();
});

test('the list duplicates a sheet and deletes the copy (a tombstone); the unit is the user’s choice', async ({ browser }) => {
  const page = await signedInPage(browser, await demoSiteUser('technician', 'Workbench technician'));
  const stamp = Date.now().toString(36);
  await newSheet(page, 'cycle');
  await page.getByLabel('Title').fill(`LiCl list check ${stamp}`);
  await page.getByLabel('Formula of the salt').fill('LiCl');
  await expect(page.getByTestId('result-value')).toContainText('kJ/mol');
  await page.getByText('kcal/mol', { exact: true }).click();
  await expect(page.getByTestId('result-value')).toContainText('kcal/mol');
  await page.getByText('kJ/mol', { exact: true }).click();
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(page).toHaveURL(/\/sheets\/open\?id=/);

  await page.goto('/sheets');
  await page.getByRole('searchbox', { name: 'Search' }).fill(stamp);
  await expect(page.getByRole('link', { name: `LiCl list check ${stamp}`, exact: true })).toBeVisible();
  await page.getByRole('button', { name: `Duplicate LiCl list check ${stamp}` }).click();
  await expect(page.getByRole('link', { name: `LiCl list check ${stamp} (copy)` })).toBeVisible();
  page.once('dialog', (d) => void d.accept());
  await page.getByRole('button', { name: `Delete LiCl list check ${stamp} (copy)` }).click();
  await expect(page.getByRole('link', { name: `LiCl list check ${stamp} (copy)` })).toHaveCount(0);
  await expect(page.getByRole('link', { name: `LiCl list check ${stamp}`, exact: true })).toBeVisible();
  // Filters: a lattice-cycle filter keeps it, a calorimetry filter hides it.
  await page.getByLabel('Type').selectOption({ label: 'Calorimetry run' });
  await expect(page.getByText('No sheet matches the search and filters.')).toBeVisible();
  await page.getByLabel('Type').selectOption({ label: 'Lattice cycle' });
  await expect(page.getByRole('link', { name: `LiCl list check ${stamp}`, exact: true })).toBeVisible();
  await page.context().close();
});
