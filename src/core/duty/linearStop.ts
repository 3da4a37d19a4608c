/**
 * An end stop made of a linear dashpot: the coefficient that brings the mass from its impact
 * speed down to a small residual speed within the stroke, and the peak force that costs.
 */
import { ComputationError, InputRangeError, NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';

export interface LinearStop {
  /** Dashpot coefficient, N·s/m. */
  readonly c: number;
  /** Peak damper force (at contact), N. */
  readonly Fpeak: number;
  /** Peak deceleration of the mass, m/s². */
  readonly decelPeak: number;
  /** Time to traverse the stroke, s. */
  readonly duration: number;
  /** Energy the dashpot dissipates over the stroke, J. */
  readonly Edamper: number;
  /** Kinetic energy left at the end of the stroke (taken by the hard stop), J. */
  readonly Eresidual: number;
  /** v(t) for t in [0, duration]: v_t + (v0 − v_t)·e^{−t/τ}. */
  velocity(t: number): number;
}

/** Stroke travelled while slowing from v0 to ve: x = τ[(v0 − ve) + v_t ln((v0 − v_t)/(ve − v_t))]. */
function strokeFor(c: number, m: number, v0: number, ve: number, F0: number): number {
  const vt = F0 / c;
  return (m / c) * (v0 - ve + (vt > 0 ? vt * Math.log((v0 - vt) / (ve - vt)) : 0));
}

/**
 * Linear dashpot end stop with a constant force F0 (propelling force + weight) pushing on.
 *
 * $$m\dot v = F_0 - c v\ \Rightarrow\ v(t) = v_t + (v_0 - v_t)e^{-t/\tau},\quad v_t = F_0/c,\ \tau = m/c,$$
 * $$s = \tau\left[(v_0 - v_e) + v_t\ln\frac{v_0 - v_t}{v_e - v_t}\right],\qquad F_{peak} = c v_0,\qquad
 *   a_{peak} = \frac{c v_0 - F_0}{m}$$
 * A pure dashpot never stops a mass that is pushed on (it creeps at v_t), so the stroke is sized to
 * leave a residual speed v_e > v_t. With F0 = 0 and v_e = 0: c = m v0/s, F_peak = 2E/s.
 *
 * @param m mass (0, ∞) kg; v0 impact speed (0, ∞) m/s; F0 [0, ∞) N; s stroke (0, ∞) m
 * @param ve residual speed at the end of the stroke, [0, v0) m/s; > 0 when F0 > 0
 * @throws InputRangeError (named 'vEnd') when ve is not below v0, or is 0 with F0 > 0
 * @example linearStop(12, 1.5, 0, 0.025, 0).Fpeak // 1080 N (= 2·13.5 J / 0.025 m)
 * @source meriam2012 §3/5 rectilinear motion with velocity-proportional resistance (section from memory); closed form
 */
export function linearStop(m: number, v0: number, F0: number, s: number, ve: number): LinearStop {
  requireInRange('m', m, POSITIVE, 'kg');
  requireInRange('v', v0, POSITIVE, 'm/s');
  requireInRange('F0', F0, NON_NEGATIVE, 'N');
  requireInRange('s', s, POSITIVE, 'm');
  requireInRange('vEnd', ve, { min: 0, max: v0, maxExclusive: true }, 'm/s');
  if (F0 > 0 && ve === 0) throw new InputRangeError('vEnd', ve, { min: 0, max: v0, minExclusive: true, maxExclusive: true }, 'm/s', 'a pushed mass is never stopped by a dashpot alone; give a residual speed');
  let c: number;
  if (F0 === 0) c = (m * (v0 - ve)) / s;
  else {
    // x(c) falls from ∞ (c → F0/ve) to 0 (c → ∞): bisection in log c.
    let lo = (F0 / ve) * (1 + 1e-12);
    let hi = Math.max(lo * 2, (2 * m * v0) / s);
    while (strokeFor(hi, m, v0, ve, F0) > s) hi *= 2;
    for (let i = 0; i < 200 && hi / lo - 1 > 1e-13; i++) {
      const mid = Math.sqrt(lo * hi);
      if (strokeFor(mid, m, v0, ve, F0) > s) lo = mid;
      else hi = mid;
    }
    c = Math.sqrt(lo * hi);
  }
  if (!(c > 0) || !Number.isFinite(c)) throw new ComputationError('linear end stop: no finite coefficient for these inputs');
  const vt = F0 / c;
  const tau = m / c;
  const duration = ve - vt > 0 ? tau * Math.log((v0 - vt) / (ve - vt)) : Infinity;
  const Eresidual = 0.5 * m * ve * ve;
  return {
    c, Fpeak: c * v0, decelPeak: (c * v0 - F0) / m,
    duration: Number.isFinite(duration) ? duration : (m / c) * 20,
    Edamper: 0.5 * m * v0 * v0 + F0 * s - Eresidual,
    Eresidual,
    velocity: (t: number) => vt + (v0 - vt) * Math.exp(-t / tau),
  };
}
