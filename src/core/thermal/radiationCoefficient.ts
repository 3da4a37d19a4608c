import { requireInRange } from '../errors.ts';
import { STEFAN_BOLTZMANN } from '../constants.ts';

/**
 * Linearised radiation coefficient of a small grey surface in large isothermal surroundings:
 * q″ = h_r (T_s − T_sur) reproduces εσ(T_s⁴ − T_sur⁴) exactly.
 *
 * $$h_r = \varepsilon\sigma\,(T_s + T_{sur})(T_s^2 + T_{sur}^2)$$
 *
 * @param eps total hemispherical emissivity, [0, 1]
 * @param Ts surface temperature, K, (0, 3000]
 * @param Tsur surroundings temperature, K, (0, 3000]
 * @returns h_r in W/(m²·K)
 * @throws InputRangeError for an emissivity outside [0, 1] or a non-positive temperature
 * @example radiationCoefficient(0.9, 353.15, 298.15) // 7.0999 W/(m²·K)
 * @source incropera2007 eq. 1.9 (from memory)
 */
export function radiationCoefficient(eps: number, Ts: number, Tsur: number): number {
  requireInRange('eps', eps, { min: 0, max: 1 }, '');
  requireInRange('Ts', Ts, { min: 0, max: 3000, minExclusive: true }, 'K');
  requireInRange('Tsur', Tsur, { min: 0, max: 3000, minExclusive: true }, 'K');
  return eps * STEFAN_BOLTZMANN * (Ts + Tsur) * (Ts * Ts + Tsur * Tsur);
}
