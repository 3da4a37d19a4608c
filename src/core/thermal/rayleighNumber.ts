import { NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';
import type { AirRow } from './airTable.ts';
import { STANDARD_GRAVITY } from '../constants.ts';

/**
 * Grashof and Rayleigh numbers of an ideal gas (β = 1/T_f) over a length scale.
 *
 * $$Gr = \frac{g\beta|T_s-T_\infty|L^3}{\nu^2},\qquad Ra = \frac{g\beta|T_s-T_\infty|L^3}{\nu\alpha},\qquad \beta = 1/T_f$$
 *
 * @param props air properties at the film temperature T_f (props.T, K)
 * @param dT |T_s − T_∞|, K, [0, ∞)
 * @param L length scale, m, (0, ∞)
 * @returns { Gr, Ra }, both ≥ 0
 * @example rayleighNumber(airProperties(325.65), 55, 0.05).Ra // ≈ 4.26e5
 * @source incropera2007 eqs. 9.12 and 9.25 (from memory)
 */
export function rayleighNumber(props: AirRow, dT: number, L: number): { Gr: number; Ra: number } {
  requireInRange('dT', dT, NON_NEGATIVE, 'K');
  requireInRange('L', L, POSITIVE, 'm');
  const gbdL3 = (STANDARD_GRAVITY / props.T) * dT * L ** 3;
  return { Gr: gbdL3 / (props.nu * props.nu), Ra: gbdL3 / (props.nu * props.alpha) };
}
