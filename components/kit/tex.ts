/**
 * Build-time formula typesetting. Astro pages call `tex()` in their
 * frontmatter; KaTeX writes MathML only, which the browser lays out itself:
 * no KaTeX JavaScript, stylesheet or fonts reach the page, and a formula is a
 * few dozen elements instead of a few hundred spans. The Markdown pages get
 * the same (astro.config.mjs: rehype-katex with KATEX_OPTIONS, then
 * rehypeMathTrim). The TeX source KaTeX keeps beside the MathML (a
 * <semantics> wrapper and its <annotation>) is dropped: browsers neither show
 * nor read it, and it would add two elements to every formula.
 * A malformed formula fails the build (throwOnError), never a page.
 */
import katex from 'katex';

/** KaTeX options shared by the benches' formulas and the Markdown pages. */
export const KATEX_OPTIONS = { output: 'mathml', throwOnError: true, strict: 'error' } as const;

export function tex(source: string, display = true): string {
  return katex
    .renderToString(source, { ...KATEX_OPTIONS, displayMode: display })
    .replace(/<semantics>|<annotation encoding="application\/x-tex">[\s\S]*?<\/annotation><\/semantics>/g, '');
}

/** Typesets every entry of a record of TeX sources. */
export function texAll<K extends string>(sources: Record<K, string>): Record<K, string> {
  const out = {} as Record<K, string>;
  for (const key of Object.keys(sources) as K[]) out[key] = tex(sources[key]);
  return out;
}

interface HastNode { type: string; tagName?: string; children?: HastNode[] }

/** rehype plugin, after rehype-katex: the same trim as tex() for the Markdown pages. */
export function rehypeMathTrim() {
  const trim = (node: HastNode): void => {
    if (!node.children) return;
    node.children = node.children.flatMap((child) =>
      child.type === 'element' && child.tagName === 'semantics'
        ? (child.children ?? []).filter((c) => !(c.type === 'element' && c.tagName === 'annotation'))
        : [child]);
    node.children.forEach(trim);
  };
  return (tree: HastNode) => trim(tree);
}
