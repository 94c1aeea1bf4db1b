/**
 * The Coil bench, driven as a technician would: a coil designed from a target
 * inductance, the same coil from its turns, a toroid, bad input, a bookmarked
 * link, a hostile link and the hand-off to the tank bench. Expected values are
 * computed here, independently of the core, from the formulas named beside
 * each check.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { browserAvailable, hydrated, openPage, retype, expectHostileLinkIgnored, useSiteAndBrowser, valueOf } from './harness';

const MU0 = 1.25663706212e-6; // CODATA 2018
const RHO_CU = 1 / 58e6; // IEC 60028, annealed copper at 20 °C, Ω·m

/** Wheeler 1928 (Proc. IRE 16): L[µH] = r²N²/(9r + 10l), r and l in inches; within about 1 % for l > 0.4 D. */
function wheeler(radius: number, length: number, turns: number): number {
  const r = radius / 0.0254;
  const l = length / 0.0254;
  return ((r * r * turns * turns) / (9 * r + 10 * l)) * 1e-6;
}

/** Turns for an inductance by Wheeler's formula at fixed pitch (bisection; l = N p). */
function wheelerTurns(radius: number, pitch: number, target: number): number {
  let lo = 0.5;
  let hi = 1e5;
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (wheeler(radius, mid * pitch, mid) < target) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

async function choose(page: Page, name: string, value: string) {
  await page.locator(`input[name=${name}][value=${value}]`).check();
}

describe.runIf(browserAvailable())('Coil bench in Chromium', () => {
  const env = useSiteAndBrowser();

  it('designs a spaced single-layer coil from a target inductance, then finds the inductance from turns', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/coil/`);
    await hydrated(page);
    await choose(page, 'form', 'solenoid');
    await choose(page, 'give', 'L');
    await choose(page, 'dia', 'former');
    await choose(page, 'wind', 'pitch');
    await choose(page, 'wire', 'mm');
    await page.locator('#enamel').selectOption('bare');
    await retype(page, 'wd', '1 mm');
    await retype(page, 'D', '20 mm');
    await retype(page, 'p', '2 mm');
    await retype(page, 'lead', '15 mm');
    await retype(page, 'f', '3.5 MHz');
    await retype(page, 'L', '2 µH');
    await expect.poll(() => valueOf(page, 'out-turns')).toBeGreaterThan(0);

    // Former 20 mm + one bare 1 mm wire = 21 mm centre to centre (geometry)
    const D = 0.021;
    expect(await valueOf(page, 'out-D')).toBeCloseTo(D, 12);
    const exact = wheelerTurns(D / 2, 2e-3, 2e-6);
    const turns = await valueOf(page, 'out-turns');
    // practical turns are whole or half turns
    expect(Number.isInteger(turns * 2)).toBe(true);
    // Wheeler 1928 solved for N: the core's Nagaoka–Rosa turns agree within 3 %
    // (Wheeler's sheet formula ~1 %, plus Rosa's round-wire correction ~1–2 % here)
    const detail = await page.locator('#out-turns-detail').textContent();
    const shownExact = Number(/Exactly ([\d.]+) turns/.exec(detail ?? '')?.[1]);
    expect(Math.abs(shownExact / exact - 1)).toBeLessThan(0.03);
    expect(Math.abs(turns - shownExact)).toBeLessThanOrEqual(0.25);
    // The inductance as wound, against Wheeler 1928 at the wound turns
    const L = await valueOf(page, 'out-L');
    expect(Math.abs(L / wheeler(D / 2, turns * 2e-3, turns) - 1)).toBeLessThan(0.03);
    // The comparison row is Wheeler's formula itself (Wheeler 1928)
    expect(Math.abs((await valueOf(page, 'out-wheeler')) / wheeler(D / 2, turns * 2e-3, turns) - 1)).toBeLessThan(1e-9);
    // Winding length l = N p, wire ℓ = N √((πD)² + p²) + 2 leads (helix geometry)
    expect(await valueOf(page, 'out-len')).toBeCloseTo(turns * 2e-3, 12);
    const wire = turns * Math.hypot(Math.PI * D, 2e-3) + 2 * 0.015;
    expect(await valueOf(page, 'out-wire')).toBeCloseTo(wire, 10);
    // R_dc = ρ ℓ / (π d²/4), IEC 60028 copper at 20 °C
    const rdc = (RHO_CU * wire) / ((Math.PI * 1e-6) / 4);
    expect(Math.abs((await valueOf(page, 'out-rdc')) / rdc - 1)).toBeLessThan(1e-9);
    // AC resistance above DC at 3.5 MHz (skin depth 35 µm ≪ 0.5 mm radius; Terman 1943)
    expect(await valueOf(page, 'out-rac')).toBeGreaterThan(5 * rdc);
    // Q with its stated uncertainty on screen
    expect(await valueOf(page, 'out-q')).toBeGreaterThan(50);
    expect(await page.locator('#out-q-range').textContent()).toMatch(/uncertainty ±\d+ %/);
    // Self-resonance from the shown self-capacitance, Thomson's formula (lumped model)
    const cs = await valueOf(page, 'out-cself');
    expect(cs).toBeGreaterThan(0.3e-12);
    expect(cs).toBeLessThan(3e-12);
    const srf = await valueOf(page, 'out-srf');
    expect(Math.abs(srf / (1 / (2 * Math.PI * Math.sqrt(L * cs))) - 1)).toBeLessThan(0.02);
    // Apparent inductance L/(1 − ω²LC) is above the inductance at f, which is at least the
    // low-frequency value less the wire's whole internal inductance ¼ μ0 r N (Terman 1943; Rosa 1907)
    expect(await valueOf(page, 'out-lapp')).toBeGreaterThan(L - 0.25 * MU0 * (D / 2) * turns);

    // Turns → inductance with the same geometry
    await choose(page, 'give', 'N');
    await retype(page, 'N', '12');
    await expect.poll(() => page.locator('#out-L').getAttribute('class')).not.toContain('stale');
    const L12 = await valueOf(page, 'out-L');
    // Wheeler 1928 at N = 12, l = 24 mm, D = 21 mm: within 3 %
    expect(Math.abs(L12 / wheeler(D / 2, 12 * 2e-3, 12) - 1)).toBeLessThan(0.03);
    expect(await page.locator('#out-turns').count()).toBe(0);

    // The plot of Q and apparent inductance loads on demand and draws
    await expect.poll(() => page.locator('#coil-plot canvas').count(), { timeout: 10_000 }).toBeGreaterThan(0);
    expect(await page.locator('#coil-plot .tw-field-msg').count()).toBe(0);
    expect(errors).toEqual([]);
  });

  it('computes a toroid from its dimensions and μr, and from a typed AL', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/coil/`);
    await hydrated(page);
    await choose(page, 'form', 'toroid');
    await choose(page, 'give', 'N');
    await choose(page, 'core', 'mu');
    await retype(page, 'OD', '12.7 mm');
    await retype(page, 'ID', '7.7 mm');
    await retype(page, 'h', '4.8 mm');
    await retype(page, 'mu', '10');
    await retype(page, 'mu2', '0.1');
    await retype(page, 'N', '20');
    await retype(page, 'f', '7 MHz');
    // L = μ0 μr N² h ln(OD/ID) / 2π (Ampère's law; Grover 1946, toroidal coils)
    const expected = (MU0 * 10 * 400 * 4.8e-3 * Math.log(12.7 / 7.7)) / (2 * Math.PI);
    await expect.poll(async () => Math.abs((await valueOf(page, 'out-L')) / expected - 1)).toBeLessThan(1e-9);
    expect(Math.abs((await valueOf(page, 'out-al')) / (expected / 400) - 1)).toBeLessThan(1e-9);
    // Q of core and winding combined: 1/Q = μ''/μ' + 1/Q_w ≤ μ'/μ'' = 100 (Snelling 1988)
    const q = await valueOf(page, 'out-q');
    expect(q).toBeGreaterThan(10);
    expect(q).toBeLessThan(100);

    // AL typed: L = AL N²; and turns for a target N = √(L/AL)
    await choose(page, 'core', 'al');
    await retype(page, 'AL', '5 nH');
    await expect.poll(() => valueOf(page, 'out-L')).toBeCloseTo(5e-9 * 400, 15);
    await choose(page, 'give', 'L');
    await retype(page, 'L', '1 µH');
    // √(1 µH / 5 nH) = 14.14 → 14 whole turns, 14² · 5 nH = 980 nH (definition of AL)
    await expect.poll(() => valueOf(page, 'out-turns')).toBe(14);
    expect(await valueOf(page, 'out-L')).toBeCloseTo(980e-9, 15);
    expect(errors).toEqual([]);
  });

  it('shows bad input at its field, keeps the last result marked stale, and logs no console error', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/coil/?form=solenoid&give=N&N=10&dia=mean&D=15mm&wind=pitch&p=1.5mm&wire=mm&wd=0.8mm&enamel=bare&f=7MHz`);
    await hydrated(page);
    await expect.poll(() => valueOf(page, 'out-L')).toBeGreaterThan(0);
    const before = await valueOf(page, 'out-L');
    // text that is not a length: message at the field, text kept
    await retype(page, 'D', '15 pF');
    await expect.poll(() => page.locator('#D-msg').textContent()).toMatch(/length|capacitance/i);
    expect(await page.locator('#D').inputValue()).toBe('15 pF');
    expect(await page.locator('#D').getAttribute('aria-invalid')).toBe('true');
    expect(await valueOf(page, 'out-L')).toBe(before);
    expect(await page.locator('#out-L').getAttribute('class')).toContain('stale');
    await retype(page, 'D', '15 mm');
    await expect.poll(() => page.locator('#D-msg').count()).toBe(0);
    // a pitch smaller than the wire: the core's sentence at the pitch field
    await retype(page, 'p', '0.5 mm');
    await expect.poll(() => page.locator('#p-msg').textContent()).toMatch(/overlap/);
    expect(await page.locator('#out-L').getAttribute('class')).toContain('stale');
    await retype(page, 'p', '1.5 mm');
    await expect.poll(() => page.locator('#p-msg').count()).toBe(0);
    // turns that are not a number
    await retype(page, 'N', 'ten');
    await expect.poll(() => page.locator('#N-msg').textContent()).toMatch(/plain number/);
    await retype(page, 'N', '10');
    // a working frequency above self-resonance
    await retype(page, 'f', '2 GHz');
    await expect.poll(() => page.locator('#f-msg').textContent()).toMatch(/self-resonance/);
    await retype(page, 'f', '7 MHz');
    await expect.poll(() => page.locator('#out-L').getAttribute('class')).not.toContain('stale');
    expect(await valueOf(page, 'out-L')).toBe(before);
    expect(errors).toEqual([]);
  });

  it('restores a design from its URL and writes the design into the URL', async () => {
    const url = `${env.site.origin}/coil/?form=toroid&give=N&N=25&core=mu&OD=20mm&ID=10mm&h=6mm&mu=8&mu2=0.2&wire=awg&awg=26&enamel=2&f=3.6MHz&lead=20mm&T=40`;
    const { page } = await openPage(env.browser, url);
    await hydrated(page);
    expect(await page.locator('input[name=form][value=toroid]').isChecked()).toBe(true);
    expect(await page.locator('#N').inputValue()).toBe('25');
    expect(await page.locator('#OD').inputValue()).toBe('20mm');
    expect(await page.locator('#awg').inputValue()).toBe('26');
    expect(await page.locator('#enamel').inputValue()).toBe('2');
    expect(await page.locator('#T').inputValue()).toBe('40');
    // μ0 μr N² h ln(OD/ID)/2π (Grover 1946)
    const expected = (MU0 * 8 * 625 * 6e-3 * Math.log(2)) / (2 * Math.PI);
    await expect.poll(async () => Math.abs((await valueOf(page, 'out-L')) / expected - 1)).toBeLessThan(1e-9);
    await retype(page, 'N', '30');
    await expect.poll(() => page.url()).toContain('N=30');
    expect(page.url()).toContain('awg=26');
    const again = await openPage(env.browser, page.url());
    await hydrated(again.page);
    expect(await again.page.locator('#N').inputValue()).toBe('30');
    expect(await again.page.locator('input[name=form][value=toroid]').isChecked()).toBe(true);
    expect(await again.page.locator('#mu2').inputValue()).toBe('0.2');
    await expect.poll(async () => Math.abs((await valueOf(again.page, 'out-L')) / ((expected * 900) / 625) - 1)).toBeLessThan(1e-9);
  });

  it('ignores a hostile query string with a visible notice and never injects it', async () => {
    const hostile = `?form=<img src=x onerror=alert(1)>&D=<script>window.__pwned=1</script>&N=1e999999&mu=${'9'.repeat(500)}&awg=99&f=7.1MHz&zap=1`;
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/coil/${hostile}`);
    await hydrated(page);
    await expectHostileLinkIgnored(page);
    expect(await page.locator('input[name=form][value=solenoid]').isChecked()).toBe(true);
    expect(await page.locator('#D').inputValue()).toBe('10 mm');
    expect(await page.locator('#f').inputValue()).toBe('7.1MHz');
    expect(await page.locator('#awg').inputValue()).toBe('22');
    await expect.poll(() => valueOf(page, 'out-turns')).toBeGreaterThan(0);
    expect(errors).toEqual([]);
  });

  it('hands the coil to the tank bench with L, Q, self-capacitance and frequency', async () => {
    const { page } = await openPage(env.browser, `${env.site.origin}/coil/?form=solenoid&give=N&N=15&dia=mean&D=25mm&wind=pitch&p=2mm&wire=mm&wd=1mm&enamel=bare&f=5MHz&lead=10mm`);
    await hydrated(page);
    await expect.poll(() => valueOf(page, 'out-q')).toBeGreaterThan(0);
    const href = await page.locator('#to-tank').getAttribute('href');
    expect(href).toMatch(/^\/tank\/\?/);
    const params = new URL(href!, env.site.origin).searchParams;
    expect([...params.keys()].sort()).toEqual(['Cself', 'L', 'coilQ', 'f']);
    expect(params.get('f')).toBe('5.0000 MHz');
    // coilQ is a plain number with 5 significant figures, the Q on screen
    const q = await valueOf(page, 'out-q');
    expect(params.get('coilQ')).toMatch(/^\d+(\.\d+)?$/);
    expect(Number(params.get('coilQ'))).toBeCloseTo(Number(q.toPrecision(5)), 10);
    // Cself is the self-capacitance on screen in engineering notation, 5 figures
    const cs = await valueOf(page, 'out-cself');
    const m = /^([\d.]+) (p|f)F$/.exec(params.get('Cself')!);
    expect(m).not.toBeNull();
    expect(Number(m![1]) * (m![2] === 'p' ? 1e-12 : 1e-15)).toBeCloseTo(cs, 16);
    // L is the inductance at f: between the low-frequency value and that value less the
    // wire's whole internal inductance ¼ μ0 r N (Rosa 1907; Grover 1946)
    const L = await valueOf(page, 'out-L');
    const lm = /^([\d.]+) (n|µ)H$/.exec(params.get('L')!);
    expect(lm).not.toBeNull();
    const linked = Number(lm![1]) * (lm![2] === 'n' ? 1e-9 : 1e-6);
    expect(linked).toBeLessThanOrEqual(L * (1 + 1e-5));
    expect(linked).toBeGreaterThanOrEqual((L - 0.25 * MU0 * 0.0125 * 15) * (1 - 1e-5));
  });
});
