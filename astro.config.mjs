// @ts-check
import { defineConfig } from 'astro/config';
import solid from '@astrojs/solid-js';
import mdx from '@astrojs/mdx';
import remarkMath from 'remark-math';
import rehypeKatex from 'rehype-katex';

// Formulas in Markdown/MDX are typeset by KaTeX at build time (rehype-katex):
// pages ship KaTeX's CSS and fonts, never its JavaScript.
export default defineConfig({
  site: 'https://tankwright.invalid',
  trailingSlash: 'ignore',
  integrations: [solid(), mdx()],
  markdown: {
    remarkPlugins: [remarkMath],
    rehypePlugins: [rehypeKatex],
  },
  server: { port: 4321, host: 'localhost' },
  devToolbar: { enabled: false },
  build: { inlineStylesheets: 'auto' },
});
