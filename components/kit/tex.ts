/**
 * Build-time formula typesetting. Astro pages call `tex()` in their
 * frontmatter; KaTeX writes MathML only, which the browser lays out itself:
 * no KaTeX JavaScript, stylesheet or fonts reach the page, and a formula is a
 * few dozen elements instead of a few hundred spans. The Markdown pages get
 * the same (astro.config.mjs: rehype-katex with KATEX_OPTIONS, then
 * rehypeMathTrim). The TeX source KaTeX keeps beside the MathML (a
 * <semantics> wrapper and its <annotation>) is dropped: browsers neither show
 * nor read it, and it would add two elements to every formula. A prime (L′,
 * μ″) is written beside its letter rather than as a superscript: the prime
 * glyph is raised already, and browsers do not swap in the lower form TeX
 * uses, so a superscript prime floats well above the letter.
 * A malformed formula fails the build (throwOnError), never a page.
 */
import katex from 'katex';

/** KaTeX options shared by the benches' formulas and the Markdown pages. */
export const KATEX_OPTIONS = { output: 'mathml', throwOnError: true, strict: 'error' } as const;

const PRIME = '\u2032';
/** `<msup><mi>L</mi><mo>′</mo></msup>`, or primes in an <mrow> (μ″), as KaTeX writes them. */
const SUPERSCRIPT_PRIMES = /<msup><mi([^>]*)>([^<]*)<\/mi>(<mo[^>]*>\u2032<\/mo>|<mrow>(?:<mo[^>]*>\u2032<\/mo>)+<\/mrow>)<\/msup>/g;
const primesBeside = (count: number) => `<mo lspace="0em" rspace="0em">${PRIME.repeat(count)}</mo>`;

export function tex(source: string, display = true): string {
  return katex
    .renderToString(source, { ...KATEX_OPTIONS, displayMode: display })
    .replace(/<semantics>|<annotation encoding="application\/x-tex">[\s\S]*?<\/annotation><\/semantics>/g, '')
    .replace(SUPERSCRIPT_PRIMES, (_, attrs: string, base: string, sup: string) =>
      `<mrow><mi${attrs}>${base}</mi>${primesBeside(sup.split(PRIME).length - 1)}</mrow>`);
}

/** Typesets every entry of a record of TeX sources. */
export function texAll<K extends string>(sources: Record<K, string>): Record<K, string> {
  const out = {} as Record<K, string>;
  for (const key of Object.keys(sources) as K[]) out[key] = tex(sources[key]);
  return out;
}

interface HastNode { type: string; tagName?: string; value?: string; properties?: Record<string, unknown>; children?: HastNode[] }

const isElement = (n: HastNode | undefined, tag: string) => n?.type === 'element' && n.tagName === tag;
const isPrime = (n: HastNode) => isElement(n, 'mo') && n.children?.length === 1 && n.children[0].value === PRIME;

/** Number of primes an <msup>'s superscript holds, when it holds nothing else (else 0). */
function superscriptPrimes(node: HastNode): number {
  const [base, sup] = node.children ?? [];
  if (!isElement(node, 'msup') || !isElement(base, 'mi') || !sup) return 0;
  if (isPrime(sup)) return 1;
  return isElement(sup, 'mrow') && sup.children?.length && sup.children.every(isPrime) ? sup.children.length : 0;
}

/** rehype plugin, after rehype-katex: the same as tex() does for the Markdown pages (no annotation, primes beside). */
export function rehypeMathTrim() {
  const trim = (node: HastNode): void => {
    if (!node.children) return;
    node.children = node.children.flatMap((child) => {
      if (isElement(child, 'semantics')) return (child.children ?? []).filter((c) => !isElement(c, 'annotation'));
      const primes = superscriptPrimes(child);
      if (primes === 0) return [child];
      const mark: HastNode = { type: 'element', tagName: 'mo', properties: { lspace: '0em', rspace: '0em' }, children: [{ type: 'text', value: PRIME.repeat(primes) }] };
      return [{ type: 'element', tagName: 'mrow', properties: {}, children: [child.children![0], mark] }];
    });
    node.children.forEach(trim);
  };
  return (tree: HastNode) => trim(tree);
}
