/**
 * The Band bench, driven as a technician would: a band typed as a range and
 * the capacitor's range, through to the turns to wind, checked against
 * Thomson's formula written here (Terman 1943, section 3) with the parts the
 * bench gives; bad input (a band no capacitor can cover, a range typed
 * backwards) answered at the field while the last good answer stays,
 * dimmed; the link round trip; and the hand-offs, which open the Coil bench
 * winding the same turns and the Tank bench resonating at mid-band.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { browserAvailable, hydrated, openPage, retype, useSiteAndBrowser, valueOf } from './harness';
import { rel, thomson } from '../helpers/asserts';

/** Text of a field's message, or null when it has none. */
async function messageAt(page: Page, key: string): Promise<string | null> {
  const m = page.locator(`#${key}-msg`);
  return (await m.count()) ? m.textContent() : null;
}

/** The tank's capacitance with the variable at cv: strays + padder in series with (variable ∥ trimmer). */
function tankCapacitance(cv: number, stray: number, trimmer: number, padder: number | undefined): number {
  return stray + (padder === undefined ? cv + trimmer : (padder * (cv + trimmer)) / (padder + cv + trimmer));
}

describe.runIf(browserAvailable())('Band bench in Chromium', () => {
  const env = useSiteAndBrowser();

  it('a band and a capacitor give the coil, its turns, trimmer and padder, and they cover the band by Thomson’s formula', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/band/`);
    await hydrated(page);
    await retype(page, 'band', '3.5–3.8 MHz');
    await retype(page, 'C', '12p..400p');
    await retype(page, 'Cs', '20 pF');
    await retype(page, 'margin', '1');
    await expect.poll(async () => (await page.locator('#out-band-asked').textContent()) ?? '').toMatch(/3\.5 MHz to 3\.8 MHz/);
    const L = await valueOf(page, 'out-L');
    const trimmer = await valueOf(page, 'out-trim');
    const padderShown = await valueOf(page, 'out-pad');
    const padder = Number.isNaN(padderShown) ? undefined : padderShown;
    // Thomson's formula with the parts the bench gives: plates meshed → the low end, open → the high end, 1 % margin
    expect(rel(thomson(L, tankCapacitance(400e-12, 20e-12, trimmer, padder)), 3.5e6 * 0.99)).toBeLessThan(1e-6);
    expect(rel(thomson(L, tankCapacitance(12e-12, 20e-12, trimmer, padder)), 3.8e6 * 1.01)).toBeLessThan(1e-6);
    expect(rel(await valueOf(page, 'out-low'), 3.5e6 * 0.99)).toBeLessThan(1e-9);
    // The answer first: turns to wind, as wound (half turns on a solenoid), the same in the summary and its card
    const turns = await valueOf(page, 'out-turns');
    expect(Number.isInteger(turns * 2)).toBe(true);
    expect(await valueOf(page, 'sum-turns')).toBe(turns);
    expect(await valueOf(page, 'sum-L')).toBe(L);
    // Selectivity across the band: three rows, loaded Q below the unloaded
    expect(await page.locator('#sel-table tbody tr').count()).toBe(3);
    expect(errors).toEqual([]);
  });

  it('an impossible band is answered at the band field with the widest ratio; a range typed backwards too; the last answer stays, dimmed', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/band/`);
    await hydrated(page);
    const turns = await valueOf(page, 'out-turns');
    await retype(page, 'band', '1M..10M');
    await expect.poll(() => messageAt(page, 'band')).toMatch(/gives at most 3\.899/);
    // √((365 + 15)/(10 + 15)) for the default 10–365 pF capacitor with 15 pF of strays
    expect(Math.sqrt(380 / 25)).toBeCloseTo(3.899, 3);
    expect(await page.locator('#summary').getAttribute('class')).toContain('tw-summary--stale');
    expect(await valueOf(page, 'out-turns')).toBe(turns);
    await retype(page, 'band', '6.2M..5.9M');
    await expect.poll(() => messageAt(page, 'band')).toBe('This range runs backwards: 6.2M is above 5.9M. Write the low end first: 5.9M..6.2M.');
    await retype(page, 'C', '365p..10p');
    await expect.poll(() => messageAt(page, 'C')).toMatch(/runs backwards/);
    await retype(page, 'C', '10p..365p');
    await retype(page, 'band', '5.9M..6.2M');
    await expect.poll(() => page.locator('#summary').getAttribute('class')).not.toContain('tw-summary--stale');
    expect(await messageAt(page, 'band')).toBeNull();
    expect(await valueOf(page, 'out-turns')).toBe(turns);
    expect(errors).toEqual([]);
  });

  it('keeps everything in the link', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/band/`);
    await hydrated(page);
    await page.locator('input[name=osc][value=below]').check();
    await retype(page, 'IF', '1.6 MHz');
    await retype(page, 'band', '7..7.3M');
    await page.locator('input[name=wire][value=swg]').check();
    await expect.poll(() => page.url()).toMatch(/band=7\.\.7\.3M/);
    await expect.poll(() => page.url()).toMatch(/osc=below/);
    const L = await valueOf(page, 'out-L');
    const { page: again } = await openPage(env.browser, page.url());
    await hydrated(again);
    expect(await again.locator('#band').inputValue()).toBe('7..7.3M');
    expect(await again.locator('#IF').inputValue()).toBe('1.6 MHz');
    expect(await again.locator('input[name=osc][value=below]').isChecked()).toBe(true);
    expect(await again.locator('#swg').count()).toBe(1);
    await expect.poll(() => valueOf(again, 'out-L')).toBe(L);
    expect(errors).toEqual([]);
  });

  it('hands the coil to the Coil bench (same turns), the tank to the Tank bench (resonant at mid-band) and both to the Match bench', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/band/`);
    await hydrated(page);
    const turns = await valueOf(page, 'out-turns');
    const L = await valueOf(page, 'out-L');
    const mid = ((await valueOf(page, 'out-low')) + (await valueOf(page, 'out-high'))) / 2;
    await page.locator('#handoff').scrollIntoViewIfNeeded();
    const toCoil = page.locator('#to-coil');
    await toCoil.waitFor();
    const coilHref = (await toCoil.getAttribute('href'))!;
    const tankHref = (await page.locator('#to-tank').getAttribute('href'))!;
    const matchHref = (await page.locator('#to-match').getAttribute('href'))!;

    const { page: coil, errors: coilErrors } = await openPage(env.browser, `${env.site.origin}${coilHref}`);
    await hydrated(coil);
    expect(await coil.locator('.tw-link-notices').count()).toBe(0);
    await expect.poll(() => valueOf(coil, 'out-turns')).toBe(turns);
    expect(rel(await valueOf(coil, 'out-L'), L)).toBeLessThan(0.01);

    const { page: tank, errors: tankErrors } = await openPage(env.browser, `${env.site.origin}${tankHref}`);
    await hydrated(tank);
    expect(await tank.locator('.tw-link-notices').count()).toBe(0);
    const params = new URLSearchParams(tankHref.split('?')[1]);
    const picoFarads = (text: string) => Number(text.replace(/\s*pF$/, '')) * 1e-12;
    expect(params.get('C')).toMatch(/pF$/);
    expect(params.get('Cself')).toMatch(/pF$/);
    // Thomson's formula with the L and C carried (the strays ride as the coil's self-capacitance): mid-band
    const carried = thomson(L, picoFarads(params.get('C')!) + picoFarads(params.get('Cself')!));
    expect(rel(carried, mid)).toBeLessThan(1e-4);
    // and the Tank bench finds its resonance there (loss moves it by about 1/Q²)
    await expect.poll(async () => rel(await valueOf(tank, 'out-f'), mid)).toBeLessThan(1e-3);
    // and the Match bench winds the same coil, tuned by what is across it to mid-band within the wire's internal inductance (about 1 %)
    const { page: match, errors: matchErrors } = await openPage(env.browser, `${env.site.origin}${matchHref}`);
    await hydrated(match);
    expect(await match.locator('.tw-link-notices').count()).toBe(0);
    await expect.poll(() => valueOf(match, 'out-turns')).toBe(turns);
    expect(rel(await valueOf(match, 'out-f0'), mid)).toBeLessThan(0.02);
    expect([...errors, ...coilErrors, ...tankErrors, ...matchErrors]).toEqual([]);
  });

  it('a tuning slug and the capacitor’s own plates: the band the slug reaches, the plates on the tuning curve; a bad table told at its field while the answer stands', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/band/`);
    await hydrated(page);
    const L = await valueOf(page, 'out-L');
    await retype(page, 'slug', '10');
    await page.locator('#out-slug-low').waitFor();
    // Thomson's formula: the slug fully in (1.1 L) with the plates meshed gives the band's low end × 1/√1.1
    await expect.poll(async () => rel(await valueOf(page, 'out-slug-low'), (await valueOf(page, 'out-low')) / Math.sqrt(1.1))).toBeLessThan(1e-3);
    expect(rel(await valueOf(page, 'out-slug-set'), L)).toBeLessThan(0.05);
    await retype(page, 'plates', '0: 365p; 90: 380p; 180: 10p');
    await expect.poll(() => messageAt(page, 'plates')).toMatch(/steadily/);
    expect(await page.locator('#summary').getAttribute('class')).not.toContain('tw-summary--stale');
    await retype(page, 'plates', '0: 365p; 45: 250p; 90: 150p; 135: 60p; 180: 10p');
    await expect.poll(() => messageAt(page, 'plates')).toBeNull();
    await page.locator('#plot-dial').scrollIntoViewIfNeeded();
    await expect.poll(() => page.locator('#plot-dial').textContent()).toMatch(/Your plates/);
    await retype(page, 'plates', '0: 365p; ninety: 150p');
    await expect.poll(() => messageAt(page, 'plates')).toMatch(/Point 2 .*the angle/);
    await retype(page, 'plates', '0: 365p; 180: 10p');
    await expect.poll(() => page.url()).toMatch(/plates=0%3A\+365p%3B\+180%3A\+10p/);
    await retype(page, 'slug', '');
    await expect.poll(() => page.locator('#out-slug-low').count()).toBe(0);
    expect(errors).toEqual([]);
  });

  it('shows the tracking and the fixed pairs when scrolled to', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/band/`);
    await hydrated(page);
    await page.locator('#tracking').scrollIntoViewIfNeeded();
    await expect.poll(() => valueOf(page, 'out-osc-L')).toBeGreaterThan(0);
    await page.locator('#pairs').scrollIntoViewIfNeeded();
    await expect.poll(() => page.locator('#pairs-table tbody tr').count()).toBeGreaterThan(0);
    // each pair's nominal resonance lies inside its own worst-case spread
    const cells = await page.locator('#pairs-table tbody tr').evaluateAll((rows) => rows.map((r) => {
      const c = r.querySelectorAll('td');
      return { f: Number(c[1].dataset.value), low: Number(c[3].dataset.low), high: Number(c[3].dataset.high) };
    }));
    for (const c of cells) {
      expect(c.low).toBeLessThan(c.f);
      expect(c.high).toBeGreaterThan(c.f);
    }
    expect(errors).toEqual([]);
  });
});
