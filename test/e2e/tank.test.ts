/**
 * The Tank bench, driven as a technician would: the answer first, typing a
 * tank, the losses between unequal terminations, the collapse note, bad
 * input (every DesignError at the field that fills its spec path), the drive
 * section, a bookmarked link, a hostile link, a coil handed over from the
 * Coil bench and the way back, and both downloads.
 *
 * Expected values are computed here, independently of the bench, from the
 * textbook rules: Thomson's formula, 1/Q_u = Σ 1/Q_i and 1/Q_L = 1/Q_u + 1/Q_e
 * (Pozar, Microwave Engineering), R_D = Q ω L and B = f0/Q_L (Terman, Radio
 * Engineers' Handbook, 1943), the transducer gain 4 R_s |V_load/V_s|²/R_load
 * (Pozar). The bench computes the exact response, which differs from these
 * rules by O(1/Q²): tolerances below allow for that and no more. Where the
 * summary is compared with analyzeTank, the core runs here in Node on the
 * spec the bench's own table gives.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { browserAvailable, hydrated, openPage, retype, expectHostileLinkIgnored, useSiteAndBrowser, valueOf } from './harness';
import { rel, thomson } from '../helpers/asserts';
import {
  decodeLink, defaultChoices, defaultSnapshot, encodeLink, type BenchSnapshot, type FieldTable, type ValueFieldDef,
} from '../../components/kit/fields';
import { snapshotToSpec } from '../../components/kit/documents';
import { TANK_FIELDS, tankOf, type TankSpec } from '../../components/benches/tankFields';
import { COIL_FIELDS, designCoilFromFields, tankHandOff } from '../../components/benches/coilFields';
import { analyzeTank } from '../../src/core/tank';

const TWO_PI = 2 * Math.PI;

function expectRelative(actual: number, expected: number, tolerance: number) {
  expect(Math.abs(actual / expected - 1)).toBeLessThan(tolerance);
}

/** The SI value a summary item shows (its data-value). */
async function summaryValue(page: Page, id: string): Promise<number> {
  const raw = await page.locator(`#${id} output`).getAttribute('data-value');
  return raw === null || raw === '' ? Number.NaN : Number(raw);
}

/** Types into several fields in turn, as a person would (field id → text). */
async function typeAll(page: Page, texts: Record<string, string>): Promise<void> {
  for (const [id, text] of Object.entries(texts)) await retype(page, id, text);
}

/** What analyzeTank gives, in Node, for the tank a Tank link describes (read with the bench's own table). */
async function analysisOf(query: string) {
  const d = decodeLink(TANK_FIELDS, query);
  expect(d.notices).toEqual([]);
  const s = defaultSnapshot(TANK_FIELDS, d.choices);
  Object.assign(s.texts, d.texts);
  const { spec, errors } = await snapshotToSpec(TANK_FIELDS, s);
  expect(errors).toEqual({});
  return analyzeTank(tankOf(spec as unknown as TankSpec));
}

describe.runIf(browserAvailable())('Tank bench in Chromium', () => {
  const env = useSiteAndBrowser();

  it('opens its results with the answer: resonance, loaded Q, bandwidth, dynamic resistance, equal to analyzeTank', async () => {
    for (const query of [
      '',
      'mode=series&L=2.2u&coilLoss=R&Rcoil=0.5&C=470p&capLoss=ESR&ESR=20m&Rs=2&Rload=3',
      'L=4.7u&coilQ=180&Cself=3.2p&f=7.1M&C=100p&capLoss=DF&DF=2e-4&Rs=&Rload=22k',
      'L=10u&coilQ=3&C=220p&Rs=&Rload=',
      'L=4.7u&Rs=50&Rload=2k',
    ]) {
      const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/?${query}`);
      await hydrated(page);
      const a = await analysisOf(query);
      const results = page.locator('.tw-bench-results > *');
      expect(await results.first().getAttribute('class')).toContain('tw-summary');
      await expect.poll(() => summaryValue(page, 'sum-f')).toBe(a.resonantFrequency);
      expect(await summaryValue(page, 'sum-ql')).toBe(a.loadedQ);
      expect(await summaryValue(page, 'sum-bw')).toBe(a.bandwidth);
      expect(await summaryValue(page, 'sum-rd')).toBe(a.dynamicResistance);
      if (a.transducerLoss === undefined) expect(await page.locator('#sum-tl').count()).toBe(0);
      else expect(await summaryValue(page, 'sum-tl')).toBe(a.transducerLoss);
      // frequencies in 4 significant figures
      expect(await page.locator('#sum-f output').textContent()).toMatch(/^\d(?:\.\d{3}|\d\.\d\d|\d\d\.\d) [kMG]?Hz$/);
      expect(await page.locator('#out-f output').textContent()).toBe(await page.locator('#sum-f output').textContent());
      // a shift from the lossless f0 only when it matters (0.1 %), never in ppm
      const detail = (await page.locator('#out-f-detail').textContent())!;
      expect(detail).not.toMatch(/ppm/);
      const shift = a.resonantFrequency / a.naturalFrequency - 1;
      if (Math.abs(shift) < 1e-3) expect(detail).toMatch(/there within 0\.1 %/);
      else expect(detail).toMatch(new RegExp(`${shift < 0 ? '−' : '\\+'}\\d+\\.\\d+ % from it`));
      expect(errors).toEqual([]);
      await page.context().close();
    }
  });

  it('computes resonance, loaded Q and bandwidth of a typed parallel tank (Terman 1943 rules)', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/`);
    await hydrated(page);
    await page.locator('input[name=mode][value=parallel]').check();
    await typeAll(page, { L: '10u', coilQ: '120', C: '220p', capQ: '2000', Rs: '22k', Rload: '22k' });
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
    // equal terminations: the single-resonator rule, −20 log10(1 − Q_L/Q_u) (common practice, no published source)
    expect(await valueOf(page, 'out-il')).toBeCloseTo(-20 * Math.log10(1 - QL / Qu), 4);
    expect(await page.locator('#out-il-note').textContent()).toMatch(/agree/);
    expect(await page.locator('#out-f').textContent()).toContain('MHz');
    // no drive given: no voltages or currents
    expect(await page.locator('#out-vc').count()).toBe(0);
    // the plots draw (uPlot loads when they come into view)
    await page.locator('#plot-response').scrollIntoViewIfNeeded();
    await expect.poll(() => page.locator('#plot-response canvas').count(), { timeout: 10_000 }).toBeGreaterThan(0);
    await page.locator('#plot-z').scrollIntoViewIfNeeded();
    await expect.poll(() => page.locator('#plot-z canvas').count(), { timeout: 10_000 }).toBeGreaterThan(0);
    expect(errors).toEqual([]);
  });

  it('headlines the transducer loss between a 50 Ω source and a 2 kΩ load, with the insertion-loss rule beside it', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/?L=4.7u&coilQ=150&C=100p&capQ=1000&Rs=50&Rload=2k`);
    await hydrated(page);
    // Pozar, transducer gain 4 R_s |V_load/V_s|²/R_load; at resonance the source sees R_D ∥ R_load (Terman: R_D = Q_u ω L)
    const X = Math.sqrt(4.7e-6 / 100e-12);
    const RD = X / (1 / 150 + 1 / 1000);
    const Rp = (RD * 2000) / (RD + 2000);
    const loss = -10 * Math.log10((4 * 50 * (Rp / (50 + Rp)) ** 2) / 2000);
    expect(loss).toBeCloseTo(10.2, 1);
    await expect.poll(() => page.locator('#sum-tl output').textContent()).toBe('10.2 dB');
    expect(Math.abs(await valueOf(page, 'out-tl') - loss)).toBeLessThan(0.01);
    expect(await page.locator('#out-tl').getAttribute('class')).toContain('primary');
    const parts = (await page.locator('#out-tl-parts').textContent())!;
    expect(parts).toMatch(/Mismatch at the source 9\.9\d dB \+ lost in the coil and capacitor 0\.29\d dB/);
    // the rule for equal terminations says almost nothing here, and the bench says it does not apply
    expect(await valueOf(page, 'out-il')).toBeLessThan(0.02);
    expect(await page.locator('#out-il-note').textContent()).toMatch(/does not apply/);
    expect(errors).toEqual([]);
  });

  it('says prominently that a 50 Ω antenna across a 4.7 µH tank collapses it, and points to a tap or link', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/?L=4.7u&coilQ=150&C=100p&capQ=1000&Rs=50&Rload=`);
    await hydrated(page);
    const box = page.locator('#collapse');
    await expect.poll(() => box.count()).toBe(1);
    // right under the answer, before the detailed cards
    expect(await page.locator('.tw-bench-results > *').nth(1).getAttribute('id')).toBe('collapse');
    expect(await box.locator('h3').textContent()).toBe('A tap or a link winding is needed');
    const text = (await box.textContent())!;
    expect(text).toMatch(/collapse the tank/);
    expect(text).toMatch(/50 Ω source/);
    // Q_e = 50 Ω / ωL (Pozar), about 0.23: the loaded Q shown is that low
    expect(await summaryValue(page, 'sum-ql')).toBeLessThan(0.3);
    // the note is shown once, not repeated in the notes below
    expect(await page.locator('.tw-notes').getByText('collapse the tank').count()).toBe(0);
    // the Match bench link carries the tank: opened, it shows the same collapse straight across (no notices)
    const toMatch = box.locator('#to-match');
    // the bare bench's address at first, the full link once its code has arrived
    await expect.poll(async () => (await toMatch.getAttribute('href')) ?? '').toMatch(/^\/match\/\?/);
    const match = await openPage(env.browser, `${env.site.origin}${(await toMatch.getAttribute('href'))!}`);
    await hydrated(match.page);
    expect(await match.page.locator('.tw-link-notices').count()).toBe(0);
    await expect.poll(async () => rel(await summaryValue(match.page, 'sum-direct'), await summaryValue(page, 'sum-ql'))).toBeLessThan(0.01);
    expect(match.errors).toEqual([]);
    // the method page's link leads to a section that exists
    const href = (await box.locator('a[href^="/methods/"]').getAttribute('href'))!;
    expect(href).toMatch(/^\/methods\/tank\/#/);
    const method = await openPage(env.browser, `${env.site.origin}${href}`);
    expect(await method.page.locator(`[id="${href.split('#')[1]}"]`).count()).toBe(1);
    // a proper termination takes the note away
    await retype(page, 'Rs', '10k');
    await expect.poll(() => box.count()).toBe(0);
    expect(errors).toEqual([]);
  });

  it('keeps drive and ratings closed and empty until opened; opened and given a drive, shows voltages and current', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/?mode=parallel&L=10u&coilQ=120&C=220p&capQ=2000&Rs=22k&Rload=22k`);
    await hydrated(page);
    const drive = page.locator('details#drive');
    expect(await drive.evaluate((d) => (d as HTMLDetailsElement).open)).toBe(false);
    expect(await page.locator('#V').isVisible()).toBe(false);
    for (const key of ['V', 'Vrating', 'Irating']) expect(await page.locator(`#${key}`).inputValue()).toBe('');
    expect(await page.locator('#out-vc').count()).toBe(0);
    expect(new URL(page.url()).searchParams.get('V')).toBeNull();
    await drive.locator('summary').click();
    expect(await page.locator('#V').isVisible()).toBe(true);
    await retype(page, 'V', '1');
    // 1 V across the tank: the capacitor sees the tank voltage, the coil carries about V/(ωL) (Terman 1943)
    await expect.poll(() => valueOf(page, 'out-vc')).toBeCloseTo(1, 2);
    expectRelative(await valueOf(page, 'out-icirc'), 1 / (TWO_PI * thomson(10e-6, 220e-12) * 10e-6), 0.01);
    await expect.poll(() => page.url()).toContain('V=1');
    // that link opens the section again
    const again = await openPage(env.browser, page.url());
    await hydrated(again.page);
    await expect.poll(() => again.page.locator('details#drive').evaluate((d) => (d as HTMLDetailsElement).open)).toBe(true);
    expect(await again.page.locator('#V').inputValue()).toBe('1');
    expect(errors).toEqual([]);
  });

  it('cautions, with a link to the Cautions page, when power makes the tank dangerous or exceeds a rating', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/?mode=parallel&L=4.7u&coilQ=150&C=100p&capQ=1000&drive=P&P=100&Vrating=500&Irating=1`);
    await hydrated(page);
    await expect.poll(() => page.locator('details#drive').evaluate((d) => (d as HTMLDetailsElement).open)).toBe(true);
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
    await typeAll(page, { L: '2.2u', coilQ: '200', C: '470p', capQ: '1500', Rs: '2', Rload: '3' });
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
    expect(await page.locator('#sum-rd dt').textContent()).toMatch(/Resistance at resonance/);
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
    expect(await page.locator('#summary').getAttribute('class')).toContain('tw-summary--stale');
    await retype(page, 'L', '4.7u');
    await retype(page, 'coilQ', 'lots');
    await expect.poll(() => page.locator('#coilQ-msg').textContent()).toMatch(/not a plain number/i);
    await retype(page, 'coilQ', '-5');
    await expect.poll(() => page.locator('#coilQ-msg').textContent()).toMatch(/greater than zero/i);
    // an objection from the core, shown at the field it names: a coil this lossy leaves no resonance
    await typeAll(page, { Rs: '', Rload: '', coilQ: '0.3' });
    await expect.poll(() => page.locator('#coilQ-msg').textContent()).toMatch(/hardly resonates/i);
    expect(await page.locator('.tw-field-msg').count()).toBe(1);
    expect(await page.locator('#out-ql').getAttribute('class')).toContain('stale');
    await typeAll(page, { coilQ: '150', Rs: '10k', Rload: '10k' });
    await expect.poll(() => page.locator('#coilQ-msg').count()).toBe(0);
    expect(await page.locator('#out-ql').getAttribute('class')).not.toContain('stale');
    expect(await valueOf(page, 'out-ql')).toBeCloseTo(before, 10);
    // the cases found trying the bench: C = 1e-300 is refused at C, L = 47m computes
    await retype(page, 'C', '1e-300');
    await expect.poll(() => page.locator('#C-msg').textContent()).toMatch(/far outside/);
    expect(await page.locator('.tw-field-msg').count()).toBe(1);
    await retype(page, 'C', '100p');
    await retype(page, 'L', '47m');
    // 47 mH with 100 pF (Thomson, Terman 1943)
    await expect.poll(async () => Math.abs(await valueOf(page, 'out-f') / thomson(47e-3, 100e-12) - 1)).toBeLessThan(0.01);
    expect(await page.locator('.tw-field-msg').count()).toBe(0);
    expect(await page.locator('.tw-bench-error').count()).toBe(0);
    expect(errors).toEqual([]);
  });

  describe('every DesignError lands at the field that fills its spec path', () => {
    // 1e-30 of each field's unit: a value the field accepts (greater than zero) and the core
    // refuses (every tank value lies in 1e-24 … 1e24 SI). The choices that show the field come
    // from its `when`; the ratings are checked by the core only for a driven tank.
    const fields = (TANK_FIELDS as FieldTable).filter((f): f is ValueFieldDef => f.kind !== 'choice');
    it.each(fields.map((f) => [f.key, f] as const))('%s', async (key, f) => {
      const choices = { ...defaultChoices(TANK_FIELDS), ...(f.when && typeof f.when !== 'function' ? f.when : {}) } as Record<string, string>;
      const s: BenchSnapshot = defaultSnapshot(TANK_FIELDS, choices);
      if (key === 'Vrating' || key === 'Irating') s.texts.V = '1 V';
      const { page, errors } = await openPage(env.browser, `${env.site.origin}/tank/?${encodeLink(TANK_FIELDS, s)}`);
      await hydrated(page);
      await expect.poll(() => valueOf(page, 'out-ql')).toBeGreaterThan(0);
      const drive = page.locator('details#drive');
      if (['V', 'P', 'Vrating', 'Irating'].includes(key) && !(await drive.evaluate((d) => (d as HTMLDetailsElement).open))) {
        await drive.locator('summary').click();
      }
      const text = f.kind === 'number' ? '1e-30' : `1e-30 ${f.unit}`;
      await retype(page, key, text);
      const msg = page.locator(`#${key}-msg`);
      await expect.poll(() => msg.count()).toBe(1);
      expect(await msg.textContent()).toMatch(/far outside anything a tank is built from/);
      expect(await page.locator(`#${key}`).getAttribute('aria-invalid')).toBe('true');
      // at that field only, and not as a general message
      expect(await page.locator('.tw-field-msg').count()).toBe(1);
      expect(await page.locator('.tw-bench-error').count()).toBe(0);
      expect(errors).toEqual([]);
      await page.context().close();
    });
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
    expect(await again.page.locator('#P').inputValue()).toBe('5');
    await expect.poll(() => valueOf(again.page, 'out-f')).toBeGreaterThan(0);
    expectRelative(await valueOf(again.page, 'out-f'), thomson(1e-6, 680e-12), 1e-6);
    // only the fields in use are written
    const params = new URL(again.page.url()).searchParams;
    expect(params.has('coilQ')).toBe(false);
    expect(params.has('V')).toBe(false);
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

  describe('a coil handed over from the Coil bench', () => {
    /** A coil's state, its link query and what the Coil bench hands the Tank bench (computed in Node with its table). */
    async function coilHandOff(choices: Record<string, string>, texts: Record<string, string>) {
      const table = COIL_FIELDS as FieldTable;
      const all = { ...defaultChoices(table), ...choices };
      const state: BenchSnapshot = { choices: all, texts: { ...defaultSnapshot(table, all).texts, ...texts } };
      const { spec } = await snapshotToSpec(table, state);
      const result = designCoilFromFields(spec, all);
      const query = encodeLink(table, state);
      return { state, query, result, href: tankHandOff(result, query)!.href };
    }

    it('resonates at the coil’s frequency, and "back to the coil" restores the coil', async () => {
      const coil = await coilHandOff({ wind: 'pitch', wire: 'swg' }, { L: '3.3u', D: '20 mm', p: '1.2 mm', f: '6 MHz', T: '-10' });
      const { page, errors } = await openPage(env.browser, `${env.site.origin}${coil.href}`);
      await hydrated(page);
      await expect.poll(() => page.locator('#handoff').count()).toBe(1);
      expect(await page.locator('#handoff').textContent()).toMatch(/^Coil from the Coil bench: L = /);
      expect(await page.locator('.tw-link-notices').count()).toBe(0);
      // the tank peaks at the coil's working frequency (within 0.5 %)
      await expect.poll(() => valueOf(page, 'out-f')).toBeGreaterThan(0);
      expect(rel(await valueOf(page, 'out-f'), coil.result.frequency!)).toBeLessThan(5e-3);
      expect(rel(await valueOf(page, 'out-f'), 6e6)).toBeLessThan(5e-3);
      // the Tank link keeps the way back as the page's link changes
      await retype(page, 'Rs', '22k');
      await expect.poll(() => new URL(page.url()).searchParams.get('Rs')).toBe('22k');
      expect(new URL(page.url()).searchParams.get('coil')).toBe(coil.query);
      const back = page.locator('#back-to-coil');
      expect(await back.getAttribute('href')).toBe(`/coil/?${coil.query}`);
      await back.click();
      await page.waitForURL(/\/coil\//);
      await hydrated(page);
      // the Coil bench shows the coil as it was: the same fields, the same texts
      expect(await page.locator('#D').inputValue()).toBe('20 mm');
      expect(await page.locator('#p').inputValue()).toBe('1.2 mm');
      expect(await page.locator('#f').inputValue()).toBe('6 MHz');
      expect(await page.locator('#T').inputValue()).toBe('-10');
      expect(await page.locator('input[name=wire][value=swg]').isChecked()).toBe(true);
      expect(await page.locator('.tw-link-notices').count()).toBe(0);
      expect(errors).toEqual([]);
    });

    it('refuses a hostile coil link with a notice, and offers no way back', async () => {
      const coil = await coilHandOff({}, {});
      const url = new URL(`${env.site.origin}${coil.href}`);
      url.searchParams.set('coil', 'L=<script>window.__pwned=1</script>&D=<img src=x onerror=alert(1)>');
      const { page, errors } = await openPage(env.browser, url.toString());
      await hydrated(page);
      await expectHostileLinkIgnored(page);
      expect(await page.locator('.tw-link-notices').textContent()).toMatch(/coil from the Coil bench/);
      expect(await page.locator('#handoff').count()).toBe(0);
      expect(await page.locator('#back-to-coil').count()).toBe(0);
      // the tank values of the link still count
      await expect.poll(() => valueOf(page, 'out-f')).toBeGreaterThan(0);
      expect(rel(await valueOf(page, 'out-f'), coil.result.frequency!)).toBeLessThan(5e-3);
      await expect.poll(() => new URL(page.url()).searchParams.has('coil')).toBe(false);
      expect(errors).toEqual([]);
    });
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
    // the drive section opens from the keyboard
    await page.locator('details#drive summary').focus();
    await page.keyboard.press('Enter');
    expect(await page.locator('details#drive').evaluate((d) => (d as HTMLDetailsElement).open)).toBe(true);
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
    expect(rows.length).toBe(1001);
    expect(rows.every((r) => r.length === 4 && r.every(Number.isFinite))).toBe(true);
    expect(rows.every((r, i) => i === 0 || r[0] > rows[i - 1][0])).toBe(true);
    // the |Z| column peaks at the resonance the bench shows: the sweep is centred there, with a point on it
    const peak = rows.reduce((best, r) => (r[1] > best[1] ? r : best));
    expect(rows.indexOf(peak)).toBe(500);
    expectRelative(peak[0], f0, 1e-9);
    // the response column is 0 dB at its peak and below it everywhere
    expect(Math.max(...rows.map((r) => r[3]))).toBeCloseTo(0, 3);
    expect(errors).toEqual([]);
  });

  it('fits a 390 px phone: the page is no wider than the screen, and the |Z| plot draws', async () => {
    const context = await env.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await page.goto(`${env.site.origin}/tank/?L=4.7u&Rs=50&Rload=2k&V=1`, { waitUntil: 'networkidle' });
    await hydrated(page);
    await page.locator('#plot-z').scrollIntoViewIfNeeded();
    await expect.poll(() => page.locator('#plot-z canvas').count(), { timeout: 10_000 }).toBeGreaterThan(0);
    await page.locator('.tank-downloads').scrollIntoViewIfNeeded();
    expect(await page.evaluate(() => document.scrollingElement!.scrollWidth)).toBeLessThanOrEqual(390);
    await context.close();
  });
});
