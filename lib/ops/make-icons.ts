// Renders Rungbook's PNG icons from our SVG mark with Debian's chromium (through Playwright), so no
// image library is needed. Run `npx tsx lib/ops/make-icons.ts` after changing the mark; the PNGs are
// committed and served from public/icons/.
import { readFile, writeFile } from 'node:fs/promises';
import { chromium } from '@playwright/test';

const OUT = 'public/icons';
// Launcher, home-screen and store sizes across Android, desktop Chromium and iPadOS.
const ANY_SIZES = [48, 72, 96, 128, 144, 152, 192, 256, 384, 512];
const MASKABLE_SIZES = [192, 512];
const APPLE_TOUCH_SIZE = 180;

// Maskable icons are cropped to a circle (or squircle) of 80 % of the side by the launcher: fill
// the whole square with the ground colour and shrink the rails and rungs into that safe zone.
const maskable = `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 64 64">
  <rect width="64" height="64" fill="#1d554d"/>
  <g transform="translate(32 32) scale(0.72) translate(-32 -32)">
    <path d="M20 12v40M44 12v40" stroke="#f7f5f0" stroke-width="5" stroke-linecap="round"/>
    <path d="M20 20h24M20 32h24" stroke="#f7f5f0" stroke-width="4" stroke-linecap="round"/>
    <path d="M20 44h24" stroke="#e9a37f" stroke-width="4" stroke-linecap="round"/>
  </g>
</svg>`;

// iPadOS draws its own rounded corners and shows transparency as black: a square, opaque tile.
const appleTouch = maskable.replace('scale(0.72)', 'scale(0.86)');

async function main() {
  const mark = await readFile('app/icon.svg', 'utf8');
  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu'] });
  try {
    const page = await browser.newPage({ deviceScaleFactor: 1 });
    const render = async (svg: string, size: number, file: string, transparent: boolean) => {
      await page.setViewportSize({ width: size, height: size });
      const sized = svg.replace('<svg ', `<svg width="${size}" height="${size}" `);
      await page.setContent(`<!doctype html><html><body style="margin:0;background:transparent">${sized}</body></html>`);
      const png = await page.locator('svg').screenshot({ omitBackground: transparent, type: 'png' });
      await writeFile(`${OUT}/${file}`, png);
      console.log(`${OUT}/${file}`);
    };
    for (const size of ANY_SIZES) await render(mark, size, `rungbook-${size}.png`, true);
    for (const size of MASKABLE_SIZES) await render(maskable, size, `rungbook-maskable-${size}.png`, false);
    await render(appleTouch, APPLE_TOUCH_SIZE, 'rungbook-apple-touch-180.png', false);
  } finally {
    await browser.close();
  }
}

await main();
