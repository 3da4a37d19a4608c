/** The sheet's page rules: paper size, footer counters, and text that cannot break out of CSS. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cssString, pageCss } from '../../src/sheets/pageCss.ts';

describe('sheet page rules', () => {
  it('sets A4 or US Letter and prints page x of y in the footer', () => {
    const a4 = pageCss({ paper: 'a4', build: 'Dampbook 0.1.0', reference: '', draft: false });
    expect(a4).toContain('size: A4');
    expect(a4).toContain('counter(page) " of " counter(pages)');
    expect(a4).not.toContain('DRAFT');
    expect(pageCss({ paper: 'letter', build: '', reference: '', draft: true })).toMatch(/size: letter[\s\S]*DRAFT/);
  });

  it('any typed text becomes one CSS string with no quote, brace, line break or angle bracket', () => {
    fc.assert(fc.property(fc.string({ maxLength: 200 }), (s) => {
      const q = cssString(s);
      const inner = q.slice(1, -1);
      expect(inner).not.toMatch(/["<>{}\n\r]/);
      expect(q.startsWith('"') && q.endsWith('"')).toBe(true);
    }), { seed: 1, numRuns: 500 });
  });
});
