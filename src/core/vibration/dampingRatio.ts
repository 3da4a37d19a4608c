import { NON_NEGATIVE, requireInRange } from '../errors.ts';
import { criticalDamping } from './criticalDamping.ts';

/**
 * Viscous damping ratio (fraction of critical damping).
 *
 * $$\zeta = \frac{c}{c_{cr}} = \frac{c}{2\sqrt{k m}}$$
 *
 * @param m mass, kg, (0, ∞)
 * @param k stiffness, N/m, (0, ∞)
 * @param c viscous damping coefficient, N·s/m, [0, ∞)
 * @returns ζ, dimensionless
 * @example dampingRatio(10, 4000, 40) // 0.1
 * @source rao2017 §2.6 (section from memory)
 */
export function dampingRatio(m: number, k: number, c: number): number {
  requireInRange('c', c, NON_NEGATIVE, 'N·s/m');
  return c / criticalDamping(m, k);
}
