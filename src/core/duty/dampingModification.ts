import { requireInRange } from '../errors.ts';

/** Lower bound of the Eurocode 8 damping correction factor. */
export const ETA_FLOOR = 0.55;

/**
 * Damping correction factor of the elastic response spectrum: the ratio of the spectral
 * displacement at viscous damping ratio ξ to that at 5 %.
 *
 * $$\eta = \sqrt{\frac{10}{5 + \xi}} \ge 0.55\qquad (\xi\ \text{in per cent})$$
 *
 * η = 1 at 5 %; the floor 0.55 is reached at ξ ≈ 28 %, beyond which the code credits no more.
 *
 * @param xi viscous damping ratio as a fraction (0.05 = 5 %), [0, 1]
 * @example dampingCorrection(0.1) // 0.8165 (EN 1998-1 eq. 3.6 at 10 %)
 * @source en1998_1 §3.2.2.2, eq. (3.6) (published)
 */
export function dampingCorrection(xi: number): number {
  requireInRange('xi', xi, { min: 0, max: 1 }, '');
  return Math.max(ETA_FLOOR, Math.sqrt(10 / (5 + 100 * xi)));
}
