/**
 * Runs every registered calculator's own verification cases (each carries its source and
 * provenance) and checks the definition is complete. New calculators are covered automatically.
 */
import { describe, expect, it } from 'vitest';
import { calculators } from '../../src/calculators/registry.ts';
import { evaluate, defaults } from '../../src/calculators/evaluate.ts';
import { sources } from '../../src/core/sources/index.ts';
import { expectClose } from '../helpers/expectClose.ts';
import { caseSchema } from '../../src/calculators/caseSchema.ts';

describe.each(calculators.map((c) => [c.id, c] as const))('calculator %s', (_id, calc) => {
  it('has at least one sourced verification case and known source keys', () => {
    expect(calc.verification.length).toBeGreaterThan(0);
    for (const v of calc.verification) expect(Object.keys(sources)).toContain(v.source.key);
    for (const s of calc.sources) expect(Object.keys(sources)).toContain(s.key);
  });

  it('writes every case in the one case shape (the zod schema pages use too), with why its tolerance is what it is', () => {
    for (const v of calc.verification) {
      const parsed = caseSchema.safeParse(JSON.parse(JSON.stringify(v)));
      expect(parsed.success ? [] : parsed.error.issues.map((i) => `${v.name}: ${i.path.join('.')}: ${i.message}`)).toEqual([]);
      expect(v.why.length).toBeGreaterThan(3);
    }
  });

  it('computes finite outputs at its defaults', () => {
    const r = evaluate(calc, defaults(calc));
    for (const o of calc.outputs) {
      const v = r.outputs[o.key];
      if (v === undefined) expect(o.optional).toBe(true);
      else if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
    }
  });

  it('draws its charts at the defaults with matching series lengths', () => {
    if (!calc.charts) return;
    const r = evaluate(calc, defaults(calc));
    for (const ch of calc.charts(r.values, r)) {
      expect(ch.summary.length).toBeGreaterThan(10);
      for (const s of ch.series) {
        expect(s.x.length).toBe(s.y.length);
        expect(s.y.every(Number.isFinite)).toBe(true);
      }
    }
  });

  for (const v of calc.verification) {
    it(`verification: ${v.name} [${v.source.key}, ${v.source.locator}; ${v.provenance}]`, () => {
      const r = evaluate(calc, v.inputs);
      for (const [key, expected] of Object.entries(v.expected)) {
        const got = r.outputs[key];
        if (typeof expected === 'string') expect(got).toBe(expected);
        else expectClose({ label: `${calc.id}.${key}`, computed: got as number, expected, tol: v.tolerance, why: v.why, inputs: v.inputs });
      }
    });
  }
});
