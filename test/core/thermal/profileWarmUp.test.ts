/**
 * Lumped warm-up under a piecewise-constant power profile, checked against the closed forms it
 * must reduce to and by invariants of the lumped equation C dT/dt = P(t) − UA(T − T∞)
 * (Incropera, DeWitt, Bergman, Lavine, Fundamentals of Heat and Mass Transfer, 6th ed., 2007,
 * §5.3 lumped capacitance; from memory).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ComputationError, InputRangeError } from '../../../src/core/errors.ts';
import { adaptiveSimpson } from '../../../src/core/numeric/index.ts';
import {
  coolDownTime, lumpedStep, lumpedWarmUp, onOffDuty, periodicProfile, profileWarmUp, type PowerProfile,
} from '../../../src/core/thermal/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// The Fellrunner damper body of the thermal pages: C = 1395 J/K, UA = 0.745664 W/K, 25 °C air (demo values).
const BODY = { Cth: 1395, UA: 0.745664, Tamb: 298.15 } as const;
const TIMES = [0, 1, 59.5, 299.999, 300, 301, 600, 601, 1234.5, 3600, 9999, 1e5, 1e6];

/** Random profiles: 1–12 segments of 1 s … 2 h, 0–2 kW. */
const profileArb = fc.array(fc.tuple(fc.double({ min: 1, max: 7200, noNaN: true }), fc.double({ min: 0, max: 2000, noNaN: true })), { minLength: 1, maxLength: 12 })
  .map((segs): PowerProfile => {
    const t = [0];
    for (const [dt] of segs) t.push(t[t.length - 1]! + dt);
    return { t, P: segs.map(([, P]) => P) };
  });
const bodyArb = fc.record({ Cth: fc.double({ min: 100, max: 1e5, noNaN: true }), UA: fc.double({ min: 0.05, max: 50, noNaN: true }), Tamb: fc.constant(300) });

describe('profileWarmUp reduces to the closed forms', () => {
  it('a two-segment repeated profile reproduces the on/off duty closed form to 1e-12 (temperature, peak, time to a limit)', () => {
    // closed form of the on/off duty: onOffDuty (geometric sum of exact phases, Incropera §5.3, from memory)
    for (const [P, d, tp] of [[150, 0.5, 600], [80.9, 0.3, 1200], [500, 0.9, 60], [40, 0.05, 3600]] as const) {
      const o = onOffDuty({ ...BODY, P }, d, tp);
      const p = profileWarmUp(BODY, { t: [0, d * tp, tp], P: [P, 0] }, 'repeat');
      const label = `P=${P}, d=${d}, tp=${tp}`;
      for (const t of TIMES) expectClose({ label: `${label}: T(${t})`, computed: p.at(t), expected: o.at(t), tol: 1e-12, why: 'same exact solution, rounding only' });
      expectClose({ label: `${label}: peak`, computed: p.Tpeak, expected: o.Tpeak, tol: 1e-12, why: 'closed form' });
      expectClose({ label: `${label}: T_ss`, computed: p.Tmean, expected: o.Tmean, tol: 1e-12, why: 'closed form' });
      for (const f of [0.1, 0.5, 0.9, 0.999]) {
        const T = BODY.Tamb + f * (o.Tpeak - BODY.Tamb);
        expectClose({ label: `${label}: time to ${T.toFixed(2)} K`, computed: p.timeTo(T)!, expected: o.timeTo(T)!, tol: 1e-11, why: 'closed form; the log of a ratio near 1 costs a few ulps' });
      }
      expect(p.timeTo(o.Tpeak + 1e-9)).toBeUndefined();
    }
  });

  it('a one-segment profile reproduces the constant-power closed form to 1e-12, repeated or not', () => {
    // T = T_ss + (T0 − T_ss) e^{−t/τ}: lumpedWarmUp (Incropera §5.3 eq. 5.6 with a source, from memory)
    for (const P of [50, 150, 1234]) {
      const c = lumpedWarmUp({ ...BODY, P });
      const rep = profileWarmUp(BODY, { t: [0, 600], P: [P] }, 'repeat');
      const once = profileWarmUp(BODY, { t: [0, 1e7], P: [P] }, 'off');
      for (const t of TIMES) {
        expectClose({ label: `repeat P=${P} T(${t})`, computed: rep.at(t), expected: c.at(t), tol: 1e-12, why: 'closed form, rounding only' });
        expectClose({ label: `once P=${P} T(${t})`, computed: once.at(t), expected: c.at(t), tol: 1e-12, why: 'closed form, rounding only' });
      }
      expectClose({ label: 'peak = T_ss', computed: rep.Tpeak, expected: c.Tss, tol: 1e-12, why: 'closed form' });
      const T = BODY.Tamb + 0.7 * (c.Tss - BODY.Tamb);
      expectClose({ label: 'time to 70 % of the rise', computed: rep.timeTo(T)!, expected: c.timeTo(T)!, tol: 1e-12, why: 'closed form' });
      expectClose({ label: 'time to 70 % of the rise (once)', computed: once.timeTo(T)!, expected: c.timeTo(T)!, tol: 1e-12, why: 'closed form' });
    }
  });

  it('a single run then off heats as at constant power, then cools as e^{−t/τ} from the end temperature', () => {
    const on = lumpedWarmUp({ ...BODY, P: 150 });
    const p = profileWarmUp(BODY, { t: [0, 900], P: [150] }, 'off');
    const Tend = on.at(900);
    expectClose({ label: 'T at the end', computed: p.Tend!, expected: Tend, tol: 1e-12, why: 'closed form' });
    expectClose({ label: 'peak = end temperature', computed: p.Tpeak, expected: Tend, tol: 1e-12, why: 'rising throughout' });
    const cool = lumpedWarmUp({ ...BODY, P: 0, T0: Tend });
    for (const s of [0, 10, 1000, 5000]) expectClose({ label: `T(900 + ${s})`, computed: p.at(900 + s), expected: cool.at(s), tol: 1e-12, why: 'closed form of the cool-down' });
    expect(p.timeTo(Tend + 0.01)).toBeUndefined();
  });

  it('cool-down time is τ ln((T_start − T∞)/(T_target − T∞)), 0 when already cool, undefined at or below the air', () => {
    const tau = BODY.Cth / BODY.UA;
    const c = lumpedWarmUp({ ...BODY, P: 0, T0: 373.15 });
    expectClose({ label: 't_cool', computed: coolDownTime(373.15, 323.15, BODY.Tamb, tau)!, expected: c.timeTo(323.15)!, tol: 1e-12, why: 'closed form both ways' });
    expect(coolDownTime(320, 323.15, BODY.Tamb, tau)).toBe(0);
    expect(coolDownTime(373.15, 290, BODY.Tamb, tau)).toBeUndefined();
  });
});

describe('periodicProfile (fixed point of the period map θ_end = aθ_start + b)', () => {
  it('is a fixed point: one exact period from θ* returns to θ*', () => {
    fc.assert(fc.property(profileArb, bodyArb, (p, b) => {
      const tau = b.Cth / b.UA;
      const ps = periodicProfile(p, tau, b.UA);
      let th = ps.theta[0]!;
      for (let i = 0; i < p.P.length; i++) th = lumpedStep(th, p.P[i]!, p.t[i + 1]! - p.t[i]!, tau, b.UA);
      expect(Math.abs(th - ps.theta[0]!)).toBeLessThanOrEqual(1e-9 * Math.max(1, ps.peak));
    }), { seed: 1, numRuns: 100 });
  });

  it('closes the energy balance over one period: ∫P dt = UA ∫(T − T∞) dt (C·ΔT = 0 in the periodic state)', () => {
    // Each segment integrated in closed form: ∫θ ds = θ_eq Δ + (θ_0 − θ_eq) τ (1 − e^{−Δ/τ}) (Incropera §5.3, from memory).
    fc.assert(fc.property(profileArb, bodyArb, (p, b) => {
      const tau = b.Cth / b.UA;
      const ps = periodicProfile(p, tau, b.UA);
      let heat = 0;
      let loss = 0;
      for (let i = 0; i < p.P.length; i++) {
        const dt = p.t[i + 1]! - p.t[i]!;
        const eq = p.P[i]! / b.UA;
        heat += p.P[i]! * dt;
        loss += b.UA * (eq * dt + (ps.theta[i]! - eq) * tau * -Math.expm1(-dt / tau));
      }
      expect(Math.abs(heat - loss)).toBeLessThanOrEqual(1e-9 * Math.max(1, heat));
    }), { seed: 1, numRuns: 100 });
  });

  it('closes the energy balance by quadrature of the computed temperature over a late period', () => {
    // independent of the segment formula: adaptive Simpson on T(t) − T∞ (closed form, quadrature error < 1e-9)
    const p: PowerProfile = { t: [0, 200, 500, 900], P: [300, 20, 90] };
    const w = profileWarmUp(BODY, p, 'repeat');
    const k = 60; // 60 periods ≈ 29 τ: the transient has decayed below 1e-12
    let loss = 0;
    for (let i = 0; i < 3; i++) loss += BODY.UA * adaptiveSimpson((t) => w.at(t) - BODY.Tamb, k * 900 + p.t[i]!, k * 900 + p.t[i + 1]!, 1e-10);
    expectClose({ label: 'UA ∫θ dt vs ∫P dt', computed: loss, expected: 300 * 200 + 20 * 300 + 90 * 400, tol: 1e-8, why: 'quadrature tolerance 1e-10 per segment' });
  });

  it('puts the peak between the smallest and largest constant-power equilibria, and at or above the mean-power one', () => {
    fc.assert(fc.property(profileArb, bodyArb, (p, b) => {
      const w = profileWarmUp(b, p, 'repeat');
      const lo = b.Tamb + Math.min(...p.P) / b.UA;
      const hi = b.Tamb + Math.max(...p.P) / b.UA;
      const slack = 1e-9 * (hi - b.Tamb + 1);
      expect(w.Tpeak).toBeGreaterThanOrEqual(lo - slack);
      expect(w.Tpeak).toBeLessThanOrEqual(hi + slack);
      expect(w.Tpeak).toBeGreaterThanOrEqual(w.Tmean - slack);
    }), { seed: 1, numRuns: 100 });
  });

  it('scales the rise with the power: all P × k gives T − T∞ × k', () => {
    fc.assert(fc.property(profileArb, bodyArb, fc.double({ min: 0.01, max: 100, noNaN: true }), fc.constantFrom(...TIMES), (p, b, k, t) => {
      const one = profileWarmUp(b, p, 'repeat').at(t) - b.Tamb;
      const scaled = profileWarmUp(b, { t: p.t, P: p.P.map((x) => k * x) }, 'repeat').at(t) - b.Tamb;
      expect(Math.abs(scaled - k * one)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(k * one)) + 1e-9 * k);
    }), { seed: 1, numRuns: 100 });
  });
});

describe('profileWarmUp time to a limit and bounds of the work', () => {
  it('reaches the temperature it says it reaches, when it says, and not before', () => {
    fc.assert(fc.property(profileArb, bodyArb, fc.double({ min: 0.05, max: 0.995, noNaN: true }), fc.constantFrom('repeat' as const, 'off' as const), (p, b, f, end) => {
      const w = profileWarmUp(b, p, end);
      if (!(w.Tpeak - b.Tamb > 1e-6)) return;
      const T = b.Tamb + f * (w.Tpeak - b.Tamb);
      const t = w.timeTo(T)!;
      expect(t).toBeGreaterThanOrEqual(0);
      expect(Math.abs(w.at(t) - T)).toBeLessThanOrEqual(1e-7 * (w.Tpeak - b.Tamb));
      // not earlier: sampled before the crossing the body is below T
      for (const s of [0.5, 0.9, 0.999]) expect(w.at(s * t)).toBeLessThanOrEqual(T + 1e-9 * (w.Tpeak - b.Tamb));
    }), { seed: 1, numRuns: 200 });
  });

  it('answers in O(segments) for any time, and refuses bad bodies and profiles with typed errors', () => {
    const w = profileWarmUp(BODY, { t: [0, 1, 2], P: [1000, 0] }, 'repeat');
    expect(Number.isFinite(w.at(1e12))).toBe(true); // 5e11 periods: closed form, no loop over periods
    expect(Number.isFinite(w.timeTo(w.Tpeak - 1e-3)!)).toBe(true);
    expect(() => profileWarmUp({ ...BODY, UA: 0 }, { t: [0, 1], P: [1] }, 'repeat')).toThrow(InputRangeError);
    expect(() => profileWarmUp(BODY, { t: [0, 1, 1], P: [1, 2] }, 'repeat')).toThrow(InputRangeError);
    expect(() => profileWarmUp(BODY, { t: [0, 1], P: [-1] }, 'repeat')).toThrow(InputRangeError);
    expect(() => profileWarmUp(BODY, { t: Array.from({ length: 2002 }, (_, i) => i), P: new Array(2001).fill(1) }, 'repeat')).toThrow(ComputationError);
    expect(() => w.at(-1)).toThrow(InputRangeError);
  });
});
