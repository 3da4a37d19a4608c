import { damperForce, type DamperLaw } from '../dampers/index.ts';

/** The damper force the time simulation integrates, and what was changed to make it integrable. */
export interface TimeDomainLaw {
  /** The law integrated: hysteretic replaced by its viscous equivalent, others unchanged. */
  readonly law: DamperLaw;
  /** Force at stroke velocity v, N. */
  readonly force: (v: number) => number;
  /** Power law with α < 1: below this speed the force is linear (m/s); 0 when not used. */
  readonly vLinear: number;
}

/** Fraction of the velocity scale below which a power law with α < 1 is made linear. */
export const POWER_LAW_LINEAR_FRACTION = 1e-3;
/** Largest decay rate c_low/m of the linear part, as a multiple of the fastest frequency of the run. */
export const POWER_LAW_RATE_CAP = 100;

/**
 * Turns a damper law into a force function an explicit integrator can follow.
 *
 * Hysteretic damping is defined for harmonic motion only, so it is replaced by the viscous
 * damper that dissipates the same energy per cycle at the reference frequency ω_ref (the
 * excitation frequency, or ω_n in free vibration):
 * $$c_{eq} = \frac{\eta k}{\omega_{ref}}$$
 *
 * A power law with α < 1 has an infinite slope dF/dv at v = 0, which makes the equations stiff
 * whenever the mass creeps; below v_ε the force is taken on the chord
 * $$F = C\,v_\varepsilon^{\alpha-1}\,v,\qquad |v| < v_\varepsilon,\qquad
 *   v_\varepsilon = \max\!\left(10^{-3}V_{scale},\ \left(\frac{C}{100\,m\,\omega_{hi}}\right)^{1/(1-\alpha)}\right)$$
 * which meets the law at ±v_ε. The second term keeps the decay rate c/m of the chord below
 * 100·ω_hi so an explicit integrator can follow it; it only acts for very heavy, nearly
 * friction-like dampers (α → 0), and the calculator then says so. The energy audit uses the same
 * force, so it still closes.
 *
 * @param vScale velocity scale of the run, m/s, > 0
 * @param m moving mass, kg (for the rate cap)
 * @param omegaHi fastest circular frequency of the run, max(ω_n, ω), rad/s
 * @example timeDomainLaw({ kind: 'hysteretic', eta: 0.1, k: 1e5 }, 50, 1, 1, 50).law // { kind: 'linear', c: 200 }
 * @source chopra2017 §3.10 (equivalent viscous form of rate-independent damping; from memory); regularisation: common practice, no source
 */
export function timeDomainLaw(law: DamperLaw, omegaRef: number, vScale: number, m: number, omegaHi: number): TimeDomainLaw {
  if (law.kind === 'hysteretic') {
    const c = (law.eta * law.k) / omegaRef;
    return { law: { kind: 'linear', c }, force: (v) => c * v, vLinear: 0 };
  }
  if (law.kind === 'power' && law.alpha < 1) {
    const vEps = Math.max(POWER_LAW_LINEAR_FRACTION * vScale, Math.pow(law.C / (POWER_LAW_RATE_CAP * m * omegaHi), 1 / (1 - law.alpha)));
    const cLow = law.C * Math.pow(vEps, law.alpha - 1);
    const { C, alpha } = law;
    return { law, force: (v) => (Math.abs(v) < vEps ? cLow * v : Math.sign(v) * C * Math.pow(Math.abs(v), alpha)), vLinear: vEps };
  }
  return { law, force: (v) => damperForce(law, v), vLinear: 0 };
}
