/**
 * A bench hydrates in parts (components/kit/Later.tsx) so that no single task
 * blocks a phone for long. These checks hold it to what a person sees while it
 * wakes: the page the server sent is the page that stays (nothing doubled or
 * dropped), and what was typed or chosen before the JavaScript arrived is kept
 * and computed, not wiped by hydration. Expected figures come from Thomson's
 * formula computed here (Terman 1943).
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { browserAvailable, hydrated, useSiteAndBrowser, valueOf } from './harness';
import { thomson } from '../helpers/asserts';

/** Opens a page with its scripts held back; returns the page and a function that lets them through. */
async function openAsleep(env: ReturnType<typeof useSiteAndBrowser>, path: string): Promise<{ page: Page; errors: string[]; wake: () => void }> {
  const context = await env.browser.newContext({ viewport: { width: 390, height: 844 } });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('console', (m) => { if (m.type() === 'error') errors.push(m.text()); });
  page.on('pageerror', (e) => errors.push(String(e)));
  let wake!: () => void;
  const awake = new Promise<void>((done) => { wake = done; });
  await page.route('**/_astro/*.js', async (route) => {
    await awake;
    await route.continue();
  });
  await page.goto(`${env.site.origin}${path}`, { waitUntil: 'domcontentloaded' });
  return { page, errors, wake };
}

describe.runIf(browserAvailable())('benches waking up in parts', () => {
  const env = useSiteAndBrowser();

  for (const path of ['/coil/', '/tank/', '/resonance/', '/band/', '/match/']) {
    it(`${path}: hydration keeps the server's page, element for element`, async () => {
      const context = await env.browser.newContext({ viewport: { width: 390, height: 844 } });
      const page = await context.newPage();
      const errors: string[] = [];
      page.on('console', (m) => { if (m.type() === 'error') errors.push(m.text()); });
      const response = await page.goto(`${env.site.origin}${path}`);
      const served = await response!.text();
      await hydrated(page);
      const shape = await page.evaluate((html) => {
        // (The answer dock fills in once the first result is in: the Coil bench computes after its fields hydrate.)
        const tags = (root: ParentNode) => [...root.querySelectorAll('[data-bench] *:not(#answer-dock *)')].map((e) => e.tagName);
        const ids = [...document.querySelectorAll('[id]')].map((e) => e.id);
        return { now: tags(document), served: tags(new DOMParser().parseFromString(html, 'text/html')), duplicateIds: ids.filter((id, i) => ids.indexOf(id) !== i) };
      }, served);
      expect(shape.now.length).toBeGreaterThan(100);
      expect(shape.now).toEqual(shape.served);
      expect(shape.duplicateIds).toEqual([]);
      expect(errors).toEqual([]);
      await context.close();
    });
  }

  it('Coil: what was typed and chosen before the scripts arrived is kept and computed', async () => {
    const { page, errors, wake } = await openAsleep(env, '/coil/');
    await page.locator('#L').fill('10u');
    await page.locator('#awg').selectOption('24');
    await page.locator('input[name="wind"][value="pitch"]').check();
    wake();
    await hydrated(page);
    expect(await page.locator('#L').inputValue()).toBe('10u');
    expect(await page.locator('#awg').inputValue()).toBe('24');
    expect(await page.locator('input[name="wind"][value="pitch"]').isChecked()).toBe(true);
    // The pitch field appears for a spaced winding, and the coil is wound for 10 µH (within the half-turn step)
    await expect.poll(() => page.locator('#p').count()).toBe(1);
    await expect.poll(() => page.locator('#sum-L output').getAttribute('data-value')).not.toBeNull();
    expect(Math.abs(Number(await page.locator('#sum-L output').getAttribute('data-value')) / 10e-6 - 1)).toBeLessThan(0.1);
    await expect.poll(() => page.url()).toContain('L=10u');
    expect(page.url()).toContain('awg=24');
    expect(errors).toEqual([]);
    await page.context().close();
  });

  it('Tank: a mode chosen and a capacitance typed before the scripts arrived are kept and computed', async () => {
    const { page, errors, wake } = await openAsleep(env, '/tank/');
    await page.locator('input[name="mode"][value="series"]').check();
    await page.locator('#C').fill('220p');
    await page.locator('#L').fill('4u7');
    wake();
    await hydrated(page);
    expect(await page.locator('input[name="mode"][value="series"]').isChecked()).toBe(true);
    expect(await page.locator('#C').inputValue()).toBe('220p');
    await expect.poll(() => page.locator('#out-f .tw-result-label').textContent()).toContain('dip');
    // Thomson's formula for 4.7 µH and 220 pF; the bench's |Z| dip sits within 1 % of it
    await expect.poll(() => valueOf(page, 'out-f')).toBeGreaterThan(0);
    expect(Math.abs(await valueOf(page, 'out-f') / thomson(4.7e-6, 220e-12) - 1)).toBeLessThan(0.01);
    expect(errors).toEqual([]);
    await page.context().close();
  });
});
