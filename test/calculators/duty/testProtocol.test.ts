/** test-protocol: heating of a damper through a cyclic test protocol. */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { testProtocolCalculator } from '../../../src/calculators/duty/test-protocol.ts';
import { parseProtocol, protocolHeating } from '../../../src/core/duty/index.ts';
import { andradeCurve, fadeRatio } from '../../../src/core/thermal/index.ts';
import { ComputationError, InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const WIND = { protocol: '2000, 0.01, 0.25, 0', law: 'linear', c: 1e6, Cth: 122e3, UA: 0, Tamb: 293.15 };

describe('test-protocol', () => {
  it('2000 cycles of 10 mm at 0.25 Hz on 1 MN·s/m: 493.5 J per cycle (πcωX², Chopra, Dynamics of Structures, 5th ed., eq. 3.8.1, published) and 8.09 K on 122 kJ/K (energy balance, closed form)', () => {
    const r = evaluate(testProtocolCalculator, WIND, { fillDefaults: false });
    expectClose({ label: 'Efirst', computed: r.outputs.Efirst as number, expected: 493.5, tol: 1e-4, why: 'reference to 4 s.f.' });
    expectClose({ label: 'Elast', computed: r.outputs.Elast as number, expected: 493.5, tol: 1e-4, why: 'no fade: every cycle alike' });
    expectClose({ label: 'dTpeak', computed: r.outputs.dTpeak as number, expected: 8.09, tol: 5e-4, why: 'reference to 3 s.f.' });
    expect(r.outputs.Eratio).toBe(1);
    expect(r.outputs.verdict).toBe('within the limit');
    for (const k of ['Efirst', 'Elast', 'Eratio', 'dTpeak', 'Tpeak', 'Tend', 'energy']) expect(typeof r.outputs[k]).toBe('number');
  });
  it('with UA = 5 W/K: 6.90 K after 8000 s (lumped warm-up (P/UA)(1 − e^(−t/τ)), Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., §5.3, from memory)', () => {
    const r = evaluate(testProtocolCalculator, { ...WIND, UA: 5 });
    expectClose({ label: 'Tend − Tamb', computed: (r.outputs.Tend as number) - 293.15, expected: 6.90, tol: 1e-3, why: 'reference to 3 s.f.' });
  });
  it('a header with units reads mm and a rest; a bad row is named by its line', () => {
    expect(parseProtocol('# test\nN, X [mm], f [Hz], rest [min]\n10, 5, 1, 2', 'protocol')).toEqual([{ N: 10, X: 0.005, f: 1, rest: 120 }]);
    expect(() => evaluate(testProtocolCalculator, { ...WIND, protocol: '2000, 0.01, 0.25' })).toThrow(/protocol/);
    expect(() => evaluate(testProtocolCalculator, { ...WIND, protocol: '10.5, 0.01, 0.25, 0' })).toThrow(InputRangeError);
    expect(() => evaluate(testProtocolCalculator, { ...WIND, protocol: '2000000, 0.01, 0.25, 0' })).toThrow(InputRangeError);
  });
  it('refuses to integrate past 400 °C with a typed error', () => {
    expect(() => protocolHeating([{ N: 100, X: 0.1, f: 5, rest: 0 }], { kind: 'linear', c: 1e7 }, { Cth: 1000, UA: 0, Tamb: 293.15 })).toThrow(ComputationError);
  });
  it('with a fade law the cycle-by-cycle result matches a fine integration of C·dT/dt = E(T)·f − UA·(T − T_amb) (closed-form ODE, RK4 in the test)', () => {
    const oil = andradeCurve(313.15, 3e-4, 373.15, 1.2e-4);
    const model = { cRef: 1, Tref: 293.15, viscousShare: 0.6, oil };
    const E0 = Math.PI * 2e5 * (2 * Math.PI * 2) * 0.003 ** 2; // linear 200 kN·s/m, 3 mm, 2 Hz
    const run = protocolHeating([{ N: 2000, X: 0.003, f: 2, rest: 0 }], { kind: 'linear', c: 2e5 }, { Cth: 22.9e3, UA: 5, Tamb: 293.15 }, (T) => fadeRatio(model, T));
    const rhs = (T: number) => (E0 * fadeRatio(model, T) * 2 - 5 * (T - 293.15)) / 22.9e3;
    let T = 293.15;
    const h = 0.25;
    for (let t = 0; t < 1000 - 1e-9; t += h) {
      const k1 = rhs(T), k2 = rhs(T + 0.5 * h * k1), k3 = rhs(T + 0.5 * h * k2), k4 = rhs(T + h * k3);
      T += (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
    }
    expectClose({ label: 'Tend', computed: run.Tend - 293.15, expected: T - 293.15, tol: 2e-3, why: 'per-cycle steps of 0.5 s against the smooth ODE: the cycle averages the power' });
    expect(run.Elast).toBeLessThan(run.Efirst);
  });
  it('energy balance: without heat loss the energy dissipated equals C·(T_end − T_amb), for any protocol, law and fade', () => {
    const oil = andradeCurve(313.15, 3e-4, 373.15, 1.2e-4);
    const row = fc.record({ N: fc.integer({ min: 1, max: 300 }), X: fc.double({ min: 1e-4, max: 0.01, noNaN: true }), f: fc.double({ min: 0.1, max: 5, noNaN: true }), rest: fc.double({ min: 0, max: 100, noNaN: true }) });
    // absolute part: C times the rounding of T near 300 K (~6e-14 K)
    fc.assert(fc.property(fc.array(row, { minLength: 1, maxLength: 4 }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0.3, max: 1.5, noNaN: true }), (blocks, s, alpha) => {
      const model = { cRef: 1, Tref: 293.15, viscousShare: s, oil };
      const run = protocolHeating(blocks, { kind: 'power', C: 5e4, alpha }, { Cth: 5e4, UA: 0, Tamb: 293.15 }, (T) => fadeRatio(model, T));
      return Math.abs(run.energy - 5e4 * (run.Tend - 293.15)) <= 1e-9 * run.energy + 5e4 * 1e-12 && run.Tpeak >= run.Tend - 1e-9;
    }), { seed: 1, numRuns: 60 });
  });
  it('splitting a block into two with no rest changes nothing', () => {
    const law = { kind: 'linear' as const, c: 1e6 };
    const body = { Cth: 122e3, UA: 5, Tamb: 293.15 };
    const a = protocolHeating([{ N: 2000, X: 0.01, f: 0.25, rest: 0 }], law, body);
    const b = protocolHeating([{ N: 700, X: 0.01, f: 0.25, rest: 0 }, { N: 1300, X: 0.01, f: 0.25, rest: 0 }], law, body);
    expectClose({ label: 'Tend', computed: b.Tend, expected: a.Tend, tol: 1e-12, why: 'same steps' });
  });
});
