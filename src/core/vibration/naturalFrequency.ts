import { POSITIVE, requireInRange } from '../errors.ts';

/**
 * Undamped natural circular frequency of a mass on a spring.
 *
 * $$\omega_n = \sqrt{k/m}$$
 *
 * @param m mass, kg, (0, ∞)
 * @param k stiffness, N/m, (0, ∞)
 * @returns ω_n in rad/s
 * @throws InputRangeError when m or k is not a positive finite number
 * @example naturalFrequency(10, 4000) // 20 rad/s
 * @source rao2017 §2.2 (section from memory)
 */
export function naturalFrequency(m: number, k: number): number {
  requireInRange('m', m, POSITIVE, 'kg');
  requireInRange('k', k, POSITIVE, 'N/m');
  return Math.sqrt(k / m);
}
