/**
 * The benches' plots (kit/Plot): built when scrolled into view, an x axis
 * that ends where the data end, a readout reachable from the keyboard alone,
 * and a table of the curves at the marked points.
 */
import { describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { browserAvailable, hydrated, openPage, useSiteAndBrowser } from './harness';
import { parseQuantity } from '../../src/quantity';

/** Scrolls the plot into view and waits until uPlot has drawn it. */
async function built(plot: Locator): Promise<void> {
  await plot.scrollIntoViewIfNeeded();
  await expect.poll(() => plot.locator('canvas').count(), { timeout: 10_000 }).toBeGreaterThan(0);
  await expect.poll(() => plot.getAttribute('data-scale-max'), { timeout: 10_000 }).not.toBeNull();
}

async function numberAttr(plot: Locator, name: string): Promise<number> {
  return Number(await plot.getAttribute(name));
}

/** The frequency a readout starts with ("7.157 MHz: Response −3.010 dB"), in Hz. */
function readoutFrequency(text: string): number {
  return parseQuantity(text.replace(/^Cursor at /, '').split(':')[0].trim(), 'Hz');
}

/** Presses Tab until focus is inside `selector`; fails after `limit` presses. */
async function tabTo(page: Page, selector: string, limit = 150): Promise<void> {
  for (let i = 0; i < limit; i++) {
    await page.keyboard.press('Tab');
    if (await page.evaluate((s) => document.activeElement?.matches(s) ?? false, selector)) return;
  }
  throw new Error(`Tab never reached ${selector}`);
}

describe.runIf(browserAvailable())('plots on the benches', () => {
  const env = useSiteAndBrowser();

  it('is not built before it comes into view, then the x axis spans exactly the data (Coil, log axis)', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/coil/`);
    await hydrated(page);
    const plot = page.locator('#coil-plot');
    // Far below the first screen: nothing drawn yet.
    expect(await plot.locator('canvas').count()).toBe(0);
    await built(plot);
    const first = await numberAttr(plot, 'data-x-first');
    const last = await numberAttr(plot, 'data-x-last');
    expect(last).toBeGreaterThan(first);
    // A log axis left to itself rounds out to whole decades (to 1 GHz for data ending near 200 MHz).
    expect(Math.abs(await numberAttr(plot, 'data-scale-min') / first - 1)).toBeLessThan(1e-9);
    expect(Math.abs(await numberAttr(plot, 'data-scale-max') / last - 1)).toBeLessThan(1e-9);
    expect(errors).toEqual([]);
    await page.context().close();
  });

  it('the Tank response plot spans its data; its table reads the −3 dB points as −3.01 dB', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/`);
    await hydrated(page);
    const plot = page.locator('#plot-response');
    await built(plot);
    expect(Math.abs(await numberAttr(plot, 'data-scale-min') / await numberAttr(plot, 'data-x-first') - 1)).toBeLessThan(1e-9);
    expect(Math.abs(await numberAttr(plot, 'data-scale-max') / await numberAttr(plot, 'data-x-last') - 1)).toBeLessThan(1e-9);
    // f₁ and f₂ are the half-power points: 10·log10(1/2) = −3.0103 dB (definition of the −3 dB bandwidth).
    const rows = await plot.locator('.tw-plot-keys tbody tr').allTextContents();
    expect(rows.length).toBe(2);
    for (const row of await plot.locator('.tw-plot-keys tbody tr').all()) {
      const cells = await row.locator('td').allTextContents();
      const db = Number(cells[cells.length - 1].replace('\u2212', '-').replace(/\s*dB$/, ''));
      expect(Math.abs(db - 10 * Math.log10(0.5))).toBeLessThan(0.02);
    }
    expect(errors).toEqual([]);
    await page.context().close();
  });

  it('reads out along the curve from the keyboard alone: Tab to it, arrows, Home and End', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/`);
    await hydrated(page);
    const plot = page.locator('#plot-response');
    await built(plot);
    await page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());
    await page.evaluate(() => window.scrollTo(0, 0));
    await tabTo(page, '#plot-response .tw-plot-canvas');
    const slider = plot.locator('.tw-plot-canvas');
    expect(await slider.getAttribute('role')).toBe('slider');
    const readout = plot.locator('.tw-plot-readout');
    const first = await numberAttr(plot, 'data-x-first');
    const last = await numberAttr(plot, 'data-x-last');

    // Focus places the cursor on the first marked point, f₁.
    await expect.poll(() => readout.textContent()).toMatch(/^Cursor at /);
    const atStart = readoutFrequency((await readout.textContent())!);
    expect(atStart).toBeGreaterThan(first);
    expect(atStart).toBeLessThan(last);

    await page.keyboard.press('ArrowRight');
    const afterRight = readoutFrequency((await readout.textContent())!);
    expect(afterRight).toBeGreaterThan(atStart);

    await page.keyboard.press('End');
    // Readouts show 4 figures: the last point within half a unit of the fourth.
    expect(Math.abs(readoutFrequency((await readout.textContent())!) / last - 1)).toBeLessThan(5e-4);
    expect(await slider.getAttribute('aria-valuetext')).toBe((await readout.textContent())!.replace(/^Cursor at /, ''));
    expect(Number(await slider.getAttribute('aria-valuenow'))).toBe(Number(await slider.getAttribute('aria-valuemax')));

    await page.keyboard.press('Home');
    expect(Math.abs(readoutFrequency((await readout.textContent())!) / first - 1)).toBeLessThan(5e-4);
    expect(await slider.getAttribute('aria-valuenow')).toBe('0');

    // uPlot's own legend follows the keyboard cursor.
    await page.keyboard.press('PageUp');
    const legendX = await plot.locator('.u-legend .u-series').first().locator('.u-value').textContent();
    expect(readoutFrequency(`${legendX}:`)).toBeCloseTo(readoutFrequency((await readout.textContent())!), -3);
    expect(errors).toEqual([]);
    await page.context().close();
  });
});
