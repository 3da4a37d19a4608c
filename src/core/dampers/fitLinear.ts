/**
 * Least-squares damping coefficient of a linear damper from force–velocity points, with the line
 * through the origin: a viscous damper has no force at rest once the gas force is removed, and a
 * free intercept would hide an offset that the reader should have subtracted.
 */
import { ComputationError } from '../errors.ts';

/**
 * Fits y = c·a through the origin.
 *
 * $$c = \frac{\sum a_i y_i}{\sum a_i^2}$$
 *
 * @param a velocity magnitudes, m/s (or signed velocities; the fit is the same)
 * @param y force with the sign convention of `a`, N
 * @returns c in N·s/m
 * @throws ComputationError when every velocity is zero
 * @example fitLinearOrigin([0.1, 0.2, -0.3], [98, 196, -294]) // 980
 * @source press2007 §15.4 general linear least squares, normal equations (from memory)
 */
export function fitLinearOrigin(a: readonly number[], y: readonly number[]): number {
  let saa = 0;
  let say = 0;
  for (let i = 0; i < a.length; i++) {
    saa += a[i]! * a[i]!;
    say += a[i]! * y[i]!;
  }
  if (!(saa > 0)) throw new ComputationError('a linear fit needs at least one point with a velocity other than zero');
  return say / saa;
}
