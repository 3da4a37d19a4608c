/**
 * road-power's motion ratio and comfort outputs. Reference: the same calculator at MR = 1 with the
 * wheel rate c·MR² (virtual work: v_d = MR·v_w, F_w = MR·F_d, dixon2007 motion ratio, from memory;
 * closed form), so the checks are exact up to the quadrature tolerance (1e-8).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const calc = getCalculator('road-power')!;
const TW210 = { roadClass: 'C', V: 20, ms: 240, mu: 36, ks: 16000, kt: 160000 };

describe('road-power motion ratio', () => {
  it('a damper at MR rides like c·MR² on the wheel: ride and tyre load at the wheel, velocity ×MR and the same power at the damper', () => {
    fc.assert(fc.property(fc.double({ min: 0.3, max: 2.5, noNaN: true }), fc.double({ min: 300, max: 4000, noNaN: true }), (MR, c) => {
      const d = evaluate(calc, { ...TW210, c, MR }).outputs;
      const w = evaluate(calc, { ...TW210, c: c * MR * MR, MR: 1 }).outputs;
      for (const k of ['accRms', 'awWk', 'travelRms', 'tyreLoadRms', 'P']) expectClose({ label: k, computed: d[k] as number, expected: w[k] as number, tol: 1e-9, why: 'same wheel rate' });
      expectClose({ label: 'vRms', computed: d.vRms as number, expected: MR * (w.vRms as number), tol: 1e-9 });
      expectClose({ label: 'FRms', computed: d.FRms as number, expected: (w.FRms as number) / MR, tol: 1e-9, why: 'F_d = F_w/MR' });
      expectClose({ label: 'cComfort', computed: (d.cComfort as number) * MR * MR, expected: w.cComfort as number, tol: 1e-12 });
    }), { seed: 1, numRuns: 12 });
  });
  it('a power-law damper at MR acts at the wheel as C·MR^(1+α)', () => {
    const law = { law: 'power', vref: 1, alpha: 0.5 };
    const d = evaluate(calc, { ...TW210, ...law, w: 2.5, Fref: 800, MR: 0.6 }).outputs;
    const w = evaluate(calc, { ...TW210, ...law, w: 2.5, Fref: 800 * 0.6 ** 1.5, MR: 1 }).outputs;
    for (const k of ['accRms', 'awWk', 'P']) expectClose({ label: k, computed: d[k] as number, expected: w[k] as number, tol: 1e-7, why: 'statistical linearisation iterates to 1e-10' });
  });
  it('MR = 1 (the default) leaves the outputs of 0.3 unchanged: TW-210 class C [closed forms, see the verification cases]', () => {
    const r = evaluate(calc, { ...TW210, c: 980 }).outputs;
    expectClose({ label: 'P', computed: r.P as number, expected: 80.8518, tol: 1e-5 });
    expectClose({ label: 'vRms', computed: r.vRms as number, expected: 0.287231, tol: 3e-6 });
    expect(r.strokeRms).toBe(r.travelRms);
    expect(r.ceq).toBe(980);
  });
});
