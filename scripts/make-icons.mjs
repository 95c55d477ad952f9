// Renders public/icons/cutbell.svg to the PNG sizes the manifest lists, with Debian's Chromium.
// Run after changing the SVG: npm run icons
import { readFileSync, writeFileSync } from 'node:fs';
import { chromium } from 'playwright-core';
import { chromiumPath, root } from './lib/setup.mjs';

const svg = readFileSync(`${root}public/icons/cutbell.svg`, 'utf8');
const browser = await chromium.launch({ executablePath: chromiumPath, args: ['--no-sandbox', '--disable-gpu'] });
const page = await browser.newPage();
const targets = [
  { file: 'cutbell-192.png', size: 192, padding: 0 },
  { file: 'cutbell-512.png', size: 512, padding: 0 },
  // Maskable: the mark inside the 80 % safe zone on a full-bleed background.
  { file: 'cutbell-maskable-512.png', size: 512, padding: 0.12 },
];
for (const { file, size, padding } of targets) {
  await page.setViewportSize({ width: size, height: size });
  const inner = Math.round(size * (1 - 2 * padding));
  await page.setContent(`<body style="margin:0;background:${padding ? "#0b4f5c" : "transparent"};display:grid;place-items:center;width:${size}px;height:${size}px">
    <div style="width:${inner}px;height:${inner}px">${svg.replace('<svg ', `<svg width="${inner}" height="${inner}" `)}</div></body>`);
  writeFileSync(`${root}public/icons/${file}`, await page.screenshot({ omitBackground: padding === 0 }));
  console.log(`public/icons/${file}`);
}
await browser.close();
