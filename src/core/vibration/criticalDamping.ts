import { POSITIVE, requireInRange } from '../errors.ts';

/**
 * Critical damping coefficient: the smallest c for which free motion does not oscillate.
 *
 * $$c_{cr} = 2\sqrt{k m} = 2 m \omega_n$$
 *
 * @param m mass, kg, (0, ∞)
 * @param k stiffness, N/m, (0, ∞)
 * @returns c_cr in N·s/m
 * @example criticalDamping(10, 4000) // 400 N·s/m
 * @source rao2017 §2.6 (section from memory)
 */
export function criticalDamping(m: number, k: number): number {
  requireInRange('m', m, POSITIVE, 'kg');
  requireInRange('k', k, POSITIVE, 'N/m');
  return 2 * Math.sqrt(k * m);
}
