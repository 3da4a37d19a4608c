/**
 * The browser's per-calculator loaders list exactly the registry's calculators and load the same
 * definitions (a calculator missing here would stay a static page in the browser). Internal
 * consistency, no external source needed (common practice, no source).
 */
import { existsSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loaderSources } from '../../src/build/client-scripts.ts';
import { calculatorLoaders } from '../../src/calculators/loaders.ts';
import { calculatorIds, getCalculator } from '../../src/calculators/registry.ts';

describe('per-calculator loaders', () => {
  it('have one entry for each registered calculator, and no other', () => {
    expect(Object.keys(calculatorLoaders).sort()).toEqual(calculatorIds().sort());
  });

  it.each(calculatorIds())('load the registered definition of %s', async (id) => {
    expect(await calculatorLoaders[id]!()).toBe(getCalculator(id));
  });

  it('are read by the build, which announces each calculator\'s chunks to a study page (every id, every file there)', () => {
    const sources = loaderSources(readFileSync('src/calculators/loaders.ts', 'utf8'));
    expect(Object.keys(sources).sort()).toEqual(calculatorIds().sort());
    for (const file of Object.values(sources)) expect(existsSync(file), file).toBe(true);
  });
});
