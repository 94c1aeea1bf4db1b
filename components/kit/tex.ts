/**
 * Build-time formula typesetting. Astro pages call `tex()` in their
 * frontmatter; the HTML goes into the page (or into an island's props) so the
 * browser never loads KaTeX's JavaScript, only its stylesheet and fonts.
 * A malformed formula fails the build (throwOnError), never a page.
 */
import katex from 'katex';

export function tex(source: string, display = true): string {
  return katex.renderToString(source, {
    displayMode: display,
    throwOnError: true,
    output: 'htmlAndMathml',
    strict: 'error',
  });
}

/** Typesets every entry of a record of TeX sources. */
export function texAll<K extends string>(sources: Record<K, string>): Record<K, string> {
  const out = {} as Record<K, string>;
  for (const key of Object.keys(sources) as K[]) out[key] = tex(sources[key]);
  return out;
}
