/**
 * Every page of the demo handbook: frontmatter valid under the site's schema (read as
 * `dampbook check` reads it) and every verification case reproduced by the core. Each case
 * names its own source and provenance in the page's frontmatter, repeated in the test name.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { readPages } from '../../src/cli/pages.ts';
import { describeRow, verifyPage } from '../../src/content/verify.ts';

const pages = readPages('content');

describe('demo handbook pages', () => {
  it('has pages, unique ids and a mix of review statuses', () => {
    expect(pages.length).toBeGreaterThan(0);
    const ids = pages.map((p) => p.meta?.id);
    expect(new Set(ids).size).toBe(ids.length);
  });

  describe.each(pages.map((p) => [p.file, p] as const))('%s', (_file, page) => {
    it('has no control characters in its source (a "\\frac" or "\\tanh" written through a string escape became a form feed or a tab)', () => {
      const bad = [...readFileSync(page.file, 'utf8').matchAll(/[\u0000-\u0009\u000b-\u001f\u007f]/g)].map((m) => `U+${m[0].charCodeAt(0).toString(16).padStart(4, '0')} at ${m.index}`);
      expect(bad).toEqual([]);
    });
    it('has valid frontmatter', () => {
      expect(page.errors).toEqual([]);
    });
    it('lists only calculators that exist', () => {
      expect(verifyPage(page.meta!).problems).toEqual([]);
    });
    for (const c of page.meta?.verification ?? []) {
      it(`verification: ${c.name} [${c.source.key}, ${c.source.locator}; ${c.provenance}]`, () => {
        const v = verifyPage({ calculators: [], verification: [c] });
        expect(v.failures.map(describeRow)).toEqual([]);
      });
    }
  });
});
