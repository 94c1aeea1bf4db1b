/**
 * Phone: every built page at 390 × 844 (a common phone's CSS viewport) is no
 * wider than the screen, also after scrolling to the end (plots build when
 * they come into view), and nothing on it moves while it loads (here and at
 * 1280 px: parts below the first screen are drawn late, and must not push
 * what is on it). A formula wider than the screen scrolls inside its own box
 * instead. The 390 px width: common practice, no published source.
 */
import { readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { browserAvailable, DIST, hydrated, retype, useSiteAndBrowser } from './harness';

const PHONE = { width: 390, height: 844 };

function routes(dir = DIST, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) routes(p, out);
    else if (name === 'index.html') out.push(dir === DIST ? '/' : `/${relative(DIST, dir).split('\\').join('/')}/`);
  }
  return out.sort();
}

/** Scrolls to the end in steps (so what is drawn on coming into view is drawn), builds every plot, then back to the top. */
async function scrollThrough(page: Page): Promise<void> {
  // (The page grows as skipped blocks are drawn at their real height: read its height at each step.)
  const height = () => page.evaluate(() => document.documentElement.scrollHeight);
  for (let y = 0; y < await height(); y += PHONE.height / 2) {
    await page.evaluate((top) => window.scrollTo(0, top), y);
    await page.waitForTimeout(30);
  }
  for (const plot of await page.locator('.tw-plot').all()) {
    await plot.scrollIntoViewIfNeeded();
    await expect.poll(() => plot.locator('canvas').count(), { timeout: 10_000 }).toBeGreaterThan(0);
  }
  await page.evaluate(() => window.scrollTo(0, 0));
}

/**
 * Opens the page and returns its layout shift while loading, as browsers score it (cumulative
 * layout shift; 0.1 is the usual "good" limit, and a page that paints its text and then its
 * islands in place shifts not at all). Every shift counts: nobody touches the page while it
 * loads (Playwright's mobile emulation marks early shifts as following input, which would hide them).
 */
async function shiftWhileLoading(page: Page, url: string): Promise<number> {
  await page.addInitScript(() => {
    const w = window as unknown as { __shift: number };
    w.__shift = 0;
    new PerformanceObserver((list) => {
      for (const e of list.getEntries() as (PerformanceEntry & { value: number })[]) w.__shift += e.value;
    }).observe({ type: 'layout-shift', buffered: true });
  });
  await page.goto(url, { waitUntil: 'networkidle' });
  await hydrated(page);
  return page.evaluate(() => (window as unknown as { __shift: number }).__shift);
}

describe.runIf(browserAvailable())('pages on a 390 px phone', () => {
  const env = useSiteAndBrowser();
  const pages = browserAvailable() ? routes() : [];

  it('finds the built pages', () => {
    expect(pages).toEqual(expect.arrayContaining(['/', '/resonance/', '/coil/', '/tank/']));
  });

  it.each(pages)('%s is no wider than the screen, and nothing moves while it loads', async (route) => {
    const context = await env.browser.newContext({ viewport: PHONE, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    expect(await shiftWhileLoading(page, env.site.origin + route)).toBeLessThan(0.01);
    await scrollThrough(page);
    const width = await page.evaluate(() => document.scrollingElement!.scrollWidth);
    const wide = await page.evaluate((limit) => [...document.querySelectorAll('body *')]
      .filter((el) => el.getBoundingClientRect().right > limit + 1 && !el.closest('.tw-formula-math, .katex, .tw-math-block, .tw-plot-keys-wrap'))
      .slice(0, 5).map((el) => `${el.tagName.toLowerCase()}.${[...el.classList].join('.')} → ${Math.round(el.getBoundingClientRect().right)} px`), PHONE.width);
    expect(width, `wider than the screen: ${wide.join('; ')}`).toBeLessThanOrEqual(PHONE.width);
    // Nor does anything run past its own column to be cut off there (off-screen parts are clipped
    // to their box until drawn, so an overflow would not show in the page's width): only boxes
    // made to scroll may hold more than they show.
    const cut = await page.evaluate(() => [...document.querySelectorAll('main *')]
      .filter((el) => el.scrollWidth > el.clientWidth + 1 && el.clientWidth > 0 && !/auto|scroll/.test(getComputedStyle(el).overflowX))
      .filter((el) => ![...el.querySelectorAll('*')].some((inner) => /auto|scroll/.test(getComputedStyle(inner).overflowX) && inner.scrollWidth >= el.scrollWidth - 1))
      .slice(0, 5).map((el) => `${el.tagName.toLowerCase()}.${[...el.classList].join('.')} ${el.clientWidth}/${el.scrollWidth} px`));
    expect(cut, 'content wider than its column').toEqual([]);
    await context.close();
  });

  it.each(pages)('%s does not move while it loads on a 1280 px screen either', async (route) => {
    const context = await env.browser.newContext({ viewport: { width: 1280, height: 900 } });
    expect(await shiftWhileLoading(await context.newPage(), env.site.origin + route)).toBeLessThan(0.01);
    await context.close();
  });

  it.each([
    ['/coil/', 'L', '2u2', ['sum-turns', 'sum-L', 'sum-q']],
    ['/tank/', 'C', '220p', ['sum-f', 'sum-ql', 'sum-bw']],
  ])('%s keeps the answer in sight while the fields scroll, and follows the typing', async (route, field, text, ids) => {
    const context = await env.browser.newContext({ viewport: PHONE, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await page.goto(`${env.site.origin}${route}`, { waitUntil: 'networkidle' });
    await hydrated(page);
    const dock = page.locator('#answer-dock');
    const docked = () => dock.locator('.tw-dock-value').allTextContents();
    const summary = async () => Promise.all(ids.map((id) => page.locator(`#${id} output`).textContent()));
    // Halfway down the fields: the dock sits on the bottom edge of the screen, the summary is far below
    await page.evaluate(() => window.scrollTo(0, 700));
    await page.waitForTimeout(100);
    const box = (await dock.boundingBox())!;
    expect(Math.abs(box.y + box.height - PHONE.height)).toBeLessThan(2);
    expect((await page.locator('#summary').boundingBox())!.y).toBeGreaterThan(PHONE.height);
    expect(await docked()).toEqual((await summary()).map((t) => t!.replace(/ \(.*\)$/, '')));
    // It follows what is typed, and dims with the summary when the input is not a value
    await retype(page, field, text);
    await expect.poll(async () => (await docked()).join('|')).toBe((await summary()).map((t) => t!.replace(/ \(.*\)$/, '')).join('|'));
    await retype(page, field, '-1');
    await expect.poll(() => dock.getAttribute('class')).toContain('tw-dock--stale');
    await retype(page, field, text);
    // A tap takes the reader to the summary; the dock repeats it for the eye only (hidden from screen readers, no tab stop)
    expect(await dock.getAttribute('aria-hidden')).toBe('true');
    expect(await dock.locator('a, button, input, [tabindex]').count()).toBe(0);
    await dock.click();
    await expect.poll(async () => Math.abs((await page.locator('#summary').boundingBox())!.y)).toBeLessThan(PHONE.height / 2);
    await context.close();
    // On a wide screen the summary sits beside the fields, and there is no dock
    const wide = await env.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const desk = await wide.newPage();
    await desk.goto(`${env.site.origin}${route}`, { waitUntil: 'networkidle' });
    expect(await desk.locator('#answer-dock').isVisible()).toBe(false);
    await wide.close();
  });

  it('a formula wider than the screen scrolls inside its own box', async () => {
    const context = await env.browser.newContext({ viewport: PHONE, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await page.goto(`${env.site.origin}/coil/`, { waitUntil: 'networkidle' });
    await hydrated(page);
    const boxes = await page.evaluate(() => [...document.querySelectorAll('.tw-formula-math')].map((el) => ({
      overflows: el.scrollWidth > el.clientWidth + 1,
      scrolls: getComputedStyle(el).overflowX === 'auto',
      // the cue: shadows at the edges (backgrounds that stay while the covers scroll with the content)
      cue: /radial-gradient/.test(getComputedStyle(el).backgroundImage) && /local/.test(getComputedStyle(el).backgroundAttachment),
      right: el.getBoundingClientRect().right,
    })));
    // The AC resistance formula is wider than a phone: it must scroll inside its box, which stays on screen.
    expect(boxes.some((b) => b.overflows)).toBe(true);
    for (const b of boxes) {
      expect(b.scrolls).toBe(true);
      expect(b.cue).toBe(true);
      expect(b.right).toBeLessThanOrEqual(PHONE.width);
    }
    await context.close();
  });
});
