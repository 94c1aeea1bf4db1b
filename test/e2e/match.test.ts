/**
 * The Match bench, driven as a technician would: a coil handed over in a
 * link with a 50 Ω antenna, through to the tap and a loaded Q near the one
 * asked, with the antenna straight across the top checked against
 * 1/Q_L = 1/Q_u + ω₀L (1/R_s + 1/R_load) (Pozar, Microwave Engineering) and
 * Thomson's formula (Terman 1943) written here; bad input (a tap beyond the
 * coil, a source the tank cannot step down to, a loaded Q above the unloaded
 * Q) answered at its field while the last answer stays, dimmed; the link
 * round trip; the options, the plot, the drawing and the netlist when
 * scrolled to; and a coil from the Coil bench winding the same turns here.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { DesignCoilSpec } from '../../src/core/coil';
import { awgDiameter, enamelledDiameter } from '../../src/core/wire';
import { encodeLink } from '../../components/kit/fields';
import { coilSnapshotFromSpec } from '../../components/benches/coilDesign';
import { COIL_FIELDS } from '../../components/benches/coilFields';
import { matchLinkFor } from '../../components/benches/matchLinks';
import { browserAvailable, expectHostileLinkIgnored, hydrated, openPage, retype, useSiteAndBrowser, valueOf } from './harness';
import { rel } from '../helpers/asserts';

/** Text of a field's message, or null when it has none. */
async function messageAt(page: Page, key: string): Promise<string | null> {
  const m = page.locator(`#${key}-msg`);
  return (await m.count()) ? m.textContent() : null;
}

const stale = async (page: Page) => (await page.locator('#summary').getAttribute('class'))?.includes('tw-summary--stale') ?? false;

/** Demo coil (invented, our own workshop): 4.7 µH on a 10 mm former, AWG 22 grade 1 enamel, close-wound, 10 mm leads. */
const wd = awgDiameter(22);
const od = enamelledDiameter(wd, 1);
const COIL: DesignCoilSpec = { form: 'solenoid', inductance: 4.7e-6, diameter: 10e-3 + od, closeWound: true, wire: { diameter: wd, insulatedDiameter: od }, leadLength: 0.01 };

describe.runIf(browserAvailable())('Match bench in Chromium', () => {
  const env = useSiteAndBrowser();

  it('a coil handed over with a 50 Ω antenna: the tap in half turns, a loaded Q near the one asked, and the antenna straight across collapsing the tank', async () => {
    const href = matchLinkFor({ coil: COIL, capacitance: 100e-12, sourceResistance: 50, loadResistance: 1000 });
    const { page, errors } = await openPage(env.browser, `${env.site.origin}${href}`);
    await hydrated(page);
    expect(await page.locator('.tw-link-notices').count()).toBe(0);
    expect(await page.locator('#D').inputValue()).toMatch(/^10\.6\d* mm$/);
    const tap = await valueOf(page, 'sum-build');
    const turns = await valueOf(page, 'out-turns');
    expect(Number.isInteger(2 * tap)).toBe(true);
    expect(tap).toBeGreaterThanOrEqual(0.5);
    expect(tap).toBeLessThan(turns);
    expect(await page.locator('#sum-build dt').textContent()).toMatch(/Antenna tap/);
    // the loaded Q asked (12) within the 25 % the recommendation allows, and B = f/Q_L
    const q = await valueOf(page, 'sum-ql');
    expect(Math.abs(q / 12 - 1)).toBeLessThan(0.25);
    const f0 = await valueOf(page, 'out-f0');
    expect(rel(await valueOf(page, 'sum-bw'), f0 / q)).toBeLessThan(0.01);
    // straight across: ω₀L = 1/(ω₀C) at resonance (Thomson), then 1/Q_L = 1/Q_u + ω₀L (1/50 + 1/1000) (Pozar)
    const x = 1 / (2 * Math.PI * f0 * 100e-12);
    const direct = 1 / (1 / (await valueOf(page, 'out-Qu')) + x * (1 / 50 + 1 / 1000));
    expect(rel(await valueOf(page, 'sum-direct'), direct)).toBeLessThan(1e-3);
    expect(direct).toBeLessThan(0.3);
    expect(errors).toEqual([]);
  });

  it('bad input is answered at its field: a tap beyond the coil, a source the tank cannot step down to, a loaded Q above the unloaded Q; the answer stays, dimmed', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/match/`);
    await hydrated(page);
    const tap = await valueOf(page, 'sum-build');
    const turns = await valueOf(page, 'out-turns');
    await retype(page, 'loadTap', '50');
    await expect.poll(() => messageAt(page, 'loadTap')).toMatch(new RegExp(`beyond the coil: it has only ${turns} turns`));
    expect(await stale(page)).toBe(true);
    expect(await valueOf(page, 'sum-build')).toBe(tap);
    await retype(page, 'loadTap', '');
    await expect.poll(() => messageAt(page, 'loadTap')).toBeNull();
    await retype(page, 'Rs', '100k');
    await expect.poll(() => messageAt(page, 'Rs')).toMatch(/100 kΩ source .*a tap can only lighten the load/);
    expect(await stale(page)).toBe(true);
    await retype(page, 'Rs', '50');
    await retype(page, 'QL', '500');
    await expect.poll(() => messageAt(page, 'QL')).toMatch(/cannot be reached: the tank's own \(unloaded\) Q is only/);
    expect(await stale(page)).toBe(true);
    expect(await valueOf(page, 'sum-build')).toBe(tap);
    await retype(page, 'QL', '12');
    await expect.poll(() => stale(page)).toBe(false);
    expect(await messageAt(page, 'QL')).toBeNull();
    expect(await valueOf(page, 'sum-build')).toBe(tap);
    expect(errors).toEqual([]);
  });

  it('keeps everything in the link', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/match/`);
    await hydrated(page);
    await page.locator('input[name=tune][value=f]').check();
    await retype(page, 'f', '3.6 MHz');
    await page.locator('input[name=goal][value=match]').check();
    await page.locator('input[name=loadAt][value=top]').check();
    await retype(page, 'Rload', '100k');
    await retype(page, 'Rs', '75');
    await expect.poll(() => page.url()).toMatch(/goal=match/);
    await expect.poll(() => page.url()).toMatch(/Rload=100k/);
    await expect.poll(() => stale(page)).toBe(false);
    const build = await page.locator('#sum-build output').textContent();
    const f0 = await valueOf(page, 'out-f0');
    expect(rel(f0, 3.6e6)).toBeLessThan(1e-4);
    const { page: again } = await openPage(env.browser, page.url());
    await hydrated(again);
    expect(await again.locator('#f').inputValue()).toBe('3.6 MHz');
    expect(await again.locator('#Rs').inputValue()).toBe('75');
    expect(await again.locator('input[name=loadAt][value=top]').isChecked()).toBe(true);
    await expect.poll(() => again.locator('#sum-build output').textContent()).toBe(build);
    expect(await valueOf(again, 'out-f0')).toBe(f0);
    expect(errors).toEqual([]);
  });

  it('a hostile link is ignored with a notice', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/match/?Rs=%3Cimg%20src%3Dx%20onerror%3D%22window.__pwned%3D1%22%3E&QL=12`);
    await hydrated(page);
    await expectHostileLinkIgnored(page);
    expect(errors).toEqual([]);
  });

  it('the options side by side, the return-loss plot, the drawing and the netlist appear when scrolled to', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/match/`);
    await hydrated(page);
    await page.locator('#options').scrollIntoViewIfNeeded();
    await expect.poll(() => page.locator('#options-table tbody tr').count()).toBe(5);
    expect(await page.locator('#opt-tap').getAttribute('class')).toContain('match-recommended');
    // the table's tap row is the answer's
    expect(Number(await page.locator('#opt-tap td[data-label="Loaded Q"]').getAttribute('data-value'))).toBe(await valueOf(page, 'sum-ql'));
    await page.locator('#plot-part').scrollIntoViewIfNeeded();
    await expect.poll(() => page.locator('#plot-rl canvas').count(), { timeout: 10_000 }).toBeGreaterThan(0);
    expect(await page.locator('#plot-rl').textContent()).toMatch(/No match/);
    // the curves follow what is typed (once the browser is idle): more capacitance, a lower f₀, a lower sweep
    const first = Number(await page.locator('#plot-rl').getAttribute('data-x-first'));
    await retype(page, 'C', '150p');
    await expect.poll(async () => Number(await page.locator('#plot-rl').getAttribute('data-x-first'))).toBeLessThan(first);
    await expect.poll(() => page.locator('#plot-rl').getAttribute('class')).not.toContain('tw-result--stale');
    await retype(page, 'C', '100p');
    await page.locator('#build-part').scrollIntoViewIfNeeded();
    await expect.poll(() => page.locator('#netlist').count()).toBe(1);
    const netlist = (await page.locator('#netlist').textContent())!;
    expect(netlist).toMatch(/^K1_0_1 Lcoil1 Lcoil2 /m);
    expect(netlist).toMatch(/^\.ac lin 2001 /m);
    expect(await page.locator('#dl-netlist').getAttribute('href')).toMatch(/^blob:/);
    expect(await page.locator('#coil-sketch .sk-tap--antenna').count()).toBe(1);
    expect(await page.locator('#coil-sketch figcaption').textContent()).toMatch(new RegExp(`Antenna tap, ${await valueOf(page, 'sum-build')} turns from the cold end`));
    await page.locator('#build').selectOption('link');
    await expect.poll(() => page.locator('#coil-sketch .sk-link').count()).toBeGreaterThan(0);
    await expect.poll(() => page.locator('#netlist').textContent()).toMatch(/^Llink lk 0 /m);
    await page.locator('#build').selectOption('capacitiveDivider');
    await expect.poll(() => page.locator('#netlist').textContent()).toMatch(/^Cupper top mid /m);
    await expect.poll(() => page.url()).toMatch(/build=capacitiveDivider/);
    expect(errors).toEqual([]);
  });

  it('a reader who flings past the options, the plot and the netlist to the end of the page still gets them', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/match/`);
    await hydrated(page);
    await page.evaluate(() => window.scrollTo(0, document.documentElement.scrollHeight));
    for (const id of ['options-table', 'card-tap', 'plot-rl', 'netlist']) await page.locator(`#${id}`).waitFor({ state: 'attached' });
    expect(errors).toEqual([]);
  });

  it('a coil from the Coil bench winds the same turns here', async () => {
    const coil: DesignCoilSpec = { ...COIL, inductance: 2.2e-6, frequency: 14.2e6 };
    const { page: coilPage, errors: coilErrors } = await openPage(env.browser, `${env.site.origin}/coil/?${encodeLink(COIL_FIELDS, coilSnapshotFromSpec(coil))}`);
    await hydrated(coilPage);
    expect(await coilPage.locator('.tw-link-notices').count()).toBe(0);
    const turns = await valueOf(coilPage, 'out-turns');
    const { page, errors } = await openPage(env.browser, `${env.site.origin}${matchLinkFor({ coil })}`);
    await hydrated(page);
    expect(await page.locator('.tw-link-notices').count()).toBe(0);
    // tuned to the Coil bench's working frequency
    expect(await page.locator('input[name=tune][value=f]').isChecked()).toBe(true);
    await expect.poll(() => valueOf(page, 'out-turns')).toBe(turns);
    expect(rel(await valueOf(page, 'out-f0'), 14.2e6)).toBeLessThan(1e-4);
    expect([...errors, ...coilErrors]).toEqual([]);
  });
});
