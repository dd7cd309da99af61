/**
 * Draws the home-screen icons (public/icons/*.png) from public/icons/app-icon.svg with Debian's Chromium, the one
 * the browser tests use; nothing is downloaded. Run after changing the SVG and commit the PNGs:
 *   node --import tsx scripts/draw-app-icons.ts
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { chromium } from 'playwright-core';
import { chromiumPath } from '../tests/setup/browser-tools';

const folder = path.resolve('public/icons');
const svg = readFileSync(path.join(folder, 'app-icon.svg'), 'utf8');
const sizes: [string, number][] = [
  ['app-icon-192.png', 192],
  ['app-icon-512.png', 512],
  ['apple-touch-icon-180.png', 180],
];

const browser = await chromium.launch({ executablePath: chromiumPath, headless: true, args: ['--no-sandbox'] });
try {
  for (const [name, size] of sizes) {
    const page = await browser.newPage({ viewport: { width: size, height: size } });
    await page.setContent(
      `<html><body style="margin:0"><img style="display:block;width:${size}px;height:${size}px" src="data:image/svg+xml;base64,${Buffer.from(svg).toString('base64')}"></body></html>`,
    );
    await page.screenshot({ path: path.join(folder, name), omitBackground: false });
    await page.close();
    console.log(`drew ${name}`);
  }
} finally {
  await browser.close();
}
