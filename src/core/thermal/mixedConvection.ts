import { NON_NEGATIVE, requireInRange } from '../errors.ts';

/**
 * Combined forced and free convection when buoyancy acts across (or with) the forced flow:
 * the two coefficients add in the n-th power.
 *
 * $$h^n = h_F^n + h_N^n,\qquad n = 3$$
 *
 * Written for h rather than Nu so that a vertical body (free convection on its height, forced on
 * its diameter) can use it; on one length scale it is the Nusselt form of the source. The '+' sign
 * is for assisting and transverse flows (air across a horizontal or vertical damper body); an
 * opposing flow would take '−' and is not modelled.
 *
 * @param hF forced-convection coefficient, W/(m²·K), [0, ∞)
 * @param hN free-convection coefficient, W/(m²·K), [0, ∞)
 * @param n exponent, default 3
 * @example mixedConvection(10, 10) // 12.60 W/(m²·K)
 * @source incropera2007 eq. 9.64, §9.9 (n = 3; from memory); churchill1977mixed
 */
export function mixedConvection(hF: number, hN: number, n = 3): number {
  requireInRange('hF', hF, NON_NEGATIVE, 'W/(m²·K)');
  requireInRange('hN', hN, NON_NEGATIVE, 'W/(m²·K)');
  return (hF ** n + hN ** n) ** (1 / n);
}
