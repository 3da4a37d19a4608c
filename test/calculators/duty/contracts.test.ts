/** The CLI contracts of issue 4 (ids, input and output keys, SI) stay as published. */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { InputRangeError } from '../../../src/core/errors.ts';

const calc = (id: string) => {
  const c = getCalculator(id);
  if (!c) throw new Error(`${id} not registered`);
  return c;
};

describe('duty calculator contracts', () => {
  it('road-power takes roadClass or Gd0, w, V, ms, mu, ks, kt, c and gives vRms, P, accRms, travelRms, tyreLoadRms, tyreLoadRatio', () => {
    const c = calc('road-power');
    for (const k of ['roadClass', 'Gd0', 'w', 'V', 'ms', 'mu', 'ks', 'kt', 'c']) expect(c.inputs.map((i) => i.key)).toContain(k);
    const r = evaluate(c, { roadClass: 'C', V: '20', ms: '240', mu: '36', ks: '16000', kt: '160000', c: '980' }, { fillDefaults: false });
    for (const k of ['vRms', 'P', 'accRms', 'travelRms', 'tyreLoadRms', 'tyreLoadRatio']) expect(typeof r.outputs[k]).toBe('number');
    const m = evaluate(c, { Gd0: '1e-4', V: '20', ms: '240', mu: '36', ks: '16000', kt: '160000', c: '980' }, { fillDefaults: false });
    expect(m.outputs.Gd0Used).toBe(1e-4);
  });
  it('impact takes m, v, Fp, s, cph, vertical and gives E, Ehour, P, Favg, decel', () => {
    const c = calc('impact');
    const r = evaluate(c, { m: '12', v: '1.5', Fp: '0', s: '0.025', cph: '1200', vertical: '1' }, { fillDefaults: false });
    for (const k of ['E', 'Ehour', 'P', 'Favg', 'decel']) expect(typeof r.outputs[k]).toBe('number');
    expect(() => evaluate(c, { m: 12, v: 1.5, Fp: 0, s: 0.025, cph: 1200, vertical: 0.5 })).toThrow(InputRangeError);
  });
  it('every duty page output of mean power feeds the thermal pages', () => {
    for (const id of ['harmonic-duty', 'road-power', 'impact', 'structural-dampers', 'recorded-motion']) {
      const P = calc(id).outputs.find((o) => o.key === 'P');
      expect(P?.kind).toBe('power');
      expect(P?.feeds?.some((f) => f.page === 'steady-temperature' && f.input === 'P')).toBe(true);
    }
  });
  it('recorded-motion reports every rejected row with its number and reason', () => {
    const csv = 'time [s],x [mm],force [N]\n0,0,0\n0.01,1,10\n0.02,oops,20\n0.03,3,30\n0.03,4,40\n0.05,5,50\n0.06,6,60';
    const r = evaluate(calc('recorded-motion'), { csv });
    expect(r.outputs.rowsRejected).toBe(2);
    expect(r.warnings.join(' ')).toMatch(/row 4: 'oops'.*row 6: time/);
  });
});
