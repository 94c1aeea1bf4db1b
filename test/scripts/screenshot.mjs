#!/usr/bin/env node
/**
 * Screenshots of built pages, to look at: serves dist/ and saves PNGs.
 * Usage: node test/scripts/screenshot.mjs /resonance/ [/coil/ …] [--dark] [--out .tmp/shots] [--width 1280]
 * (TANKWRIGHT_DIST=dir serves another build than dist/.)
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { createServer } from 'node:http';
import { existsSync, readFileSync, statSync } from 'node:fs';
import { extname, resolve } from 'node:path';

const args = process.argv.slice(2);
const opt = (name, dflt) => { const i = args.indexOf(name); return i >= 0 ? args.splice(i, 2)[1] : dflt; };
const dark = args.includes('--dark') && args.splice(args.indexOf('--dark'), 1);
const out = opt('--out', '.tmp/shots');
const width = Number(opt('--width', '1280'));
const routes = args.length ? args : ['/'];
const dist = process.env.TANKWRIGHT_DIST ? resolve(process.env.TANKWRIGHT_DIST) : resolve(import.meta.dirname, '../../dist');
const types = { '.html': 'text/html', '.js': 'text/javascript', '.css': 'text/css', '.svg': 'image/svg+xml', '.woff2': 'font/woff2', '.woff': 'font/woff', '.ttf': 'font/ttf' };
const server = createServer((req, res) => {
  let p = join(dist, decodeURIComponent(req.url.split('?')[0]));
  if (existsSync(p) && statSync(p).isDirectory()) p = join(p, 'index.html');
  if (!p.startsWith(dist) || !existsSync(p)) { res.writeHead(404); res.end(); return; }
  res.writeHead(200, { 'content-type': types[extname(p)] ?? 'application/octet-stream' });
  res.end(readFileSync(p));
});
await new Promise((ok) => server.listen(0, '127.0.0.1', ok));
const origin = `http://127.0.0.1:${server.address().port}`;
const browser = await chromium.launch({
  executablePath: process.env.CHROME_PATH ?? '/usr/bin/chromium',
  args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
});
mkdirSync(out, { recursive: true });
const page = await browser.newPage({ viewport: { width, height: 900 }, colorScheme: dark ? 'dark' : 'light' });
for (const route of routes) {
  await page.goto(origin + route, { waitUntil: 'networkidle' });
  await page.waitForTimeout(400);
  const file = join(out, `${route.replace(/[^a-z0-9]+/gi, '_').replace(/^_|_$/g, '') || 'home'}${dark ? '-dark' : ''}.png`);
  await page.screenshot({ path: file, fullPage: true });
  console.log(file);
}
await browser.close();
server.close();
