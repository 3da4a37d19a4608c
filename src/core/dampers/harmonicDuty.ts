import { damperForce } from './damperForce.ts';
import { energyPerCycle } from './energyPerCycle.ts';
import type { DamperLaw } from './laws.ts';

/** What a damper does under harmonic stroke x = X sin ωt (SI). */
export interface HarmonicDuty {
  /** Energy per cycle, J. */
  readonly E: number;
  /** Mean power, W: E·ω/2π. */
  readonly P: number;
  /** Equivalent viscous coefficient, N·s/m: the linear damper that dissipates the same E. */
  readonly ceq: number;
  /** Largest force magnitude over the cycle, N. */
  readonly Fmax: number;
  /** Peak and RMS velocity, m/s. */
  readonly vmax: number;
  readonly vrms: number;
}

/**
 * Energy, mean power, equivalent viscous coefficient and peak force of a damper under
 * harmonic stroke.
 *
 * $$\bar P = \frac{E_D\,\omega}{2\pi},\qquad c_{eq} = \frac{E_D}{\pi\omega X^2},\qquad v_{rms} = \frac{X\omega}{\sqrt2}$$
 *
 * @param law damper law
 * @param X stroke amplitude, m, (0, ∞)
 * @param omega circular frequency, rad/s, (0, ∞)
 * @example harmonicDuty({ kind: 'linear', c: 1500 }, 0.025, 3 * Math.PI).P // 41.637 W
 * @source chopra2017 §3.9 (equivalent viscous damping; from memory)
 */
export function harmonicDuty(law: DamperLaw, X: number, omega: number): HarmonicDuty {
  const E = energyPerCycle(law, X, omega);
  const vmax = X * omega;
  // every law here is monotone in |v|, so the peak force is at peak velocity in one direction
  const Fmax = Math.max(Math.abs(damperForce(law, vmax, omega)), Math.abs(damperForce(law, -vmax, omega)));
  return { E, P: (E * omega) / (2 * Math.PI), ceq: E / (Math.PI * omega * X * X), Fmax, vmax, vrms: vmax / Math.SQRT2 };
}

/**
 * Equivalent viscous damping ratio of a damper on a spring k at amplitude X:
 *
 * $$\zeta_{eq} = \frac{E_D}{4\pi E_{So}},\qquad E_{So} = \tfrac12 k X^2$$
 *
 * @source chopra2017 §3.9 (from memory)
 */
export function equivalentDampingRatio(E: number, k: number, X: number): number {
  return E / (4 * Math.PI * 0.5 * k * X * X);
}
