import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { impactEnergy, linearStop, STANDARD_GRAVITY } from '../../../src/core/duty/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

/** Integrates m·v' = F0 − c·v, x' = v with RK4 until x = s; returns the speed there and the dashpot energy. */
function simulate(m: number, v0: number, F0: number, c: number, s: number) {
  let x = 0, v = v0, Ed = 0;
  const h = m / c / 2000;
  const f = (vv: number) => (F0 - c * vv) / m;
  while (x < s) {
    const k1 = f(v), k2 = f(v + 0.5 * h * k1), k3 = f(v + 0.5 * h * k2), k4 = f(v + h * k3);
    const vn = v + (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
    const dx = 0.5 * h * (v + vn);
    const step = x + dx > s ? (s - x) / dx : 1;
    Ed += c * 0.5 * (v * v + vn * vn) * h * step;
    x += dx * step;
    v = step < 1 ? v + (vn - v) * step : vn;
    if (step < 1) break;
  }
  return { vEnd: v, Ed };
}

describe('end-stop impact energy', () => {
  it('adds kinetic energy, propelling work and gravity work [meriam2012 §3/6 work–energy (from memory); closed form]', () => {
    const r = impactEnergy({ m: 12, v: 1.5, Fp: 60, s: 0.025, cph: 1200, vertical: true });
    expectClose({ label: 'E', computed: r.E, expected: 13.5 + 1.5 + 12 * STANDARD_GRAVITY * 0.025, tol: 1e-12, why: 'same arithmetic' });
    expectClose({ label: 'P', computed: r.P, expected: (r.E * 1200) / 3600, tol: 1e-12 });
    expectClose({ label: 'decel', computed: r.decel, expected: 45, tol: 1e-12, why: 'v²/(2s)' });
  });
  it('mean power is never negative and energy never below the kinetic energy', () => {
    fc.assert(fc.property(fc.double({ min: 0.01, max: 1e4, noNaN: true }), fc.double({ min: 0.01, max: 10, noNaN: true }), fc.double({ min: 0, max: 1e5, noNaN: true }), fc.double({ min: 1e-3, max: 1, noNaN: true }), fc.double({ min: 0, max: 1e4, noNaN: true }), fc.boolean(), (m, v, Fp, s, cph, vertical) => {
      const r = impactEnergy({ m, v, Fp, s, cph, vertical });
      expect(r.P).toBeGreaterThanOrEqual(0);
      expect(r.E).toBeGreaterThanOrEqual(r.kinetic);
      expect(Math.abs(r.kinetic + r.propelling + r.gravity - r.E)).toBeLessThanOrEqual(1e-12 * r.E);
    }), { seed: 1, numRuns: 100 });
  });
  it('refuses a zero stroke, naming s', () => {
    expect(() => impactEnergy({ m: 1, v: 1, Fp: 0, s: 0, cph: 1, vertical: false })).toThrow(InputRangeError);
    expect(() => impactEnergy({ m: 1, v: 1, Fp: 0, s: 0, cph: 1, vertical: false })).toThrow(/'s'/);
  });
});

describe('linear dashpot end stop', () => {
  it('a pure dashpot stopping in s has c = m·v/s and peak force 2E/s [meriam2012 §3/5 (from memory); closed form]', () => {
    const r = linearStop(12, 1.5, 0, 0.025, 0);
    expectClose({ label: 'c', computed: r.c, expected: 720, tol: 1e-12 });
    expectClose({ label: 'F peak', computed: r.Fpeak, expected: 1080, tol: 1e-12, why: 'twice the ideal 540 N' });
  });
  it('with a propelling force it leaves exactly the residual speed at the end of the stroke (checked by RK4, energy audit closes)', () => {
    const m = 12, v0 = 1.5, F0 = 60, s = 0.025, ve = 0.05;
    const r = linearStop(m, v0, F0, s, ve);
    const sim = simulate(m, v0, F0, r.c, s);
    expect(Math.abs(sim.vEnd - ve)).toBeLessThan(1e-6);
    expectClose({ label: 'dashpot energy', computed: sim.Ed, expected: r.Edamper, tol: 1e-5, why: 'RK4 with 2000 steps per time constant; energy audit ½mv0² + F0·s − ½mve²' });
  });
  it('never beats the ideal stop: peak force at least the constant force E/s', () => {
    fc.assert(fc.property(fc.double({ min: 0.1, max: 100, noNaN: true }), fc.double({ min: 0.1, max: 5, noNaN: true }), fc.double({ min: 0, max: 500, noNaN: true }), fc.double({ min: 0.005, max: 0.2, noNaN: true }), (m, v0, F0, s) => {
      const r = linearStop(m, v0, F0, s, 0.02 * v0);
      expect(r.Fpeak).toBeGreaterThanOrEqual((0.5 * m * v0 * v0 + F0 * s - r.Eresidual) / s * (1 - 1e-9));
    }), { seed: 1, numRuns: 60 });
  });
  it('refuses a zero residual speed when a force pushes on, naming vEnd', () => {
    expect(() => linearStop(12, 1.5, 60, 0.025, 0)).toThrow(/vEnd/);
  });
});
