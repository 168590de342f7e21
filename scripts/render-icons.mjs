// Renders Boothwright's own icon (public/icons/boothwright-icon.svg) to the PNG sizes the web app
// manifest and iOS home screens ask for, in the Chromium the browser tests already use.
// Run after changing the SVG: `node scripts/render-icons.mjs`; the PNGs are committed.
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { chromium } from '@playwright/test';

const dir = path.resolve(import.meta.dirname, '../public/icons');
const sizes = [
  { file: 'icon-192.png', size: 192 },
  { file: 'icon-512.png', size: 512 },
  { file: 'apple-touch-icon.png', size: 180 },
];

const svg = await readFile(path.join(dir, 'boothwright-icon.svg'), 'utf8');
const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  args: ['--no-sandbox', '--disable-gpu'],
});
try {
  for (const { file, size } of sizes) {
    const page = await browser.newPage({ viewport: { width: size, height: size } });
    await page.setContent(
      `<style>html,body{margin:0}svg{display:block;width:${size}px;height:${size}px}</style>${svg}`,
    );
    await page.screenshot({ path: path.join(dir, file), omitBackground: false });
    await page.close();
  }
} finally {
  await browser.close();
}
