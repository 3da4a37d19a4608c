import { magnificationFactor } from './magnification.ts';

/**
 * Transmissibility of a viscously damped SDOF mount: transmitted force over applied force
 * amplitude (force excitation), equally absolute mass motion over base motion (base excitation).
 *
 * $$T_R = \sqrt{1+(2\zeta r)^2}\; M = \sqrt{\frac{1+(2\zeta r)^2}{(1-r^2)^2+(2\zeta r)^2}}$$
 *
 * T_R = 1 at r = √2 for every ζ; isolation (T_R < 1) needs r > √2.
 *
 * @param r frequency ratio ω/ω_n, [0, ∞)
 * @param zeta damping ratio, [0, ∞)
 * @returns T_R, dimensionless
 * @example transmissibility(2, 0.1) // 0.355862
 * @source rao2017 §9.10, transmissibility (section from memory)
 */
export function transmissibility(r: number, zeta: number): number {
  return Math.sqrt(1 + (2 * zeta * r) ** 2) * magnificationFactor(r, zeta);
}

/**
 * Relative (spring and damper) motion over base motion amplitude under harmonic base excitation.
 *
 * $$\frac{Z}{Y} = r^2 M = \frac{r^2}{\sqrt{(1-r^2)^2+(2\zeta r)^2}}$$
 *
 * @param r frequency ratio, [0, ∞)
 * @param zeta damping ratio, [0, ∞)
 * @returns Z/Y, dimensionless (tends to 1 far above resonance)
 * @example relativeMotionRatio(1, 0.1) // 5
 * @source rao2017 §3.6, base excitation, relative motion (section from memory)
 */
export function relativeMotionRatio(r: number, zeta: number): number {
  return r * r * magnificationFactor(r, zeta);
}

/**
 * Phase lag of the absolute mass motion behind the base motion (base excitation), in [0, π].
 *
 * $$\varphi = \operatorname{atan2}\!\left(2\zeta r^3,\; 1-r^2+(2\zeta r)^2\right)$$
 *
 * @param r frequency ratio, [0, ∞)
 * @param zeta damping ratio, [0, ∞)
 * @returns φ in rad
 * @example baseMotionPhaseLag(1, 0.1) // 1.373401 (atan2(0.2, 0.04))
 * @source rao2017 §3.6, base excitation, phase of the absolute motion (section from memory)
 */
export function baseMotionPhaseLag(r: number, zeta: number): number {
  magnificationFactor(r, zeta); // validates r and ζ, rejects the undamped resonance
  return Math.atan2(2 * zeta * r ** 3, 1 - r * r + (2 * zeta * r) ** 2);
}
