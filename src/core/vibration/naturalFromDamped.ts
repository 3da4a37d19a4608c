import { requireInRange } from '../errors.ts';

/**
 * Undamped natural circular frequency from a measured damped period and the damping ratio
 * (a ring-down test gives both: T_d between peaks, ζ from their decay).
 *
 * $$\omega_n = \frac{2\pi}{T_d\sqrt{1-\zeta^2}}\quad(0 \le \zeta < 1)$$
 *
 * @param Td damped period, s, (0, ∞)
 * @param zeta damping ratio, [0, 1)
 * @returns ω_n in rad/s
 * @example naturalFromDampedPeriod(2 * Math.PI / 19.8997487, 0.1) // 20 rad/s
 * @source rao2017 §2.6.2, ω_d = ω_n√(1−ζ²) and τ_d = 2π/ω_d (section from memory)
 */
export function naturalFromDampedPeriod(Td: number, zeta: number): number {
  requireInRange('Td', Td, { min: 0, max: Infinity, minExclusive: true, maxExclusive: true }, 's');
  requireInRange('zeta', zeta, { min: 0, max: 1, maxExclusive: true });
  return (2 * Math.PI) / (Td * Math.sqrt(1 - zeta * zeta));
}
