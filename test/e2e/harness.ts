/**
 * Browser test harness: serves the built site (dist/) on a free loopback port
 * and drives the system Chromium with playwright-core. No mocks of the core.
 */
import { createServer, type Server } from 'node:http';
import { existsSync, readFileSync, statSync } from 'node:fs';
import { extname, join, normalize, resolve } from 'node:path';
import { afterAll, beforeAll, expect } from 'vitest';
import { chromium, type Browser, type Page } from 'playwright-core';
import { chromiumPath, requireTool } from '../helpers/tools';

/** The built site; TANKWRIGHT_DIST points elsewhere (a private build while others build dist/). */
export const DIST = process.env.TANKWRIGHT_DIST ? resolve(process.env.TANKWRIGHT_DIST) : resolve(import.meta.dirname, '../../dist');

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8', '.js': 'text/javascript; charset=utf-8', '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8', '.svg': 'image/svg+xml', '.json': 'application/json', '.woff2': 'font/woff2',
  '.woff': 'font/woff', '.ttf': 'font/ttf', '.png': 'image/png', '.txt': 'text/plain; charset=utf-8', '.csv': 'text/csv',
  '.webmanifest': 'application/manifest+json', '.xml': 'application/xml',
};

function fileFor(urlPath: string): string | undefined {
  const clean = normalize(decodeURIComponent(urlPath.split('?')[0])).replace(/^(\.\.[/\\])+/, '');
  let p = join(DIST, clean);
  if (!p.startsWith(DIST)) return undefined;
  if (existsSync(p) && statSync(p).isDirectory()) p = join(p, 'index.html');
  else if (!existsSync(p) && existsSync(`${p}.html`)) p = `${p}.html`;
  return existsSync(p) ? p : undefined;
}

export interface Site {
  origin: string;
  close(): Promise<void>;
}

/** Serves dist/ on 127.0.0.1 at a free port. */
export async function serveSite(): Promise<Site> {
  if (!existsSync(join(DIST, 'index.html'))) {
    throw new Error('dist/ is missing: run `npm run build` first (npm test does it for you).');
  }
  const server: Server = createServer((req, res) => {
    const file = fileFor(req.url ?? '/');
    if (!file) {
      const notFound = join(DIST, '404.html');
      res.writeHead(404, { 'content-type': TYPES['.html'] });
      res.end(existsSync(notFound) ? readFileSync(notFound) : 'not found');
      return;
    }
    res.writeHead(200, { 'content-type': TYPES[extname(file)] ?? 'application/octet-stream' });
    res.end(readFileSync(file));
  });
  await new Promise<void>((ok) => server.listen(0, '127.0.0.1', ok));
  const address = server.address();
  if (!address || typeof address === 'string') throw new Error('server did not bind');
  return {
    origin: `http://127.0.0.1:${address.port}`,
    close: () => new Promise((ok) => server.close(() => ok())),
  };
}

export const CHROMIUM_ARGS = [
  '--headless=new', '--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage', '--disable-quic',
  '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run',
];

/** True when browser tests can run; in CI a missing Chromium fails. */
export function browserAvailable(): boolean {
  return requireTool('chromium', chromiumPath() !== undefined, 'apt-get install -y chromium, or set CHROME_PATH');
}

export async function launch(): Promise<Browser> {
  return chromium.launch({ executablePath: chromiumPath(), args: CHROMIUM_ARGS, headless: true });
}

/** Page that records console errors and uncaught exceptions. */
export async function openPage(browser: Browser, url: string, options: { colorScheme?: 'light' | 'dark' } = {}): Promise<{ page: Page; errors: string[] }> {
  const context = await browser.newContext({ colorScheme: options.colorScheme ?? 'light', viewport: { width: 1200, height: 900 } });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('console', (m) => { if (m.type() === 'error') errors.push(m.text()); });
  page.on('pageerror', (e) => errors.push(String(e)));
  await page.goto(url, { waitUntil: 'networkidle' });
  return { page, errors };
}

/**
 * Waits until the Solid islands on the page have hydrated, each bench in all
 * its parts: a bench hydrates in several tasks (kit/Later) and marks its root
 * data-awake when the last has.
 */
export async function hydrated(page: Page): Promise<void> {
  await page.waitForFunction(() =>
    [...document.querySelectorAll('astro-island')].every((el) => !el.hasAttribute('ssr'))
    && [...document.querySelectorAll('[data-bench]')].every((el) => el.hasAttribute('data-awake')));
}

/**
 * Registers beforeAll/afterAll that serve the site and start Chromium for a
 * describe block; read `env.site` and `env.browser` inside its tests.
 */
export function useSiteAndBrowser(): { readonly site: Site; readonly browser: Browser } {
  let site: Site | undefined;
  let browser: Browser | undefined;
  beforeAll(async () => {
    site = await serveSite();
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
    await site?.close();
  });
  return {
    get site() {
      if (!site) throw new Error('the site is not being served yet');
      return site;
    },
    get browser() {
      if (!browser) throw new Error('Chromium has not started yet');
      return browser;
    },
  };
}

/** The SI value a ResultRow shows (its data-value), NaN when it shows none. */
export async function valueOf(page: Page, id: string): Promise<number> {
  const raw = await page.locator(`#${id} output`).getAttribute('data-value');
  return raw === null || raw === '' ? Number.NaN : Number(raw);
}

/** Replaces the text of the input with this id, as typing would. */
export async function retype(page: Page, id: string, text: string): Promise<void> {
  await page.locator(`#${id}`).fill(text);
}

/**
 * After opening a bench with a hostile link (markup in values, a script that
 * would set window.__pwned, an <img src=x>): one visible notice says what was
 * ignored, and nothing from the link ran or reached the page as markup.
 */
export async function expectHostileLinkIgnored(page: Page): Promise<void> {
  const notice = page.locator('.tw-link-notices');
  await expect.poll(() => notice.count()).toBe(1);
  expect(await notice.textContent()).toMatch(/Ignored/);
  expect(await page.evaluate(() => (window as unknown as { __pwned?: number }).__pwned)).toBeUndefined();
  expect(await page.locator('img[src=x]').count()).toBe(0);
}
