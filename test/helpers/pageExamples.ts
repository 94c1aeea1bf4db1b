/**
 * Reading a method page's worked examples in tests: the example by its
 * title (its paragraph and the tables right after it), the page's number
 * formats (SI prefixes, figures as written, trailing zeros kept), and the
 * check that every claim is in the example and no figure is left that no
 * check covers. A page and its test read the same text, so the page cannot
 * drift from the code.
 */
import { readFileSync } from 'node:fs';
import { expect } from 'vitest';

/** Whitespace (line breaks inside paragraphs and tables) as single spaces. */
export const flat = (text: string): string => text.replace(/\s+/g, ' ').trim();

const PREFIXES: ReadonlyArray<readonly [number, string]> = [[1e9, 'G'], [1e6, 'M'], [1e3, 'k'], [1, ''], [1e-3, 'm'], [1e-6, 'µ'], [1e-9, 'n'], [1e-12, 'p']];

/** x to `sig` figures, trailing zeros kept, never in exponent form. */
export function fig(x: number, sig: number): string {
  const t = x.toPrecision(sig);
  return t.includes('e') ? String(Number(t)) : t;
}

/** Mantissa and prefix of |x|, the mantissa to `sig` figures in [1, 1000). */
export function parts(x: number, sig: number): { mantissa: string; prefix: string } {
  const a = Math.abs(x);
  let k = PREFIXES.findIndex(([s]) => a >= s);
  if (k < 0) k = PREFIXES.length - 1;
  if (k > 0 && Number(fig(a / PREFIXES[k][0], sig)) >= 1000) k--;
  return { mantissa: fig(a / PREFIXES[k][0], sig), prefix: PREFIXES[k][1] };
}

/** A method page's worked examples: `example(title)` and `expectExample(title, claims)`. */
export function methodPage(file: string): { page: string; example: (title: string) => string; expectExample: (title: string, claims: string[]) => void } {
  const page = readFileSync(new URL(`../../content/docs/${file}`, import.meta.url), 'utf8');
  /** The worked example titled `title`: its paragraph and the tables right after it, if any. */
  const example = (title: string): string => {
    const blocks = page.split(/\n\s*\n/);
    const i = blocks.findIndex((b) => b.startsWith(`**Worked example (${title}).**`));
    expect(i, `no worked example "${title}" on the page`).toBeGreaterThanOrEqual(0);
    let end = i + 1;
    while (blocks[end]?.startsWith('|')) end++;
    return flat(blocks.slice(i, end).join('\n'));
  };
  /** Every claim appears in the example, and nothing with a digit is left once they are all taken out (longest first). */
  const expectExample = (title: string, claims: string[]): void => {
    const text = example(title);
    for (const c of claims) expect(text, `worked example (${title}) should say "${c}"`).toContain(c);
    let rest = text;
    for (const c of [...new Set(claims)].sort((a, b) => b.length - a.length)) rest = rest.replaceAll(c, ' ');
    expect(rest.match(/[^\s]*\d[^\s]*/g) ?? [], `figures in worked example (${title}) that no check covers`).toEqual([]);
  };
  return { page, example, expectExample };
}
