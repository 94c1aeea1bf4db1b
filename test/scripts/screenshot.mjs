#!/usr/bin/env node
/**
 * Screenshots of built pages, to look at: serves dist/ and saves PNGs.
 * Usage: node test/scripts/screenshot.mjs /resonance/ [/coil/ …] [--all] [--dark] [--out .tmp/shots] [--width 1280]
 * --all shoots every page; a width under 600 is a phone (touch, mobile viewport, 844 px tall) and
 * its files end in -<width>. The page is scrolled to the end first, so what builds on
 * scrolling into view (plots) is in the picture.
 * (TANKWRIGHT_DIST=dir serves another build than dist/.)
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { requireBuild, routes as builtRoutes, serve } from './serve.mjs';

const args = process.argv.slice(2);
const opt = (name, dflt) => { const i = args.indexOf(name); return i >= 0 ? args.splice(i, 2)[1] : dflt; };
const flag = (name) => { const i = args.indexOf(name); return i >= 0 ? (args.splice(i, 1), true) : false; };
const dark = flag('--dark');
const all = flag('--all');
const out = opt('--out', '.tmp/shots');
const width = Number(opt('--width', '1280'));
requireBuild();
const routes = all ? builtRoutes() : args.length ? args : ['/'];
const phone = width < 600;
const site = await serve();
const origin = site.origin;
const browser = await chromium.launch({
  executablePath: process.env.CHROME_PATH ?? '/usr/bin/chromium',
  args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
});
mkdirSync(out, { recursive: true });
const page = await browser.newPage({
  viewport: { width, height: phone ? 844 : 900 }, colorScheme: dark ? 'dark' : 'light',
  ...(phone ? { isMobile: true, hasTouch: true, deviceScaleFactor: 1 } : {}),
});
for (const route of routes) {
  await page.goto(origin + route, { waitUntil: 'networkidle' });
  for (let y = 0; y < (await page.evaluate(() => document.documentElement.scrollHeight)); y += 600) {
    await page.evaluate((top) => window.scrollTo(0, top), y);
    await page.waitForTimeout(60);
  }
  await page.evaluate(() => window.scrollTo(0, 0));
  // A full-page picture is taken without scrolling: draw what content-visibility leaves for later.
  await page.addStyleTag({ content: '* { content-visibility: visible !important; }' });
  await page.waitForTimeout(400);
  const file = join(out, `${route.replace(/[^a-z0-9]+/gi, '_').replace(/^_|_$/g, '') || 'home'}${phone ? `-${width}` : ''}${dark ? '-dark' : ''}.png`);
  await page.screenshot({ path: file, fullPage: true });
  console.log(file);
}
await browser.close();
await site.close();
