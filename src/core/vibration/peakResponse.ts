import { requireInRange } from '../errors.ts';

/**
 * Resonant peak of the displacement magnification factor (exists for ζ < 1/√2).
 *
 * $$r_{peak} = \sqrt{1-2\zeta^2},\qquad M_{max} = \frac{1}{2\zeta\sqrt{1-\zeta^2}}$$
 *
 * @param zeta damping ratio, (0, 1/√2)
 * @returns the frequency ratio and height of the peak
 * @throws InputRangeError naming 'zeta' outside (0, 1/√2): no interior peak there
 * @example displacementPeak(0.05) // { r: 0.997497, M: 10.01252 }
 * @source rao2017 §3.4, resonant peak (section from memory)
 */
export function displacementPeak(zeta: number): { r: number; M: number } {
  requireInRange('zeta', zeta, { min: 0, max: Math.SQRT1_2, minExclusive: true, maxExclusive: true });
  return { r: Math.sqrt(1 - 2 * zeta * zeta), M: 1 / (2 * zeta * Math.sqrt(1 - zeta * zeta)) };
}

/**
 * Peak of the transmissibility curve.
 *
 * $$r_{peak} = \frac{\sqrt{\sqrt{1+8\zeta^2}-1}}{2\zeta}$$
 *
 * @param zeta damping ratio, (0, ∞)
 * @returns the frequency ratio and height of the peak
 * @example transmissibilityPeak(0.5) // { r: 0.855600, TR: 1.467890 }
 * @source rao2017 §9.10 (from memory: the book plots the curve; the closed form follows from dT_R/dr = 0)
 */
export function transmissibilityPeak(zeta: number): { r: number; TR: number } {
  requireInRange('zeta', zeta, { min: 0, max: Infinity, minExclusive: true, maxExclusive: true });
  const r = Math.sqrt(Math.sqrt(1 + 8 * zeta * zeta) - 1) / (2 * zeta);
  const q = (2 * zeta * r) ** 2;
  return { r, TR: Math.sqrt((1 + q) / ((1 - r * r) ** 2 + q)) };
}
