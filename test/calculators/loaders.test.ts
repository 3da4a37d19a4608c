/**
 * The browser's per-calculator loaders list exactly the registry's calculators and load the same
 * definitions (a calculator missing here would stay a static page in the browser). Internal
 * consistency, no external source needed (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { calculatorLoaders } from '../../src/calculators/loaders.ts';
import { calculatorIds, getCalculator } from '../../src/calculators/registry.ts';

describe('per-calculator loaders', () => {
  it('have one entry for each registered calculator, and no other', () => {
    expect(Object.keys(calculatorLoaders).sort()).toEqual(calculatorIds().sort());
  });

  it.each(calculatorIds())('load the registered definition of %s', async (id) => {
    expect(await calculatorLoaders[id]!()).toBe(getCalculator(id));
  });
});
