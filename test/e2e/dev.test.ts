/**
 * The README's first command: `npm start` runs the Astro dev server. Pages
 * there are rendered and hydrated differently from the build (development
 * builds of Solid, hot reload), so each workbench is opened in the dev server
 * too and must hydrate with no console error.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { browserAvailable, hydrated, launch, openPage } from './harness';
import { NAV } from '../../src/layouts/nav';

const ROOT = resolve(import.meta.dirname, '../..');

async function freePort(): Promise<number> {
  return new Promise((ok, fail) => {
    const s = createServer();
    s.on('error', fail);
    s.listen(0, '127.0.0.1', () => {
      const address = s.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      s.close(() => ok(port));
    });
  });
}

describe.runIf(browserAvailable())('npm start (astro dev) serves working benches', () => {
  let dev: ChildProcess | undefined;
  let origin = '';
  let browser: Browser;

  beforeAll(async () => {
    const port = await freePort();
    origin = `http://127.0.0.1:${port}`;
    dev = spawn(process.execPath, [resolve(ROOT, 'node_modules/astro/astro.js'), 'dev', '--host', '127.0.0.1', '--port', String(port)], {
      cwd: ROOT,
      stdio: ['ignore', 'pipe', 'pipe'],
      env: { ...process.env, ASTRO_TELEMETRY_DISABLED: '1' },
    });
    let log = '';
    dev.stdout?.on('data', (d) => (log += d));
    dev.stderr?.on('data', (d) => (log += d));
    const deadline = Date.now() + 90_000;
    for (;;) {
      try {
        if ((await fetch(`${origin}/`)).ok) break;
      } catch { /* not up yet */ }
      if (Date.now() > deadline || dev.exitCode !== null) throw new Error(`astro dev did not start:\n${log}`);
      await new Promise((r) => setTimeout(r, 500));
    }
    browser = await launch();
  });

  afterAll(async () => {
    await browser?.close();
    dev?.kill('SIGTERM');
  });

  const benches = NAV.filter((n) => !['/', '/methods/', '/cautions/'].includes(n.href));
  it.each(benches.map((b) => b.href))('%s hydrates in the dev server with no console error', async (href) => {
    const { page, errors } = await openPage(browser, origin + href);
    await hydrated(page);
    await expect.poll(() => page.locator('.tw-result-value').count()).toBeGreaterThan(0);
    expect(errors).toEqual([]);
    await page.context().close();
  });
});
