/**
 * The Tank bench, driven as a technician would: typing a tank, bad input, a
 * bookmarked link, a hostile link, a coil handed over from the Coil bench,
 * and both downloads. Expected values are computed here, independently of
 * the core, from the textbook rules: Thomson's formula, 1/Q_u = Σ 1/Q_i and
 * 1/Q_L = 1/Q_u + 1/Q_e (Pozar, Microwave Engineering), R_D = Q ω L and
 * B = f0/Q_L (Terman, Radio Engineers' Handbook, 1943). The bench computes
 * the exact response, which differs from these rules by O(1/Q²): tolerances
 * below allow for that and no more.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { browserAvailable, hydrated, openPage, retype, expectHostileLinkIgnored, useSiteAndBrowser, valueOf } from './harness';

const TWO_PI = 2 * Math.PI;
const thomson = (L: number, C: number) => 1 / (TWO_PI * Math.sqrt(L * C));

function expectRelative(actual: number, expected: number, tolerance: number) {
  expect(Math.abs(actual / expected - 1)).toBeLessThan(tolerance);
}

describe.runIf(browserAvailable())('Tank bench in Chromium', () => {
  const env = useSiteAndBrowser();

  it('computes resonance, loaded Q and bandwidth of a typed parallel tank (Terman 1943 rules)', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/`);
    await hydrated(page);
    await page.locator('input[name=mode][value=parallel]').check();
    await retype(page, 'L', '10u');
    await retype(page, 'coilQ', '120');
    await retype(page, 'C', '220p');
    await retype(page, 'capQ', '2000');
    await retype(page, 'Rs', '22k');
    await retype(page, 'Rload', '22k');
    // Independent numbers: a 10 µH, 220 pF tank between two 22 kΩ terminations.
    const L = 10e-6, C = 220e-12, Rs = 22e3, Rl = 22e3;
    const f0 = thomson(L, C); // Terman 1943
    const X = TWO_PI * f0 * L;
    const Qu = 1 / (1 / 120 + 1 / 2000); // Pozar: 1/Q_u = Σ 1/Q_i
    const Qe = (Rs * Rl) / (Rs + Rl) / X; // terminations across the tank
    const QL = 1 / (1 / Qu + 1 / Qe); // Pozar: 1/Q_L = 1/Q_u + 1/Q_e
    const B = f0 / QL; // Terman 1943
    const RD = Qu * X; // Terman 1943: R_D = Q ω L
    await expect.poll(async () => Math.abs(await valueOf(page, 'out-ql') / QL - 1)).toBeLessThan(1e-3);
    expectRelative(await valueOf(page, 'out-f'), f0, 1 / Qu ** 2);
    expectRelative(await valueOf(page, 'out-qu'), Qu, 1e-6);
    expectRelative(await valueOf(page, 'out-bw'), B, 2 / QL ** 2);
    expectRelative(await valueOf(page, 'out-rd'), RD, 2 / Qu ** 2);
    // single-resonator insertion loss, −20 log10(1 − Q_L/Q_u) (common practice, no published source)
    expect(await valueOf(page, 'out-il')).toBeCloseTo(-20 * Math.log10(1 - QL / Qu), 4);
    // 1 V across the tank: the capacitor sees the tank voltage, the coil carries about V/(ωL)
    expect(await valueOf(page, 'out-vc')).toBeCloseTo(1, 2);
    expectRelative(await valueOf(page, 'out-icirc'), 1 / X, 0.01);
    expect(await page.locator('#out-f').textContent()).toContain('MHz');
    // the plots draw (uPlot loads on demand)
    await expect.poll(() => page.locator('#plot-response canvas').count(), { timeout: 10_000 }).toBeGreaterThan(0);
    await expect.poll(() => page.locator('#plot-z canvas').count(), { timeout: 10_000 }).toBeGreaterThan(0);
    expect(errors).toEqual([]);
  });

  it('cautions, with a link to the Cautions page, when power makes the tank dangerous or exceeds a rating', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/?mode=parallel&L=4.7u&coilQ=150&C=100p&capQ=1000&drive=P&P=100&Vrating=500&Irating=1`);
    await hydrated(page);
    // 100 W into R_D = Q_u·ωL ≈ 28 kΩ in parallel with the bench's default 10 kΩ load gives V = √(P R)
    // ≈ 860 V RMS: above the 50 V AC extra-low-voltage limit (IEC 61140), above a 500 V capacitor
    // rating, and I ≈ V/(ωL) ≈ 4 A circulating through a 1 A wire (Terman 1943: R_D = Q ω L)
    const cautions = page.locator('.tw-note--caution');
    await expect.poll(() => cautions.count()).toBe(3);
    const text = (await cautions.allTextContents()).join(' ');
    expect(text).toMatch(/50 V/);
    expect(text).toMatch(/local codes and licensed practice/);
    expect(await cautions.first().locator('a[href="/cautions/"]').count()).toBe(1);
    const X = Math.sqrt(4.7e-6 / 100e-12); // ωL at resonance = √(L/C)
    const R = 1 / (1 / ((1 / (1 / 150 + 1 / 1000)) * X) + 1 / 10e3);
    expectRelative(await valueOf(page, 'out-vc'), Math.sqrt(100 * R), 0.01);
    expect(errors).toEqual([]);
  });

  it('computes a series tank between low resistances', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/`);
    await hydrated(page);
    await page.locator('input[name=mode][value=series]').check();
    // the demo terminations follow the tank: high across a parallel tank, low in a series loop
    expect(await page.locator('#Rs').inputValue()).toBe('5 Ω');
    expect(await page.locator('#Rload').inputValue()).toBe('5 Ω');
    await retype(page, 'L', '2.2u');
    await retype(page, 'coilQ', '200');
    await retype(page, 'C', '470p');
    await retype(page, 'capQ', '1500');
    await retype(page, 'Rs', '2');
    await retype(page, 'Rload', '3');
    const L = 2.2e-6, C = 470e-12;
    const f0 = thomson(L, C); // Terman 1943
    const X = TWO_PI * f0 * L;
    const Qu = 1 / (1 / 200 + 1 / 1500); // Pozar
    const Qe = X / (2 + 3); // source and load in series with the loop
    const QL = 1 / (1 / Qu + 1 / Qe); // Pozar
    await expect.poll(async () => Math.abs(await valueOf(page, 'out-ql') / QL - 1)).toBeLessThan(1e-3);
    expectRelative(await valueOf(page, 'out-f'), f0, 1e-6); // a series RLC dips exactly at f0
    expectRelative(await valueOf(page, 'out-bw'), f0 / QL, 2 / QL ** 2); // Terman 1943
    expectRelative(await valueOf(page, 'out-rd'), X / Qu, 1e-6); // series resistance at resonance
    expect(await page.locator('#out-rd').textContent()).toMatch(/Resistance at resonance/);
    expect(errors).toEqual([]);
  });

  it('shows a clear message at the field for bad input, keeps the last result marked stale, no console error', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/?mode=parallel&L=4.7u&coilQ=150&C=100p&capQ=1000&Rs=10k&Rload=10k`);
    await hydrated(page);
    await expect.poll(() => valueOf(page, 'out-ql')).toBeGreaterThan(0);
    const before = await valueOf(page, 'out-ql');
    await retype(page, 'L', '4.7 pF');
    await expect.poll(() => page.locator('#L-msg').textContent()).toMatch(/capacitance/i);
    expect(await page.locator('#L').getAttribute('aria-invalid')).toBe('true');
    expect(await page.locator('#L').inputValue()).toBe('4.7 pF');
    expect(await valueOf(page, 'out-ql')).toBe(before);
    expect(await page.locator('#out-ql').getAttribute('class')).toContain('stale');
    await retype(page, 'L', '4.7u');
    await retype(page, 'coilQ', 'lots');
    await expect.poll(() => page.locator('#coilQ-msg').textContent()).toMatch(/not a plain number/i);
    await retype(page, 'coilQ', '-5');
    await expect.poll(() => page.locator('#coilQ-msg').textContent()).toMatch(/greater than zero/i);
    // an objection from the core, shown at the field it names: a coil this lossy leaves no resonance
    await retype(page, 'coilQ', '0.5');
    await expect.poll(() => page.locator('#coilQ-msg').textContent()).toMatch(/hardly resonates/i);
    expect(await page.locator('#out-ql').getAttribute('class')).toContain('stale');
    expect(await valueOf(page, 'out-ql')).toBe(before);
    await retype(page, 'coilQ', '150');
    await expect.poll(() => page.locator('#coilQ-msg').count()).toBe(0);
    expect(await page.locator('#out-ql').getAttribute('class')).not.toContain('stale');
    expect(await valueOf(page, 'out-ql')).toBeCloseTo(before, 10);
    expect(errors).toEqual([]);
  });

  it('restores a design from its URL, and writes the design into the URL', async () => {
    const { page } = await openPage(env.browser, `${env.site.origin}/tank/?mode=series&L=1u&coilLoss=R&Rcoil=0.5&C=1n&capLoss=ESR&ESR=20m&Rs=1&Rload=1&drive=P&P=5`);
    await hydrated(page);
    expect(await page.locator('input[name=mode][value=series]').isChecked()).toBe(true);
    expect(await page.locator('#Rcoil').inputValue()).toBe('0.5');
    expect(await page.locator('#ESR').inputValue()).toBe('20m');
    expect(await page.locator('#P').inputValue()).toBe('5');
    const f0 = thomson(1e-6, 1e-9);
    await expect.poll(() => valueOf(page, 'out-f')).toBeGreaterThan(0);
    expectRelative(await valueOf(page, 'out-f'), f0, 1e-6);
    // Q_L = X / (R_coil + ESR + R_s + R_load) for a series loop (Pozar)
    expectRelative(await valueOf(page, 'out-ql'), (TWO_PI * f0 * 1e-6) / 2.52, 1e-3);
    await retype(page, 'C', '680p');
    await expect.poll(() => page.url()).toContain('C=680p');
    const again = await openPage(env.browser, page.url());
    await hydrated(again.page);
    expect(await again.page.locator('#C').inputValue()).toBe('680p');
    expect(await again.page.locator('input[name=capLoss][value=ESR]').isChecked()).toBe(true);
    expect(await again.page.locator('input[name=drive][value=P]').isChecked()).toBe(true);
    await expect.poll(() => valueOf(again.page, 'out-f')).toBeGreaterThan(0);
    expectRelative(await valueOf(again.page, 'out-f'), thomson(1e-6, 680e-12), 1e-6);
  });

  it('ignores a hostile query string with a visible notice and never injects it', async () => {
    const hostile = `?mode=<img src=x onerror=alert(1)>&L=<script>window.__pwned=1</script>&coilQ=1e999x&C=${'9'.repeat(500)}&Rs=10k&zap=1`;
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/${hostile}`);
    await hydrated(page);
    await expectHostileLinkIgnored(page);
    expect(await page.locator('#L').inputValue()).toBe('4.7 µH');
    expect(await page.locator('#coilQ').inputValue()).toBe('150');
    expect(await page.locator('#Rs').inputValue()).toBe('10k');
    expect(await page.locator('#handoff').count()).toBe(0);
    expect(errors).toEqual([]);
  });

  it('accepts a coil handed over from the Coil bench (L, coilQ, Cself, f)', async () => {
    const query = new URLSearchParams({ L: '4.7000 µH', coilQ: '180', Cself: '3.2 pF', f: '7.1000 MHz' });
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/?${query}`);
    await hydrated(page);
    await expect.poll(() => page.locator('#handoff').count()).toBe(1);
    expect(await page.locator('#handoff').textContent()).toMatch(/Coil bench/);
    expect(await page.locator('#L').inputValue()).toBe('4.7000 µH');
    expect(await page.locator('#coilQ').inputValue()).toBe('180');
    expect(await page.locator('#Cself').inputValue()).toBe('3.2 pF');
    expect(await page.locator('#f').inputValue()).toBe('7.1000 MHz');
    expect(await page.locator('input[name=coilLoss][value=Q]').isChecked()).toBe(true);
    expect(await page.locator('.tw-link-notices').count()).toBe(0);
    // the self-capacitance adds to the bench's 100 pF capacitor (Terman 1943)
    await expect.poll(() => valueOf(page, 'out-f')).toBeGreaterThan(0);
    expectRelative(await valueOf(page, 'out-f'), thomson(4.7e-6, 103.2e-12), 1e-4);
    // Q given at 7.1 MHz, carried to resonance as a fixed resistance: ωL/Q at 7.1 MHz
    const fr = await valueOf(page, 'out-f');
    expectRelative(await valueOf(page, 'out-qcoil'), (180 * fr) / 7.1e6, 1e-3);
    expect(errors).toEqual([]);
  });

  it('works from the keyboard alone', async () => {
    const { page } = await openPage(env.browser, `${env.site.origin}/tank/`);
    await hydrated(page);
    await page.locator('input[name=mode][value=parallel]').focus();
    await page.keyboard.press('ArrowRight'); // radio group: parallel → series
    expect(await page.locator('input[name=mode][value=series]').isChecked()).toBe(true);
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('L');
    await page.keyboard.press('Control+A');
    await page.keyboard.type('2u2');
    await expect.poll(() => page.locator('#L').inputValue()).toBe('2u2');
    // 2.2 µH with the 100 pF demo capacitor (Terman 1943)
    await expect.poll(async () => Math.abs(await valueOf(page, 'out-f') / thomson(2.2e-6, 100e-12) - 1)).toBeLessThan(1e-6);
  });

  it('downloads the SPICE netlist and the sweep as CSV', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/?mode=parallel&L=4.7u&coilQ=150&Cself=3p&C=100p&capQ=1000&Rs=10k&Rload=10k`);
    await hydrated(page);
    await expect.poll(() => valueOf(page, 'out-f')).toBeGreaterThan(0);
    const f0 = await valueOf(page, 'out-f');

    const [cir] = await Promise.all([page.waitForEvent('download'), page.locator('#dl-netlist').click()]);
    expect(cir.suggestedFilename()).toMatch(/^tankwright-parallel-tank-.*\.cir$/);
    const netlist = readFileSync((await cir.path())!, 'utf8');
    for (const element of ['Idrive ', 'Rsource ', 'Rcoil ', 'Lcoil ', 'Cself ', 'Ctank ', 'Resr ', 'Rload ']) {
      expect(netlist).toMatch(new RegExp(`^${element}`, 'm'));
    }
    expect(netlist).toMatch(/^Lcoil \S+ \S+ 4\.70000000000e-6$/m);
    expect(netlist).toMatch(/^\.ac /m);
    expect(netlist.trimEnd().endsWith('.end')).toBe(true);

    const [csv] = await Promise.all([page.waitForEvent('download'), page.locator('#dl-csv').click()]);
    expect(csv.suggestedFilename()).toMatch(/^tankwright-parallel-sweep-.*\.csv$/);
    const lines = readFileSync((await csv.path())!, 'utf8').trimEnd().split('\n');
    expect(lines[0]).toBe('frequency_Hz,impedance_magnitude_ohm,impedance_phase_deg,response_dB');
    const rows = lines.slice(1).map((l) => l.split(',').map(Number));
    expect(rows.length).toBe(1000);
    expect(rows.every((r) => r.length === 4 && r.every(Number.isFinite))).toBe(true);
    expect(rows.every((r, i) => i === 0 || r[0] > rows[i - 1][0])).toBe(true);
    // the |Z| column peaks at the resonance the bench shows, within the sweep's step
    const peak = rows.reduce((best, r) => (r[1] > best[1] ? r : best));
    expectRelative(peak[0], f0, 2e-3);
    // the response column is 0 dB at its peak and below it everywhere
    expect(Math.max(...rows.map((r) => r[3]))).toBeCloseTo(0, 3);
    expect(errors).toEqual([]);
  });
});
