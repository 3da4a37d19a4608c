import { requireInRange } from '../errors.ts';
import { gamma } from '../numeric/gamma.ts';

/**
 * The factor λ(α) in the energy per cycle of a power-law damper F = C|v|^α sgn v under
 * harmonic motion x = X sin ωt:
 *
 * $$E_D = \lambda(\alpha)\,C\,\omega^\alpha X^{1+\alpha},\qquad
 *   \lambda(\alpha) = \frac{4\cdot 2^\alpha\,\Gamma^2(1+\alpha/2)}{\Gamma(2+\alpha)}$$
 *
 * λ(1) = π (linear viscous), λ(0) = 4 (Coulomb limit).
 *
 * @param alpha velocity exponent, [0, 2]
 * @example lambdaAlpha(0.5) // 3.49608
 * @source fema274 §9.3, fluid viscous devices (from memory); fema356 eq. 9-37 (from memory)
 */
export function lambdaAlpha(alpha: number): number {
  requireInRange('alpha', alpha, { min: 0, max: 2 });
  const g = gamma(1 + alpha / 2);
  return (4 * Math.pow(2, alpha) * g * g) / gamma(2 + alpha);
}
