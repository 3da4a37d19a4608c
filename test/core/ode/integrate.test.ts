import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { ComputationError, InputRangeError } from '../../../src/core/errors.ts';
import { DORMAND_PRINCE_54, denseOutput, integrateAdaptive, integrateFixed, rkStep, stepWork } from '../../../src/core/ode/index.ts';
import { linearExact, linearSystem, type Linear } from './linearOscillator.ts';

const FREE: Linear = { m: 1, k: 100, c: 4, F0: 0, w: 1, x0: 0.01, v0: 0 };
const FORCED: Linear = { m: 2, k: 800, c: 8, F0: 50, w: 17, x0: 0.002, v0: -0.1 };

describe('integrateAdaptive', () => {
  it('rejects a zero relative tolerance naming rtol', () => {
    expect(() => integrateAdaptive(linearSystem(FREE), 0, [0.01, 0], 1, { rtol: 0, atol: 1e-9 })).toThrow(InputRangeError);
    expect(() => integrateAdaptive(linearSystem(FREE), 0, [0.01, 0], 1, { rtol: 0, atol: 1e-9 })).toThrow(/'rtol'/);
  });

  it('rejects an end time not after the start time', () => {
    expect(() => integrateAdaptive(linearSystem(FREE), 1, [0.01, 0], 1, { rtol: 1e-6, atol: 1e-9 })).toThrow(/'tEnd'/);
  });

  it('reports a ComputationError when maxSteps is exceeded', () => {
    expect(() => integrateAdaptive(linearSystem(FREE), 0, [0.01, 0], 100, { rtol: 1e-10, atol: 1e-14, maxSteps: 50 })).toThrow(ComputationError);
  });

  // Closed form: Rao, Mechanical Vibrations 6th ed. §2.6 (free, x(t) values also in table SDOF-D,
  // scipy solve_ivp reference). Error bar: at rtol 1e-10 DOPRI5 keeps the local error per step
  // near 1e-10 of the state; over ~10 periods the global error stays below 1e-8 of the amplitude.
  it('matches the closed-form free response of a linear oscillator within 1e-8 of the amplitude', () => {
    const exact = linearExact(FREE);
    const r = integrateAdaptive(linearSystem(FREE), 0, [FREE.x0, FREE.v0], 1, { rtol: 1e-10, atol: [1e-14, 1e-13] });
    expect(Math.abs(r.y[0]! - exact(1).x)).toBeLessThan(1e-8 * FREE.x0);
    // scipy solve_ivp, rtol 1e-11 (reference library scipy; REFERENCES table SDOF-D): x(1 s) = −1.360920e-3 m at c = 4
    expect(Math.abs(r.y[0]! - -1.360920e-3)).toBeLessThan(1e-9);
  });

  // Closed form: steady state + transient (Rao §3.4 and §2.6, from memory). Same error bar.
  it('matches the closed-form forced response (transient + steady state) within 1e-8 of the amplitude', () => {
    const exact = linearExact(FORCED);
    let worst = 0;
    const tmp = new Float64Array(2);
    integrateAdaptive(linearSystem(FORCED), 0, [FORCED.x0, FORCED.v0], 3, {
      rtol: 1e-10, atol: [1e-14, 1e-12],
      onStep(s) {
        worst = Math.max(worst, Math.abs(s.y1[0]! - exact(s.t1).x));
        s.interpolate(0.5, tmp); // dense output midway: 4th-order interpolant, same error bar
        worst = Math.max(worst, Math.abs(tmp[0]! - exact(0.5 * (s.t0 + s.t1)).x));
      },
    });
    const amplitude = 0.05; // |x| stays below 5 cm here (F0/|k − mω²| ≈ 0.026 m plus transient)
    expect(worst).toBeLessThan(1e-8 * amplitude);
  });

  it('reaches tolerance-proportional accuracy: error falls as rtol is tightened', () => {
    // common practice, no source: an error-per-step controller gives global error roughly ∝ rtol
    const exact = linearExact(FORCED)(2).x;
    const err = (rtol: number) => Math.abs(integrateAdaptive(linearSystem(FORCED), 0, [FORCED.x0, FORCED.v0], 2, { rtol, atol: [rtol * 0.01, rtol * 0.3] }).y[0]! - exact);
    // five decades of rtol buy at least three decades of accuracy (measured: about five)
    expect(err(1e-10)).toBeLessThan(err(1e-5) / 1000);
  });

  it('stops at a terminal event located to round-off on the dense output', () => {
    // Undamped release from x0 with v0 = 0: the velocity first changes sign at half a period, π/ωn (closed form).
    const p: Linear = { m: 1, k: 100, c: 0, F0: 0, w: 1, x0: 0.01, v0: 0 };
    const r = integrateAdaptive(linearSystem(p), 0, [p.x0, -1e-30], 1, { rtol: 1e-10, atol: 1e-14, event: (_t, y) => -y[1]! });
    expect(r.stoppedByEvent).toBe(true);
    expect(Math.abs(r.t - Math.PI / 10)).toBeLessThan(1e-9);
  });

  it('keeps the error at or below the closed form bound for any underdamped oscillator', () => {
    fc.assert(fc.property(
      fc.double({ min: 0.1, max: 100, noNaN: true }), fc.double({ min: 10, max: 1e6, noNaN: true }), fc.double({ min: 0, max: 0.9, noNaN: true }),
      (m, k, zeta) => {
        const p: Linear = { m, k, c: 2 * zeta * Math.sqrt(k * m), F0: 0, w: 1, x0: 0.01, v0: 0 };
        const wn = Math.sqrt(k / m);
        const tEnd = 5 * 2 * Math.PI / wn; // five periods
        const r = integrateAdaptive(linearSystem(p), 0, [p.x0, 0], tEnd, { rtol: 1e-10, atol: [1e-14, 1e-14 * wn] });
        return Math.abs(r.y[0]! - linearExact(p)(tEnd).x) < 1e-8 * p.x0;
      }), { seed: 1, numRuns: 40 });
  });
});

describe('integrateFixed', () => {
  const tEnd = 1;
  const exact = linearExact(FORCED)(tEnd);
  const err = (n: number) => Math.abs(integrateFixed(linearSystem(FORCED), 0, [FORCED.x0, FORCED.v0], tEnd, n).y[0]! - exact.x);

  // Hairer, Nørsett & Wanner, Solving ODEs I, 2nd ed., §II.3: a method of order p has global error
  // O(h^p) (from memory). Step counts keep h·ωn between 0.1 and 0.025, in the asymptotic range
  // and far above round-off.
  it('converges at fifth order in fixed-step mode: halving h divides the error by about 32', () => {
    const orders = [100, 200, 400].map((n) => Math.log2(err(n) / err(2 * n)));
    for (const p of orders) expect(p).toBeGreaterThan(4.8);
    for (const p of orders) expect(p).toBeLessThan(5.3);
  });

  it('rejects a non-integer step count', () => {
    expect(() => integrateFixed(linearSystem(FORCED), 0, [0, 0], 1, 10.5)).toThrow(InputRangeError);
  });
});

describe('denseOutput', () => {
  // Hairer, Nørsett & Wanner §II.6 (from memory): the DOPRI5 continuous extension is of order 4,
  // so its local error inside one step is O(h⁵): halving h divides it by about 32.
  it('interpolates inside one step with local error O(h⁵)', () => {
    const p: Linear = { m: 1, k: 100, c: 4, F0: 0, w: 1, x0: 0.01, v0: 0 };
    const exact = linearExact(p);
    const sys = linearSystem(p);
    const w = stepWork(DORMAND_PRINCE_54, 2);
    const out = new Float64Array(2);
    const y0 = Float64Array.from([p.x0, 0]);
    const local = (h: number) => {
      sys.f(0, y0, w.k[0]!);
      rkStep(DORMAND_PRINCE_54, sys, 0, y0, h, w);
      denseOutput(DORMAND_PRINCE_54, y0, w.yNew, w.k, h, 0.4, out);
      return Math.abs(out[0]! - exact(0.4 * h).x);
    };
    // h·ωn ≤ 0.2 keeps the step in the asymptotic range (at h·ωn = 0.8 the ratio is still 2.5)
    const ratios = [0.02, 0.01, 0.005].map((h) => Math.log2(local(h) / local(h / 2)));
    for (const r of ratios) expect(r).toBeGreaterThan(4.6);
  });
});
