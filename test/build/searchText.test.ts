/**
 * The page text handed to the search indexer leaves out KaTeX's markup (src/build/searchText.ts),
 * which the index excludes anyway. Checked on KaTeX's own output (katex 0.16 renderToString,
 * inline and display, HTML and MathML as the site renders it): everything of KaTeX goes, all
 * prose around it stays, and markup that does not close is left for the indexer to exclude.
 */
import fc from 'fast-check';
import katex from 'katex';
import { describe, expect, it } from 'vitest';
import { withoutKatex } from '../../src/build/searchText.ts';

const tex = (s: string, displayMode = false) => katex.renderToString(s, { output: 'htmlAndMathml', displayMode });

describe('withoutKatex', () => {
  it('removes inline and display math, nested spans and all, and keeps the prose and other spans', () => {
    const html = `<p>Damping <span class="unit">ratio</span> ${tex(String.raw`\zeta = \frac{c}{2\sqrt{km}}`)} of the mount.</p>`
      + `${tex(String.raw`x(t) = e^{-\zeta\omega_n t}\left[x_0\cos\omega_d t\right]`, true)}<p>Next <b>para</b>.</p>`;
    expect(html).toContain('<span class="katex">');
    expect(withoutKatex(html)).toBe('<p>Damping <span class="unit">ratio</span>  of the mount.</p><span class="katex-display"></span><p>Next <b>para</b>.</p>');
  });

  it('leaves a page without math unchanged, and one whose KaTeX span never closes from that span on', () => {
    expect(withoutKatex('<p>No math here.</p>')).toBe('<p>No math here.</p>');
    const broken = `<p>a</p>${tex('k')}<p>b</p><span class="katex"><span>open`;
    expect(withoutKatex(broken)).toBe('<p>a</p><p>b</p><span class="katex"><span>open');
  });

  it('keeps every word outside the math, for any mix of prose and formulas (property, seed 7)', () => {
    const formulas = [String.raw`\omega_n = \sqrt{k/m}`, String.raw`E = \tfrac12 k x^2`, String.raw`\bar P = \frac{1}{T}\int_0^T c\,\dot x^2\,dt`];
    fc.assert(fc.property(fc.array(fc.oneof(fc.stringMatching(/^[a-z ]{1,12}$/).map((w) => ({ w })), fc.nat(formulas.length - 1).map((i) => ({ i }))), { maxLength: 12 }), (parts) => {
      const html = parts.map((p) => ('w' in p ? `<span>${p.w}</span>` : tex(formulas[p.i]!, p.i === 2))).join('');
      const prose = parts.map((p) => ('w' in p ? `<span>${p.w}</span>` : p.i === 2 ? '<span class="katex-display"></span>' : '')).join('');
      expect(withoutKatex(html)).toBe(prose);
    }), { seed: 7, numRuns: 200 });
  });
});
