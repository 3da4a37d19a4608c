import { requireInRange } from '../errors.ts';

/**
 * Logarithmic decrement of an underdamped system from its damping ratio (exact relation).
 *
 * $$\delta = \frac{2\pi\zeta}{\sqrt{1-\zeta^2}}$$
 *
 * @param zeta damping ratio, [0, 1)
 * @returns δ per cycle, dimensionless
 * @example logDecrementFromZeta(0.1) // 0.631484
 * @source rao2017 §2.6.3 (section from memory)
 */
export function logDecrementFromZeta(zeta: number): number {
  requireInRange('zeta', zeta, { min: 0, max: 1, maxExclusive: true });
  return (2 * Math.PI * zeta) / Math.sqrt(1 - zeta * zeta);
}

/**
 * Damping ratio from a logarithmic decrement (exact inverse of logDecrementFromZeta).
 *
 * $$\zeta = \frac{\delta}{\sqrt{4\pi^2+\delta^2}}$$
 *
 * @param delta logarithmic decrement per cycle, [0, ∞)
 * @example zetaFromLogDecrement(Math.log(16)) // 0.4037
 * @source rao2017 §2.6.3 (section from memory)
 */
export function zetaFromLogDecrement(delta: number): number {
  requireInRange('delta', delta, { min: 0, max: Infinity, maxExclusive: true });
  return delta / Math.sqrt(4 * Math.PI * Math.PI + delta * delta);
}
