// Workbench benchmark, against a running production build (BASE_URL), in Debian's Chromium:
//  1. input → commit: from the input event to React's commit of the updated result and ladder,
//     read from the page's performance marks (`workbench:input-to-commit`, components/sheets/
//     perf-marks.ts); target median ≤ 16 ms.
//  2. first-load JavaScript of the workbench route: the script responses of a fresh load (no HTTP
//     cache), gzipped here with zlib level 6; target ≤ 250 kB, printed beside the same figure for
//     `/offline` (the app's smallest page: root layout only, no data) for the ratio.
// Usage: BASE_URL=http://127.0.0.1:3105 tsx perf/workbench.bench.ts   (npm run perf wires it)
import { gzipSync } from 'node:zlib';
import { chromium, type Browser, type BrowserContext } from '@playwright/test';

const BASE_URL = process.env.BASE_URL ?? process.env.PUBLIC_URL ?? 'http://127.0.0.1:3000';
const EMAIL = 'technician@calder-reach.test';
const PASSWORD = 'calder-reach-demo';
const INPUTS = Number(process.env.BENCH_INPUTS ?? 120);
const TARGET_MEDIAN_MS = 16;
const TARGET_FIRST_LOAD_KB = 250;
const ARGS = ['--no-sandbox', '--disable-dev-shm-usage', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--no-default-browser-check'];

async function signIn(browser: Browser): Promise<BrowserContext> {
  const context = await browser.newContext({ baseURL: BASE_URL, viewport: { width: 768, height: 1024 }, serviceWorkers: 'block' });
  const page = await context.newPage();
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(EMAIL);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
  await page.close();
  return context;
}

const quantile = (xs: number[], q: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))] ?? NaN;
};

async function inputToCommit(context: BrowserContext) {
  const page = await context.newPage();
  await page.goto('/sheets/new?kind=cycle');
  await page.getByText('This device has no reference edition yet').waitFor({ state: 'detached', timeout: 30_000 }).catch(() => undefined);
  const formula = page.getByLabel('Formula of the salt');
  await formula.fill('CaCl2');
  await page.getByTestId('ladder').waitFor();
  await page.getByRole('button', { name: 'Override First ionization energy of Ca' }).click();
  const value = page.getByRole('group', { name: 'Override for First ionization energy of Ca' }).getByLabel(/^Value/);
  await page.evaluate(() => performance.clearMeasures('workbench:input-to-commit'));
  // Each fill is one input event that changes the cycle: the result and the ladder re-render.
  for (let i = 0; i < INPUTS; i += 1) {
    await value.fill(String(589 + (i % 40) / 10));
    await page.waitForFunction((n) => performance.getEntriesByName('workbench:input-to-commit').length >= n, i + 1);
  }
  const times = await page.evaluate(() => performance.getEntriesByName('workbench:input-to-commit').map((e) => e.duration));
  await page.close();
  return times;
}

async function firstLoadScripts(context: BrowserContext, path: string) {
  const fresh = await context.browser()!.newContext({ baseURL: BASE_URL, storageState: await context.storageState(), serviceWorkers: 'block' });
  const page = await fresh.newPage();
  const bodies: Promise<{ raw: number; gz: number }>[] = [];
  page.on('response', (r) => {
    if (r.request().resourceType() === 'script') bodies.push(r.body().then((b) => ({ raw: b.length, gz: gzipSync(b, { level: 6 }).length })).catch(() => ({ raw: 0, gz: 0 })));
  });
  await page.goto(path, { waitUntil: 'networkidle' });
  const sizes = await Promise.all(bodies);
  await fresh.close();
  return { files: sizes.length, rawKb: sizes.reduce((a, s) => a + s.raw, 0) / 1000, gzKb: sizes.reduce((a, s) => a + s.gz, 0) / 1000 };
}

const browser = await chromium.launch({ executablePath: process.env.CHROMIUM ?? '/usr/bin/chromium', args: ARGS });
try {
  const context = await signIn(browser);
  const times = await inputToCommit(context);
  const median = quantile(times, 0.5);
  console.log(`workbench input → commit (result and ladder), ${times.length} inputs: median ${median.toFixed(2)} ms, p95 ${quantile(times, 0.95).toFixed(2)} ms, max ${Math.max(...times).toFixed(2)} ms`);
  console.log(`  target median ≤ ${TARGET_MEDIAN_MS} ms: ratio ${(median / TARGET_MEDIAN_MS).toFixed(2)} — ${median <= TARGET_MEDIAN_MS ? 'met' : 'MISSED'}`);
  const wb = await firstLoadScripts(context, '/sheets/new?kind=cycle');
  const bare = await firstLoadScripts(context, '/offline');
  console.log(`first-load JavaScript, /sheets/new?kind=cycle: ${wb.gzKb.toFixed(1)} kB gzipped (${wb.rawKb.toFixed(1)} kB raw, ${wb.files} files)`);
  console.log(`first-load JavaScript, /offline (root layout only, the bare page): ${bare.gzKb.toFixed(1)} kB gzipped (${bare.rawKb.toFixed(1)} kB raw, ${bare.files} files)`);
  console.log(`  workbench / bare = ${(wb.gzKb / bare.gzKb).toFixed(2)}; target ≤ ${TARGET_FIRST_LOAD_KB} kB: ratio ${(wb.gzKb / TARGET_FIRST_LOAD_KB).toFixed(2)} — ${wb.gzKb <= TARGET_FIRST_LOAD_KB ? 'met' : 'MISSED'}`);
  await context.close();
} finally {
  await browser.close();
}
