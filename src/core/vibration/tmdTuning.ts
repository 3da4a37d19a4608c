import { requireInRange } from '../errors.ts';

/**
 * What drives the primary and what the tuning minimises:
 * 'force' harmonic force, peak primary displacement (Den Hartog);
 * 'base' harmonic base acceleration, peak primary displacement relative to the base;
 * 'white-force' white-noise force, primary displacement variance;
 * 'white-base' white-noise base acceleration, variance of the relative primary displacement.
 */
export type TmdExcitation = 'force' | 'base' | 'white-force' | 'white-base';

export interface TmdTuning {
  /** absorber / primary natural frequency ratio ω_a/ω_1 */ readonly f: number;
  /** absorber damping ratio on the absorber's own frequency: c/(2 m_a ω_a) */ readonly zeta: number;
  /** the same damping on the primary's frequency, c/(2 m_a ω_1) = f·ζ (Den Hartog's c/c_c) */ readonly zetaPrimary: number;
}

/**
 * Classical optimum absorber parameters for an undamped primary of mass ratio μ = m_a/m_1.
 *
 * Harmonic force (Den Hartog; Brock for the damping):
 * $$f = \frac{1}{1+\mu},\qquad \zeta = \sqrt{\frac{3\mu}{8(1+\mu)}}$$
 * Harmonic base acceleration: $$f = \frac{\sqrt{1-\mu/2}}{1+\mu},\qquad \zeta = \sqrt{\frac{3\mu}{8(1+\mu)(1-\mu/2)}}$$
 * White-noise force: $$f = \frac{\sqrt{1+\mu/2}}{1+\mu},\qquad \zeta = \sqrt{\frac{\mu(1+3\mu/4)}{4(1+\mu)(1+\mu/2)}}$$
 * White-noise base acceleration: $$f = \frac{\sqrt{1-\mu/2}}{1+\mu},\qquad \zeta = \sqrt{\frac{\mu(1-\mu/4)}{4(1+\mu)(1-\mu/2)}}$$
 * ζ is referred to the absorber's own frequency; Den Hartog's form
 * $(c/c_c) = \sqrt{3\mu/(8(1+\mu)^3)}$ with $c_c = 2m_a\omega_1$ is `zetaPrimary` = f·ζ.
 *
 * @param mu mass ratio m_a/m_1, (0, 1]
 * @param excitation see TmdExcitation
 * @example tmdTuning(0.05, 'force') // { f: 0.952381, zeta: 0.133631, zetaPrimary: 0.127267 }
 * @source denHartog1956 ch. 3, the damped vibration absorber and its fixed points (from memory); brock1946 (optimum damping);
 *   warburton1982, optimum-parameter tables for harmonic and white-noise excitation (from memory; not checked against the paper)
 */
export function tmdTuning(mu: number, excitation: TmdExcitation): TmdTuning {
  requireInRange('mu', mu, { min: 0, max: 1, minExclusive: true });
  let f: number;
  let zeta: number;
  switch (excitation) {
    case 'force':
      f = 1 / (1 + mu);
      zeta = Math.sqrt((3 * mu) / (8 * (1 + mu)));
      break;
    case 'base':
      f = Math.sqrt(1 - mu / 2) / (1 + mu);
      zeta = Math.sqrt((3 * mu) / (8 * (1 + mu) * (1 - mu / 2)));
      break;
    case 'white-force':
      f = Math.sqrt(1 + mu / 2) / (1 + mu);
      zeta = Math.sqrt((mu * (1 + (3 * mu) / 4)) / (4 * (1 + mu) * (1 + mu / 2)));
      break;
    case 'white-base':
      f = Math.sqrt(1 - mu / 2) / (1 + mu);
      zeta = Math.sqrt((mu * (1 - mu / 4)) / (4 * (1 + mu) * (1 - mu / 2)));
      break;
  }
  return { f, zeta, zetaPrimary: f * zeta };
}
