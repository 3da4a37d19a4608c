/**
 * Inputs say what they are (each case failed before its fix): a yes/no answer is a choice, not a
 * 0/1 number box; a rate of impacts is an event rate offering per hour, minute and second, not a
 * dimensionless number offering "%"; a chart series is left out of the legend by a flag, not by a
 * label that starts with "−". Conversions: 1 per minute = 60 per hour (exact, by definition of the
 * minute; NIST SP 811 (2008) Appendix B.8, published).
 */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/calculators/evaluate.ts';
import { calculators, getCalculator } from '../../src/calculators/registry.ts';
import { findUnit, toSI, unitsOf } from '../../src/core/units/index.ts';

describe('input kinds', () => {
  it('impact: the direction of travel is a choice whose values stay 0 and 1 (the CLI contract)', () => {
    const def = getCalculator('impact')!.inputs.find((i) => i.key === 'vertical')!;
    expect(def.kind).toBe('choice');
    expect(def.kind === 'choice' && def.options.map((o) => o.value)).toEqual(['0', '1']);
    const c = getCalculator('impact')!;
    const base = { m: 100, v: 1, Fp: 0, s: 0.05, cph: 60, vEndRatio: 0.05 };
    // the number 1 (records and cases from before) and the text '1' (the CLI) mean the same
    expect(evaluate(c, { ...base, vertical: 1 }).outputs.E).toBe(evaluate(c, { ...base, vertical: '1' }).outputs.E);
  });

  it('impact: the impact rate is an event rate in per hour, per minute and per second, without "%"', () => {
    const def = getCalculator('impact')!.inputs.find((i) => i.key === 'cph')!;
    expect(def.kind).toBe('eventRate');
    const symbols = unitsOf('eventRate').map((u) => u.symbol);
    expect(symbols).toEqual(['per hour', 'per minute', 'per second']);
    expect(toSI(1, findUnit('eventRate', '1/min'))).toBe(60);
  });

  it('no number input is a 0/1 flag in disguise', () => {
    for (const c of calculators) for (const i of c.inputs) {
      if (i.kind === 'choice' || i.kind === 'text') continue;
      expect(`${c.id}.${i.key}: ${i.label}`).not.toMatch(/\(0 or 1\)|yes\/no/i);
    }
  });

  it('no chart series hides itself from the legend by its label', () => {
    for (const c of calculators) {
      if (!c.charts) continue;
      const r = evaluate(c, {});
      for (const spec of c.charts(r.values, r)) for (const s of spec.series) expect(`${c.id}/${spec.id}: ${s.label}`).not.toMatch(/: −/);
    }
  });
});
