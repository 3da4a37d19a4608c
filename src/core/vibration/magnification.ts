import { InputRangeError, NON_NEGATIVE, requireInRange } from '../errors.ts';

/**
 * Dynamic magnification factor of a viscously damped SDOF system under a harmonic force:
 * steady amplitude over the static deflection F0/k.
 *
 * $$M = \frac{X}{F_0/k} = \frac{1}{\sqrt{(1-r^2)^2 + (2\zeta r)^2}},\qquad r = \omega/\omega_n$$
 *
 * @param r frequency ratio ω/ω_n, [0, ∞)
 * @param zeta damping ratio, [0, ∞)
 * @returns M, dimensionless
 * @throws InputRangeError for negative or non-finite inputs, and naming 'r' at r = 1 with ζ = 0
 *   (undamped resonance, unbounded amplitude)
 * @example magnificationFactor(0.5, 0.1) // 1.321637
 * @source rao2017 §3.4, magnification factor of a damped system under harmonic force (section from memory)
 */
export function magnificationFactor(r: number, zeta: number): number {
  requireInRange('r', r, NON_NEGATIVE);
  requireInRange('zeta', zeta, NON_NEGATIVE);
  const d = Math.hypot(1 - r * r, 2 * zeta * r);
  if (d === 0) throw new InputRangeError('r', 1, undefined, '', 'undamped system driven at resonance: the steady amplitude is unbounded; add damping or move off r = 1');
  return 1 / d;
}

/**
 * Phase lag of the displacement behind the harmonic force, in [0, π].
 *
 * $$\varphi = \operatorname{atan2}(2\zeta r,\; 1-r^2)$$
 *
 * @param r frequency ratio, [0, ∞)
 * @param zeta damping ratio, [0, ∞)
 * @returns φ in rad (π/2 at resonance for any ζ > 0)
 * @example phaseLag(1, 0.1) // 1.570796 (π/2 at resonance)
 * @source rao2017 §3.4, phase angle (section from memory)
 */
export function phaseLag(r: number, zeta: number): number {
  requireInRange('r', r, NON_NEGATIVE);
  requireInRange('zeta', zeta, NON_NEGATIVE);
  return Math.atan2(2 * zeta * r, 1 - r * r);
}
