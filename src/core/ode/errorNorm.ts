/**
 * Scaled root-mean-square norm of a local error estimate, the quantity the step-size controller
 * drives to 1.
 *
 * $$\|\mathrm{err}\| = \sqrt{\frac{1}{n}\sum_{i=1}^{n}\left(\frac{\mathrm{err}_i}{sc_i}\right)^2},\qquad
 *   sc_i = \mathrm{atol}_i + \mathrm{rtol}\,\max(|y_{0,i}|, |y_{1,i}|)$$
 *
 * @param err local error estimate
 * @param y0 state at the start of the step
 * @param y1 proposed state at the end of the step
 * @param rtol relative tolerance, > 0
 * @param atol absolute tolerance per component (SI unit of that component), > 0
 * @returns the norm (dimensionless; ≤ 1 means the step is accepted)
 * @example errorNorm(Float64Array.of(1e-6), Float64Array.of(1), Float64Array.of(1), 1e-6, Float64Array.of(0)) // 1
 * @source hairer1993 §II.4, eq. (4.11) (from memory)
 */
export function errorNorm(err: Float64Array, y0: Float64Array, y1: Float64Array, rtol: number, atol: Float64Array): number {
  const n = err.length;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const sc = atol[i]! + rtol * Math.max(Math.abs(y0[i]!), Math.abs(y1[i]!));
    const r = err[i]! / sc;
    sum += r * r;
  }
  return Math.sqrt(sum / n);
}
