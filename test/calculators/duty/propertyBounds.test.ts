/** property-bounds: property modification factors, their temperature part, and the bounds on structural-dampers. */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { propertyBoundsCalculator } from '../../../src/calculators/duty/property-bounds.ts';
import { structuralDampersCalculator } from '../../../src/calculators/duty/structural-dampers.ts';
import { propertyBounds } from '../../../src/core/duty/index.ts';
import { fadeRatio, andradeCurve } from '../../../src/core/thermal/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const NOMINAL = { C: 200e3, lamAeMax: 1.1, lamTestMax: 1.05, lamSpecMax: 1.15, lamAeMin: 1, lamTestMin: 0.95, lamSpecMin: 0.85, adjust: 0.75 };

/**
 * source: ASCE/SEI 7-16, Minimum Design Loads, §17.2.8.4 eqs. 17.2-1/17.2-2 (the form of the
 * equations; section and equation numbers from memory). Expected values: the equations worked by hand.
 */
const TABLE: readonly { name: string; f: Omit<typeof NOMINAL, 'C'>; lamMax: number; lamMin: number; provenance: string }[] = [
  { name: '(1.10, 1.05, 1.15) / (1.00, 0.95, 0.85), a = 0.75', f: NOMINAL, lamMax: 1.2981, lamMin: 0.8075, provenance: 'from memory (ASCE/SEI 7-16 §17.2.8.4)' },
  { name: 'a = 1.0 (essential facility)', f: { ...NOMINAL, adjust: 1, lamAeMin: 0.9 }, lamMax: 1.32825, lamMin: 0.72675, provenance: 'closed form' },
  { name: 'all factors 1', f: { lamAeMax: 1, lamTestMax: 1, lamSpecMax: 1, lamAeMin: 1, lamTestMin: 1, lamSpecMin: 1, adjust: 0.75 }, lamMax: 1, lamMin: 1, provenance: 'closed form' },
];

describe('property-bounds', () => {
  it.each(TABLE)('$name ($provenance)', (row) => {
    const r = evaluate(propertyBoundsCalculator, { ...row.f, C: 1 });
    expectClose({ label: 'lamMax', computed: r.outputs.lamMax as number, expected: row.lamMax, tol: 5e-5, why: 'reference rounded to 5 s.f.' });
    expectClose({ label: 'lamMin', computed: r.outputs.lamMin as number, expected: row.lamMin, tol: 1e-9, why: 'exact decimals' });
  });
  it('Cupper and Clower are C·λ_max and C·λ_min (contract keys)', () => {
    const r = evaluate(propertyBoundsCalculator, NOMINAL, { fillDefaults: false });
    expectClose({ label: 'Cupper', computed: r.outputs.Cupper as number, expected: 259612.5, tol: 1e-12, why: 'same arithmetic' });
    expectClose({ label: 'Clower', computed: r.outputs.Clower as number, expected: 161500, tol: 1e-12, why: 'same arithmetic' });
  });
  it('refuses a maximum factor below 1 or a minimum above 1, naming it', () => {
    expect(() => propertyBounds({ ...NOMINAL, lamSpecMax: 0.9 })).toThrow(InputRangeError);
    expect(() => evaluate(propertyBoundsCalculator, { ...NOMINAL, lamTestMin: 1.05 })).toThrow(/lamTestMin/);
  });
  it('the temperature factors are c(T_min)/c(T_ref) and c(T_max + rise)/c(T_ref) of the fade law, multiplied into the bounds', () => {
    const nu40 = 3e-4;
    const nu100 = 1.2e-4;
    const inputs = { ...NOMINAL, fade: 'law', fluid: 'silicone', nu40, nu100, share: 0.6, fadeLaw: 'share', Tref: 293.15, Tmin: 263.15, Tmax: 308.15, dTevent: 12 };
    const r = evaluate(propertyBoundsCalculator, inputs);
    // closed form of the share law on the two-point Andrade line (ln ν linear in 1/T)
    const model = { cRef: 1, Tref: 293.15, viscousShare: 0.6, oil: andradeCurve(313.15, nu40, 373.15, nu100) };
    const lamT = fadeRatio(model, 263.15);
    const lamTmin = fadeRatio(model, 320.15);
    const andrade = (T: number) => Math.exp(Math.log(nu40) + (Math.log(nu100 / nu40) * (1 / T - 1 / 313.15)) / (1 / 373.15 - 1 / 313.15));
    expectClose({ label: 'λ_T,max by hand', computed: lamT, expected: 0.6 * andrade(263.15) / andrade(293.15) + 0.4, tol: 1e-9, why: 'closed form, same law' });
    expectClose({ label: 'lamTmax', computed: r.outputs.lamTmax as number, expected: lamT, tol: 1e-12, why: 'same function' });
    expectClose({ label: 'lamMax', computed: r.outputs.lamMax as number, expected: 1.2980625 * lamT, tol: 1e-12, why: 'product' });
    expectClose({ label: 'lamMin', computed: r.outputs.lamMin as number, expected: 0.8075 * lamTmin, tol: 1e-12, why: 'product' });
    expect(lamT).toBeGreaterThan(1);
    expect(lamTmin).toBeLessThan(1);
  });
  it('λ_max ≥ 1 ≥ λ_min for every valid set of factors, and a larger a widens the band', () => {
    const up = fc.double({ min: 1, max: 5, noNaN: true });
    const lo = fc.double({ min: 0.2, max: 1, noNaN: true });
    fc.assert(fc.property(up, up, up, lo, lo, lo, fc.double({ min: 0.5, max: 0.99, noNaN: true }), (a1, a2, a3, b1, b2, b3, a) => {
      const p = { lamAeMax: a1, lamTestMax: a2, lamSpecMax: a3, lamAeMin: b1, lamTestMin: b2, lamSpecMin: b3 };
      const r = propertyBounds({ ...p, adjust: a });
      const wide = propertyBounds({ ...p, adjust: 1 });
      return r.lamMax >= 1 && r.lamMin <= 1 && wide.lamMax >= r.lamMax - 1e-12 && wide.lamMin <= r.lamMin + 1e-12;
    }), { seed: 1, numRuns: 300 });
  });
  it('structural-dampers: factors of 1 leave every output as before; λ scale the peak force and the damping credited', () => {
    const base = { Fref: 2e5, vref: 1, alpha: 0.4, n: 4, theta: (40 * Math.PI) / 180, drift: 0.015, T: 0.5, k: 6e7 };
    const nominal = evaluate(structuralDampersCalculator, base);
    expect(nominal.outputs.FpeakUpper).toBe(nominal.outputs.Fpeak);
    expect(nominal.outputs.betaSupLower).toBe(nominal.outputs.betaSup);
    const b = evaluate(structuralDampersCalculator, { ...base, lamMax: 1.2980625, lamMin: 0.8075 });
    for (const k of ['Fpeak', 'Wj', 'betaSup', 'P', 'dT']) expect(b.outputs[k]).toBe(nominal.outputs[k]);
    // closed form: F and W_j are linear in C (FEMA 356 §9.3 energy method, from memory)
    expectClose({ label: 'FpeakUpper', computed: b.outputs.FpeakUpper as number, expected: 1.2980625 * (nominal.outputs.Fpeak as number), tol: 1e-12, why: 'linear in C' });
    expectClose({ label: 'betaSupLower', computed: b.outputs.betaSupLower as number, expected: 0.8075 * (nominal.outputs.betaSup as number), tol: 1e-12, why: 'linear in C' });
    const upper = evaluate(structuralDampersCalculator, { ...base, Fref: 2e5 * 1.2980625 });
    expectClose({ label: 'upper = nominal run with C·λ_max', computed: b.outputs.FpeakUpper as number, expected: upper.outputs.Fpeak as number, tol: 1e-12, why: 'same arithmetic' });
  });
});
