import { requireInRange } from '../errors.ts';

/**
 * Quality factor: the resonant amplification of a lightly damped system.
 *
 * $$Q = \frac{1}{2\zeta}$$
 *
 * @param zeta damping ratio, (0, ∞)
 * @example qualityFactor(0.1) // 5
 * @source rao2017 §3.4 (section from memory)
 */
export function qualityFactor(zeta: number): number {
  requireInRange('zeta', zeta, { min: 0, max: Infinity, minExclusive: true, maxExclusive: true });
  return 1 / (2 * zeta);
}
