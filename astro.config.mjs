// @ts-check
import { defineConfig } from 'astro/config';
import solid from '@astrojs/solid-js';
import mdx from '@astrojs/mdx';
import remarkMath from 'remark-math';
import rehypeKatex from 'rehype-katex';
import { KATEX_OPTIONS, rehypeMathTrim } from './components/kit/tex.ts';

// Formulas in Markdown/MDX are typeset by KaTeX at build time (rehype-katex) as
// MathML only, like the benches' formulas (components/kit/tex.ts): the browser
// lays MathML out itself, so pages ship no KaTeX JavaScript, stylesheet or fonts.
export default defineConfig({
  site: 'https://tankwright.invalid',
  trailingSlash: 'ignore',
  integrations: [solid(), mdx()],
  markdown: {
    remarkPlugins: [remarkMath],
    rehypePlugins: [[rehypeKatex, KATEX_OPTIONS], rehypeMathTrim],
  },
  server: { port: 4321, host: 'localhost' },
  devToolbar: { enabled: false },
  build: { inlineStylesheets: 'auto' },
});
