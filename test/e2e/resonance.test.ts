/**
 * The Resonance bench, driven as a technician would: the answer first,
 * typing, bad input, a bookmarked link, and a hostile link. Expected values
 * are computed here from Thomson's formula independently of the core
 * (Terman 1943).
 */
import { describe, expect, it } from 'vitest';
import { browserAvailable, hydrated, openPage, retype, expectHostileLinkIgnored, useSiteAndBrowser, valueOf } from './harness';
import { thomson } from '../helpers/asserts';

describe.runIf(browserAvailable())('Resonance bench in Chromium', () => {
  const env = useSiteAndBrowser();

  it('solves for C from f and L, and for f from L and C, as you type', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/resonance/`);
    await hydrated(page);
    await retype(page, 'f', '7.1 MHz');
    await retype(page, 'L', '4u7');
    await expect.poll(() => valueOf(page, 'out-C')).toBeGreaterThan(0);
    const C = await valueOf(page, 'out-C');
    // C = 1/((2π f)² L), computed independently here
    expect(C).toBeCloseTo(1 / ((2 * Math.PI * 7.1e6) ** 2 * 4.7e-6), 16);
    await expect.poll(() => page.locator('#out-C output').textContent()).toBe('106.9 pF');
    // The E12 table lists 100 pF and 120 pF with the frequency each gives
    const rows = await page.locator('#out-e12 tbody tr').allTextContents();
    expect(rows.length).toBe(2);
    expect(rows[0]).toContain('100 pF');
    expect(rows[0]).toContain((thomson(4.7e-6, 100e-12) / 1e6).toFixed(3));
    expect(rows[1]).toContain('120 pF');

    await page.getByLabel('Frequency', { exact: true }).check();
    await retype(page, 'C', '2*47p');
    await expect.poll(() => valueOf(page, 'out-f'), { timeout: 10_000 }).toBeCloseTo(thomson(4.7e-6, 94e-12), 0);
    expect(errors).toEqual([]);
  });

  it('opens its results with the answer: the solved value, then the nearest E12 part', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/resonance/?solve=C&f=7.1MHz&L=4u7`);
    await hydrated(page);
    const results = page.locator('.tw-bench-results > *');
    expect(await results.first().getAttribute('class')).toContain('tw-summary');
    const solved = page.locator('#sum-solved');
    await expect.poll(() => solved.locator('dt').textContent()).toBe('Capacitance to resonate');
    // C = 1/((2π f)² L), computed here; four significant figures by default
    expect(Number(await solved.locator('output').getAttribute('data-value'))).toBeCloseTo(1 / ((2 * Math.PI * 7.1e6) ** 2 * 4.7e-6), 16);
    expect(await solved.locator('output').textContent()).toBe('106.9 pF');
    expect(await solved.textContent()).toContain('with 4.7 µH at 7.1 MHz');
    // 100 pF is the nearer E12 value: 7.341 MHz, +3.40 % (Thomson's formula, computed here)
    const f100 = thomson(4.7e-6, 100e-12);
    expect(await page.locator('#sum-e12 output').textContent()).toBe('100 pF');
    expect(await page.locator('#sum-e12').textContent()).toContain(`gives ${(f100 / 1e6).toFixed(3)} MHz (+${((f100 / 7.1e6 - 1) * 100).toFixed(2)} %)`);

    await page.getByLabel('Frequency', { exact: true }).check();
    await expect.poll(() => solved.locator('dt').textContent()).toBe('Resonant frequency');
    await expect.poll(() => solved.locator('output').textContent()).toBe(`${(thomson(4.7e-6, 100e-12) / 1e6).toFixed(3)} MHz`);
    expect(await page.locator('#sum-e12').count()).toBe(0);

    // bad input: the answer stays, dimmed and tagged stale
    await retype(page, 'C', '100 mm');
    await expect.poll(() => page.locator('#summary').getAttribute('class')).toContain('tw-summary--stale');
    expect(await page.locator('#summary .tw-stale-tag').textContent()).toBe('stale');
    await retype(page, 'C', '100p');
    await expect.poll(() => page.locator('#summary').getAttribute('class')).not.toContain('stale');
    expect(errors).toEqual([]);
  });

  it('shows a clear message at the field for bad input, keeps the last result marked stale, no console error', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/resonance/?solve=C&f=7.1MHz&L=4.7uH`);
    await hydrated(page);
    await expect.poll(() => valueOf(page, 'out-C')).toBeGreaterThan(0);
    const before = await valueOf(page, 'out-C');
    await retype(page, 'L', '4.7 pF');
    const msg = page.locator('#L-msg');
    await expect.poll(() => msg.textContent()).toMatch(/capacitance/i);
    expect(await page.locator('#L').getAttribute('aria-invalid')).toBe('true');
    expect(await page.locator('#L').getAttribute('aria-describedby')).toContain('L-msg');
    expect(await valueOf(page, 'out-C')).toBe(before);
    expect(await page.locator('#out-C').getAttribute('class')).toContain('stale');
    await retype(page, 'L', '');
    await expect.poll(() => msg.textContent()).toMatch(/enter a value/i);
    await retype(page, 'L', '-3u');
    await expect.poll(() => msg.textContent()).toBe('Inductance must be greater than zero; you typed “-3u”.');
    await retype(page, 'L', '4.7u..10u');
    await expect.poll(() => msg.textContent()).toBe('A range is not allowed here: give one value, e.g. 4.7u.');
    await retype(page, 'L', '4.7u');
    await expect.poll(() => page.locator('#L-msg').count()).toBe(0);
    expect(await page.locator('#out-C').getAttribute('class')).not.toContain('stale');
    expect(errors).toEqual([]);
  });

  it('restores a design from its URL, and writes the design into the URL', async () => {
    const { page } = await openPage(env.browser, `${env.site.origin}/resonance/?solve=L&f=455k&C=2*100p`);
    await hydrated(page);
    expect(await page.locator('#f').inputValue()).toBe('455k');
    expect(await page.locator('#C').inputValue()).toBe('2*100p');
    await expect.poll(() => valueOf(page, 'out-L'), { timeout: 10_000 }).toBeCloseTo(1 / ((2 * Math.PI * 455e3) ** 2 * 200e-12), 12);
    await retype(page, 'f', '10.7 MHz');
    await expect.poll(() => page.url()).toContain('f=10.7+MHz');
    const again = await openPage(env.browser, page.url());
    await hydrated(again.page);
    expect(await again.page.locator('#f').inputValue()).toBe('10.7 MHz');
    expect(await again.page.locator('#C').inputValue()).toBe('2*100p');
    expect(await again.page.locator('input[name=solve][value=L]').isChecked()).toBe(true);
    // only the fields in use are written
    expect(new URL(again.page.url()).searchParams.has('L')).toBe(false);
  });

  it('refuses link values the field itself would refuse, saying why', async () => {
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/resonance/?solve=C&f=-7.1MHz&L=4.7u..10u`);
    await hydrated(page);
    const notices = await page.locator('.tw-link-notices p').allTextContents();
    expect(notices).toEqual([
      'Ignored the link’s value for frequency (“-7.1MHz”): Frequency must be greater than zero; you typed “-7.1MHz”.',
      'Ignored the link’s value for inductance (“4.7u..10u”): A range is not allowed here: give one value, e.g. 4.7u.',
    ]);
    expect(await page.locator('#f').inputValue()).toBe('7.1 MHz');
    expect(errors).toEqual([]);
  });

  it('ignores a hostile query string with a visible notice and never injects it', async () => {
    const hostile = `?solve=<img src=x onerror=alert(1)>&L=<script>window.__pwned=1</script>&C=${'9'.repeat(500)}&f=7.1MHz&x=1`;
    const { page, errors } = await openPage(env.browser, `${env.site.origin}/resonance/${hostile}`);
    await hydrated(page);
    await expectHostileLinkIgnored(page);
    expect(await page.locator('#f').inputValue()).toBe('7.1MHz');
    expect(await page.locator('#L').inputValue()).toBe('4.7 µH');
    expect(errors).toEqual([]);
  });

  it('works from the keyboard alone', async () => {
    const { page } = await openPage(env.browser, `${env.site.origin}/resonance/`);
    await hydrated(page);
    await page.locator('input[name=solve][value=C]').focus();
    await page.keyboard.press('ArrowLeft'); // radio group: C → L
    expect(await page.locator('input[name=solve][value=L]').isChecked()).toBe(true);
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('f');
    await page.keyboard.press('Control+A');
    await page.keyboard.type('1 MHz');
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('C');
    await page.keyboard.press('Control+A');
    await page.keyboard.type('1n');
    await expect.poll(() => valueOf(page, 'out-L')).toBeCloseTo(1 / ((2 * Math.PI * 1e6) ** 2 * 1e-9), 12);
  });
});
