import type { OdeSystem } from './system.ts';

function rmsScaled(v: Float64Array, y: Float64Array, rtol: number, atol: Float64Array): number {
  let s = 0;
  for (let i = 0; i < v.length; i++) {
    const r = v[i]! / (atol[i]! + rtol * Math.abs(y[i]!));
    s += r * r;
  }
  return Math.sqrt(s / v.length);
}

/**
 * The step over which an explicit Euler step changes y by about 1 % in the scaled norm,
 * 0.01‖y₀‖/‖f₀‖ (Infinity when f₀ = 0): the first guess of `initialStep`, and the cap on a step
 * carried over from an earlier run, so a run that starts where the right-hand side has just
 * jumped (a new power segment) does not try a step far past where the old one was working.
 */
export function eulerStepBound(y0: Float64Array, f0: Float64Array, rtol: number, atol: Float64Array): number {
  const d1 = rmsScaled(f0, y0, rtol, atol);
  return d1 > 0 ? (0.01 * rmsScaled(y0, y0, rtol, atol)) / d1 : Infinity;
}

/**
 * Starting step size from two evaluations: one explicit Euler step of size h₀ = 0.01‖y₀‖/‖f₀‖
 * estimates the second derivative, and the step is chosen so that the local error of a method
 * of order p would be about 0.01 in the scaled norm.
 *
 * $$h_1 = \left(\frac{0.01}{\max(\|f_0\|, \|f_1 - f_0\|/h_0)}\right)^{1/(p+1)},\qquad h = \min(100\,h_0, h_1)$$
 *
 * @param f0 f(t0, y0), already evaluated
 * @param order p of the propagated solution
 * @param hMax largest allowed step, s
 * @returns a positive step size, s
 * @example initialStep({ dim: 1, f: (t, y, d) => { d[0] = -y[0]; } }, 0, Float64Array.of(1), Float64Array.of(-1), 5, 1e-6, Float64Array.of(1e-9), Infinity) // 0.046 s (y' = −y, y0 = 1, rtol 1e-6, atol 1e-9)
 * @source hairer1993 §II.4, "Starting step size" algorithm (from memory)
 */
export function initialStep(
  sys: OdeSystem, t0: number, y0: Float64Array, f0: Float64Array, order: number, rtol: number, atol: Float64Array, hMax: number,
): number {
  const d0 = rmsScaled(y0, y0, rtol, atol);
  const d1 = rmsScaled(f0, y0, rtol, atol);
  let h0 = d0 < 1e-5 || d1 < 1e-5 ? 1e-6 : (0.01 * d0) / d1;
  h0 = Math.min(h0, hMax);
  const y1 = new Float64Array(y0.length);
  for (let i = 0; i < y0.length; i++) y1[i] = y0[i]! + h0 * f0[i]!;
  const f1 = new Float64Array(y0.length);
  sys.f(t0 + h0, y1, f1);
  for (let i = 0; i < y0.length; i++) f1[i] = f1[i]! - f0[i]!;
  const d2 = rmsScaled(f1, y0, rtol, atol) / h0;
  const big = Math.max(d1, d2);
  const h1 = big <= 1e-15 ? Math.max(1e-6, h0 * 1e-3) : Math.pow(0.01 / big, 1 / (order + 1));
  return Math.min(100 * h0, h1, hMax);
}
