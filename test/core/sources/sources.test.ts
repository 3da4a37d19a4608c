import { describe, expect, it } from 'vitest';
import { joinSources, sources } from '../../../src/core/sources/index.ts';

describe('source registry', () => {
  it('refuses a key defined in two domain lists (press2007 was defined twice; the second silently won)', () => {
    const a = { k: { kind: 'book', citation: 'A' } } as const;
    const b = { k: { kind: 'book', citation: 'B' } } as const;
    expect(() => joinSources(a, b)).toThrow(/k.*defined twice/);
  });
  it('keeps the full title of Numerical Recipes, 3rd ed. (Press et al., Cambridge University Press, 2007; published)', () => {
    expect(sources.press2007.citation).toMatch(/Numerical Recipes: The Art of Scientific Computing, 3rd ed\./);
  });
});
