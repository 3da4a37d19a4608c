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
