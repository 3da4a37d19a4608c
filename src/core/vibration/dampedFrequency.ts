import { requireInRange } from '../errors.ts';

/**
 * Damped natural circular frequency.
 *
 * $$\omega_d = \omega_n\sqrt{1-\zeta^2}\quad(\zeta<1)$$
 *
 * @param wn undamped natural frequency, rad/s, (0, ∞)
 * @param zeta damping ratio, [0, 1); returns 0 for ζ ≥ 1 (no oscillation)
 * @returns ω_d in rad/s
 * @example dampedFrequency(20, 0.1) // 19.8997 rad/s
 * @source rao2017 §2.6.2 (section from memory)
 */
export function dampedFrequency(wn: number, zeta: number): number {
  requireInRange('wn', wn, { min: 0, max: Infinity, minExclusive: true, maxExclusive: true }, 'rad/s');
  requireInRange('zeta', zeta, { min: 0, max: Infinity, maxExclusive: true });
  return zeta < 1 ? wn * Math.sqrt(1 - zeta * zeta) : 0;
}
