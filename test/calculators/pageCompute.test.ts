/**
 * computeForPage is what both the page's own thread and the compute worker show: for every
 * calculator, its answer is evaluate()'s, with the charts marked, and the worker's reply carries
 * the very same numbers (behaviour; the numbers themselves are checked against their sources in
 * verification.test.ts).
 */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/calculators/evaluate.ts';
import { computeForPage } from '../../src/calculators/pageCompute.ts';
import { calculators, getCalculator } from '../../src/calculators/registry.ts';
import { answer } from '../../src/components/client/off-thread-worker.ts';

const defaults = (id: string) => Object.fromEntries(getCalculator(id)!.inputs.map((d) => [d.key, d.default]));

describe('computeForPage', () => {
  for (const calc of calculators) {
    it(`${calc.id}: evaluate()'s outputs, and the worker answers the same`, async () => {
      const values = evaluate(calc, defaults(calc.id)).values;
      const here = computeForPage(calc, values, true);
      expect(here.ok).toBe(true);
      if (!here.ok) return;
      expect(here.result.outputs).toEqual(evaluate(calc, values).outputs);
      if (calc.charts && here.chartError === undefined) expect(Array.isArray(here.charts)).toBe(true); // a mode may draw none
      if (!calc.offMainThread) return; // the worker serves only the heavy ones; keep the suite quick
      const there = await answer({ seq: 1, id: calc.id, values, charts: true });
      expect(there.ok && there.result.outputs).toEqual(here.result.outputs);
      expect(there.ok && there.charts).toEqual(here.charts);
    });
  }
  it('no charts computed when the page draws none', () => {
    const calc = getCalculator('sdof')!;
    const out = computeForPage(calc, evaluate(calc, defaults('sdof')).values, false);
    expect(out.ok && out.charts).toBeUndefined();
  });
  it('a refused input is named, with its typed message', () => {
    const calc = getCalculator('sdof')!;
    const values = { ...evaluate(calc, defaults('sdof')).values, m: -1 };
    const out = computeForPage(calc, values, false);
    expect(out).toMatchObject({ ok: false, known: true });
    if (!out.ok) expect(out.input).toBe('m');
  });
  it('an offered result for these values is shown as is, not recomputed', () => {
    const calc = getCalculator('sdof')!;
    const values = evaluate(calc, defaults('sdof')).values;
    const offered = { outputs: { marker: 1 }, warnings: [], values };
    const out = computeForPage(calc, values, false, offered);
    expect(out.ok && out.result).toBe(offered);
  });
});
