/**
 * Accessibility: every built page, light and dark, and on a 390 px phone
 * (where wide formulas scroll in their own boxes), checked by axe-core (the
 * Deque rules engine, WCAG 2.x A/AA tags). Zero serious or critical
 * violations allowed.
 */
import { readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { browserAvailable, DIST, hydrated, openPage, useSiteAndBrowser } from './harness';

const require = createRequire(import.meta.url);
const axeSource = readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

function routes(dir = DIST, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) routes(p, out);
    else if (name === 'index.html') out.push('/' + relative(DIST, dir).split('\\').join('/') + (dir === DIST ? '' : '/'));
  }
  return out.map((r) => r.replace(/^\/\/$/, '/')).sort();
}

interface AxeViolation { id: string; impact: string | null; help: string; nodes: { target: string[] }[] }

/** axe-core's serious and critical violations on the page as it is now. */
async function seriousViolations(page: Page): Promise<AxeViolation[]> {
  await page.addScriptTag({ content: axeSource });
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: AxeViolation[] }> } }).axe;
    const result = await axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'best-practice'] } });
    return result.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.slice(0, 3).map((n) => ({ target: n.target })) }));
  });
  return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}

describe.runIf(browserAvailable())('axe-core on every page', () => {
  const env = useSiteAndBrowser();

  const pages = browserAvailable() ? routes() : [];
  it('finds the built pages', () => {
    expect(pages).toContain('/');
    expect(pages).toContain('/resonance/');
  });

  for (const scheme of ['light', 'dark'] as const) {
    it.each(pages)(`%s has no serious or critical violations (${scheme})`, async (route) => {
      const { page } = await openPage(env.browser, env.site.origin + route, { colorScheme: scheme });
      await hydrated(page);
      const bad = await seriousViolations(page);
      expect(bad, JSON.stringify(bad, null, 1)).toEqual([]);
      await page.context().close();
    });
  }

  it.each(pages)('%s has no serious or critical violations (phone, 390 px, plots built)', async (route) => {
    const context = await env.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await page.goto(env.site.origin + route, { waitUntil: 'networkidle' });
    await hydrated(page);
    // Scroll through the page as a reader would: what is drawn on coming into view (plots with
    // their tables, formulas that then turn out wider than the screen) is drawn before the check.
    // (The page grows as skipped blocks are drawn at their real height: read its height at each step.)
    const height = () => page.evaluate(() => document.documentElement.scrollHeight);
    for (let y = 0; y < await height(); y += 400) {
      await page.evaluate((top) => window.scrollTo(0, top), y);
      await page.waitForTimeout(30);
    }
    for (const plot of await page.locator('.tw-plot').all()) {
      await plot.scrollIntoViewIfNeeded();
      await expect.poll(() => plot.locator('canvas').count(), { timeout: 10_000 }).toBeGreaterThan(0);
    }
    // Two frames, then the page idle: boxes the benches added are measured by then.
    await page.evaluate(() => new Promise((done) => requestAnimationFrame(() => requestAnimationFrame(() => requestIdleCallback(done, { timeout: 2000 })))));
    const bad = await seriousViolations(page);
    expect(bad, JSON.stringify(bad, null, 1)).toEqual([]);
    await context.close();
  });
});
