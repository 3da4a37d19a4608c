import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { bodyWarmUp, lumpedStep, MAX_BODY_SEGMENTS } from '../../../src/core/thermal/index.ts';
import { ComputationError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const UA = 0.745664;
const lin = (T: number) => UA * (T - 298.15);

describe('bodyWarmUp: piecewise adaptive integration of C dT/dt = P(t) − Q(T)', () => {
  it('reaches 100 °C at 150 W in 872.812 s (closed form τ ln(ΔT_ss/(ΔT_ss − ΔT_lim)), Incropera 6th ed. §5.3, from memory)', () => {
    const r = bodyWarmUp(lin, 1395, 298.15, { t: [0, 1e6], P: [150] }, 'off', 3600, 373.15);
    const tau = 1395 / UA;
    const th = 150 / UA;
    expectClose({ label: 'tCross', computed: r.tCross!, expected: tau * Math.log(th / (th - 75)), tol: 1e-8, why: 'rtol 1e-9 integration, event located to round-off' });
  });
  it('puts in exactly d·P·t_p per period at d = 0.512 (fixed steps biased the mean power by up to 1.5 %)', () => {
    const r = bodyWarmUp(lin, 1395, 298.15, { t: [0, 0.512 * 60, 60], P: [100, 0] }, 'repeat', 600);
    expectClose({ label: 'energy', computed: r.energyIn, expected: 10 * 0.512 * 60 * 100, tol: 1e-9, why: 'closed form; the switch is a step edge' });
  });
  it('matches the exact on/off solution at the end of every segment (closed form, lumpedStep)', () => {
    const tau = 1395 / UA;
    const r = bodyWarmUp(lin, 1395, 298.15, { t: [0, 30.72, 60], P: [100, 0] }, 'repeat', 120);
    let th = 0;
    for (const [P, dt] of [[100, 30.72], [0, 29.28], [100, 30.72], [0, 29.28]] as const) th = lumpedStep(th, P, dt, tau, UA);
    expectClose({ label: 'T(120 s)', computed: r.y.at(-1)!, expected: 298.15 + th, tol: 1e-10, why: 'rtol 1e-9 on a linear ODE' });
  });
  it('a small heat capacity settles instead of stepping at the stability limit: C = 1 J/K, τ = 1.34 s, one hour on, one off, exact at every segment end (closed form, lumpedStep)', () => {
    // before the settled-segment exit this run needed ~10⁶ explicit steps and was refused
    const C = 1;
    const tau = C / UA;
    const r = bodyWarmUp(lin, C, 298.15, { t: [0, 3600, 7200], P: [60, 0] }, 'repeat', 14400);
    let th = 0;
    const ends: number[] = [];
    for (const [P, dt] of [[60, 3600], [0, 3600], [60, 3600], [0, 3600]] as const) ends.push(298.15 + (th = lumpedStep(th, P, dt, tau, UA)));
    for (const [i, tEnd] of [3600, 7200, 10800, 14400].entries()) {
      const k = r.t.indexOf(tEnd);
      expect(k).toBeGreaterThan(0);
      expectClose({ label: `T(${tEnd} s)`, computed: r.y[k]!, expected: ends[i]!, tol: 1e-9, why: 'settled within the integrator tolerance on T (1e-7 K + 1e-9·T) of the equilibrium' });
    }
    expectClose({ label: 'energy', computed: r.energyIn, expected: 2 * 3600 * 60, tol: 1e-12, why: '∫P dt exact across a settled segment' });
    expect(r.t.length).toBeLessThan(2000);
  });
  it('settling does not hide a limit just below the equilibrium: T* = limit + 1 µK, crossing at 24.32 s within 1 % (closed form τ ln(ΔT_ss/(ΔT_ss − ΔT_lim)))', () => {
    // near T* the crossing time is ill-conditioned (dT/dt → 0): 1 % is what rtol 1e-9 on T buys here
    const P = UA * (75 + 1e-6);
    const r = bodyWarmUp(lin, 1, 298.15, { t: [0, 1e6], P: [P] }, 'off', 3600, 373.15);
    expectClose({ label: 'tCross', computed: r.tCross!, expected: (1 / UA) * Math.log((75 + 1e-6) / 1e-6), tol: 1e-2, why: 'tolerance-level error in T, divided by dT/dt ≈ 1e-6 K/s at the crossing' });
  });
  it('refuses a run of more than MAX_BODY_SEGMENTS segments (typed error)', () => {
    expect(() => bodyWarmUp(lin, 1395, 298.15, { t: [0, 0.5, 1], P: [1, 0] }, 'repeat', MAX_BODY_SEGMENTS)).toThrow(ComputationError);
  });
  it('never passes the equilibrium of its largest power (property)', () => {
    fc.assert(fc.property(fc.double({ min: 0.01, max: 0.99, noNaN: true }), fc.double({ min: 1, max: 2000, noNaN: true }), fc.double({ min: 1, max: 500, noNaN: true }), (d, tp, P) => {
      const r = bodyWarmUp(lin, 1395, 298.15, { t: [0, d * tp, tp], P: [P, 0] }, 'repeat', Math.min(20 * tp, 20000));
      return r.y.every((T) => T <= 298.15 + P / UA + 1e-6 && T >= 298.15 - 1e-9);
    }), { seed: 19021, numRuns: 40 });
  });
});
