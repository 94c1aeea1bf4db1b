/**
 * Build-time formula typesetting. Astro pages call `tex()` in their
 * frontmatter; KaTeX writes MathML only, which the browser lays out itself:
 * no KaTeX JavaScript, stylesheet or fonts reach the page, and a formula is a
 * few dozen elements instead of a few hundred spans. The same options are
 * given to rehype-katex for the Markdown pages (astro.config.mjs).
 * A malformed formula fails the build (throwOnError), never a page.
 */
import katex from 'katex';

/** KaTeX options shared by the benches' formulas and the Markdown pages. */
export const KATEX_OPTIONS = { output: 'mathml', throwOnError: true, strict: 'error' } as const;

export function tex(source: string, display = true): string {
  return katex.renderToString(source, { ...KATEX_OPTIONS, displayMode: display });
}

/** Typesets every entry of a record of TeX sources. */
export function texAll<K extends string>(sources: Record<K, string>): Record<K, string> {
  const out = {} as Record<K, string>;
  for (const key of Object.keys(sources) as K[]) out[key] = tex(sources[key]);
  return out;
}
