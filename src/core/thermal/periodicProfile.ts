/**
 * The periodic steady state of a lumped body under a repeated power profile: the fixed point of
 * the linear period map.
 */
import { lumpedStep } from './lumpedStep.ts';
import type { PowerProfile } from './powerProfile.ts';

export interface PeriodicProfile {
  /** Period map θ_end = a·θ_start + b: a = e^{−t_p/τ}, b = rise over one period from ambient, K. */
  readonly a: number;
  readonly b: number;
  /** Rise above ambient at each boundary of the profile in the periodic steady state, K (length n + 1; first = last). */
  readonly theta: readonly number[];
  /** Highest rise of the periodic steady state (at a boundary: every segment is monotonic), K. */
  readonly peak: number;
  /** Lowest rise of the periodic steady state, K. */
  readonly low: number;
}

/**
 * Over one period the response is linear in the start temperature, so the period map is
 * $\theta_{end} = a\,\theta_{start} + b$ with $a = e^{-t_p/\tau}$ and $b$ the rise after one
 * period from ambient (exact steps, lumpedStep). Its fixed point is the periodic steady state:
 *
 * $$\theta^{*} = \frac{b}{1 - a} = \frac{b}{-\operatorname{expm1}(-t_p/\tau)}$$
 *
 * and the boundary rises follow from θ* by the same exact steps. Every segment is a single
 * exponential towards P_i/UA, so the peak and low lie at boundaries.
 *
 * @param p a checked profile (checkProfile)
 * @param tau C/UA, s, > 0; UA W/K, > 0
 * @example periodicProfile({ t: [0, 300, 600], P: [150, 0] }, 1870.8, 0.745664).peak // ≈ 108.63 K
 * @source incropera2007 §5.3 (lumped capacitance, from memory); fixed point of an affine map (closed form)
 */
export function periodicProfile(p: PowerProfile, tau: number, UA: number): PeriodicProfile {
  const n = p.P.length;
  const tp = p.t[n]!;
  let b = 0;
  for (let i = 0; i < n; i++) b = lumpedStep(b, p.P[i]!, p.t[i + 1]! - p.t[i]!, tau, UA);
  const a = Math.exp(-tp / tau);
  const oneMinusA = -Math.expm1(-tp / tau);
  const theta = [b / oneMinusA];
  for (let i = 0; i < n; i++) theta.push(lumpedStep(theta[i]!, p.P[i]!, p.t[i + 1]! - p.t[i]!, tau, UA));
  theta[n] = theta[0]!; // the fixed point, exactly (the recomputed value differs by rounding only)
  return { a, b, theta, peak: theta.reduce((s, x) => Math.max(s, x), -Infinity), low: theta.reduce((s, x) => Math.min(s, x), Infinity) };
}
