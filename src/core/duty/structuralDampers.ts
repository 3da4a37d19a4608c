/**
 * Fluid viscous dampers in the diagonal braces of a storey: energy per cycle, supplemental
 * damping ratio by the energy method, mean power and adiabatic temperature rise per event.
 */
import { ALPHA_RANGE, lambdaAlpha } from '../dampers/index.ts';
import { NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';

export interface StoreyDampers {
  /** Power-law coefficient of one damper, N·(s/m)^α, and exponent α (0, 2]. */
  readonly C: number;
  readonly alpha: number;
  /** Number of dampers acting in this storey and direction. */
  readonly n: number;
  /** Brace angle to the horizontal, rad, [0, π/2). */
  readonly theta: number;
  /** Storey drift amplitude, m; period of the oscillation, s. */
  readonly drift: number;
  readonly T: number;
  /** Lateral stiffness of the storey (frame without dampers), N/m. */
  readonly k: number;
}

export interface StoreyDamperResult {
  /** Damper stroke amplitude δ = Δ·cos θ, m. */
  readonly stroke: number;
  readonly vPeak: number;
  /** Peak axial force of one damper, N. */
  readonly Fpeak: number;
  /** Energy per cycle of one damper, J. */
  readonly Wj: number;
  /** Strain energy of the storey at the drift amplitude, J. */
  readonly Wk: number;
  /** Supplemental damping ratio of the storey. */
  readonly betaSup: number;
  /** Mean power of one damper while the oscillation lasts, W. */
  readonly Pdamper: number;
}

/**
 * Energy method for velocity-dependent dampers, one storey.
 *
 * $$\delta = \Delta\cos\theta,\quad \omega = \frac{2\pi}{T},\quad
 *   W_j = \lambda(\alpha)\,C\,\omega^\alpha\,\delta^{1+\alpha}\ \left(=\tfrac{2\pi^2}{T}C\delta^2\ \text{for}\ \alpha = 1\right),$$
 * $$W_k = \tfrac12 k\Delta^2,\qquad \beta_{sup} = \frac{n W_j}{4\pi W_k},\qquad \bar P = \frac{W_j}{T},\qquad F_{peak} = C(\omega\delta)^\alpha$$
 *
 * For α = 1 and θ = 0 this reduces to β = πC/(kT), the viscous damping ratio cω/(2k).
 *
 * @throws InputRangeError naming the input
 * @example storeyDampers({ C: 1e5, alpha: 1, n: 1, theta: 0, drift: 0.02, T: 1, k: 1e7 }).Wj // 789.568 J
 * @source fema356 §9.3, eqs. 9-36/9-37 (energy method; equation numbers from memory); asce41_17 §14.3 (from memory);
 *   fema274 §9.3 λ(α) (from memory)
 */
export function storeyDampers(d: StoreyDampers): StoreyDamperResult {
  requireInRange('C', d.C, POSITIVE, 'N·(s/m)^α');
  requireInRange('alpha', d.alpha, ALPHA_RANGE, '');
  requireInRange('n', d.n, { min: 1, max: 1000 }, '');
  requireInRange('theta', d.theta, { min: 0, max: Math.PI / 2, maxExclusive: true }, 'rad');
  requireInRange('drift', d.drift, POSITIVE, 'm');
  requireInRange('T', d.T, POSITIVE, 's');
  requireInRange('k', d.k, POSITIVE, 'N/m');
  const stroke = d.drift * Math.cos(d.theta);
  const omega = (2 * Math.PI) / d.T;
  const vPeak = omega * stroke;
  const Wj = lambdaAlpha(d.alpha) * d.C * omega ** d.alpha * stroke ** (1 + d.alpha);
  const Wk = 0.5 * d.k * d.drift * d.drift;
  return { stroke, vPeak, Fpeak: d.C * vPeak ** d.alpha, Wj, Wk, betaSup: (d.n * Wj) / (4 * Math.PI * Wk), Pdamper: Wj / d.T };
}

/**
 * Adiabatic temperature rise of a damper that keeps all the heat of an event.
 *
 * $$\Delta T = \frac{E}{m_{steel}c_{steel} + m_{fluid}c_{fluid}}$$
 *
 * An upper bound for short events (seconds): nothing is lost to the air in the time.
 *
 * @param E energy dissipated by one damper in the event, J, ≥ 0
 * @param heatCapacity Σ m·c_p of the damper's steel and fluid, J/K, > 0
 * @example adiabaticRise(143e3, 22900) // 6.24 K
 * @source common practice, no source (structural damper thermal check; the energy balance is closed form)
 */
export function adiabaticRise(E: number, heatCapacity: number): number {
  requireInRange('E', E, NON_NEGATIVE, 'J');
  requireInRange('heatCapacity', heatCapacity, POSITIVE, 'J/K');
  return E / heatCapacity;
}
