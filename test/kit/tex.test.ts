/**
 * Build-time typesetting (components/kit/tex.ts): MathML only, without the
 * TeX annotation, primes beside their letter, and the same for the Markdown
 * pages through rehype-katex and rehypeMathTrim.
 */
import { describe, expect, it } from 'vitest';
import rehypeKatex from 'rehype-katex';
import { KATEX_OPTIONS, rehypeMathTrim, tex } from '../../components/kit/tex';

const PRIME = '\u2032';

/** A hast tree as remark-math hands display math to rehype-katex. */
function displayMath(source: string) {
  return {
    type: 'root',
    children: [{ type: 'element', tagName: 'pre', properties: {}, children: [{ type: 'element', tagName: 'code', properties: { className: ['language-math', 'math-display'] }, children: [{ type: 'text', value: source }] }] }],
  };
}

/** Runs rehype-katex with the site's options, then rehypeMathTrim, and writes the tree back as markup. */
function throughMarkdownPipeline(source: string): string {
  const tree = displayMath(source);
  (rehypeKatex as unknown as (o: object) => (t: object) => void)(KATEX_OPTIONS)(tree);
  rehypeMathTrim()(tree);
  const write = (n: { type: string; tagName?: string; value?: string; children?: unknown[] }): string =>
    n.type === 'text' ? n.value ?? '' : n.type === 'element' ? `<${n.tagName}>${(n.children ?? []).map((c) => write(c as never)).join('')}</${n.tagName}>` : (n.children ?? []).map((c) => write(c as never)).join('');
  return write(tree as never);
}

describe('tex', () => {
  it('writes MathML only: no KaTeX HTML spans, no annotation', () => {
    const out = tex('f = \\dfrac{1}{2\\pi\\sqrt{LC}}');
    expect(out).toContain('<math');
    expect(out).toContain('display="block"');
    expect(out).not.toContain('katex-html');
    expect(out).not.toContain('<semantics>');
    expect(out).not.toContain('<annotation');
    expect(out).toContain('<mfrac>');
    expect(out).toContain('<msqrt>');
  });

  it('writes inline math without display="block"', () => {
    expect(tex('Q_L', false)).not.toContain('display="block"');
  });

  it('sets a prime beside its letter, not as a superscript', () => {
    const one = tex("L' = L");
    expect(one).toContain(`<mrow><mi>L</mi><mo lspace="0em" rspace="0em">${PRIME}</mo></mrow>`);
    expect(one).not.toContain('<msup>');
    const two = tex("\\mu''");
    expect(two).toContain(`<mo lspace="0em" rspace="0em">${PRIME}${PRIME}</mo>`);
    expect(two).not.toContain('<msup>');
  });

  it('keeps a superscript that holds more than primes (k′²)', () => {
    const out = tex("k'^2");
    expect(out).toContain('<msup>');
    expect(out).toContain('<mn>2</mn>');
  });

  it('fails the build on a malformed formula', () => {
    expect(() => tex('\\frac{1}{')).toThrow();
  });
});

describe('rehypeMathTrim after rehype-katex (the Markdown pages)', () => {
  it('drops the annotation and sets primes beside their letter, as tex() does', () => {
    const out = throughMarkdownPipeline("\\frac{1}{Q} = \\frac{\\mu''}{\\mu'}");
    expect(out).toContain('<math>');
    expect(out).not.toContain('<annotation>');
    expect(out).not.toContain('<semantics>');
    expect(out).not.toContain('<msup>');
    expect(out).toContain(`<mrow><mi>μ</mi><mo>${PRIME}${PRIME}</mo></mrow>`);
    expect(out).toContain(`<mrow><mi>μ</mi><mo>${PRIME}</mo></mrow>`);
  });
});
