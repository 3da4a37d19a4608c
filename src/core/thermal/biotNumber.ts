import { POSITIVE, NON_NEGATIVE, requireInRange } from '../errors.ts';

/**
 * Biot number of a body: surface conductance against internal conduction. The lumped model
 * (one temperature for the whole body) errs by under about 5 % when Bi < 0.1.
 *
 * $$Bi = \frac{h\,L_c}{k},\qquad L_c = V/A_s$$
 *
 * @param h surface coefficient (convection + radiation), W/(m²·K), [0, ∞)
 * @param Lc characteristic length V/A_s, m, (0, ∞)
 * @param k thermal conductivity of the body, W/(m·K), (0, ∞)
 * @example biotNumber(13.5, 0.003, 50) // 8.1e-4
 * @source incropera2007 eqs. 5.10 and 5.11 (from memory)
 */
export function biotNumber(h: number, Lc: number, k: number): number {
  requireInRange('h', h, NON_NEGATIVE, 'W/(m²·K)');
  requireInRange('Lc', Lc, POSITIVE, 'm');
  requireInRange('k', k, POSITIVE, 'W/(m·K)');
  return (h * Lc) / k;
}

/** Threshold below which lumping is accepted. */
export const BIOT_LUMPED_MAX = 0.1;
