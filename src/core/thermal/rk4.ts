import { ComputationError, POSITIVE, requireInRange } from '../errors.ts';

/**
 * Classical fourth-order Runge–Kutta for a scalar ODE y′ = f(t, y), fixed step, with an optional
 * stop when y rises through a level (located by cubic Hermite interpolation inside the step).
 * Scalar and self-contained on purpose: the lumped thermal models need nothing more, and it keeps
 * this domain free of the shared integrators.
 *
 * $$y_{n+1} = y_n + \tfrac{h}{6}(k_1 + 2k_2 + 2k_3 + k_4)$$
 *
 * @param f right-hand side, finite
 * @param y0 start value at t = 0
 * @param tEnd end time, (0, ∞)
 * @param steps number of steps, integer ≥ 1 (global error ∝ steps⁻⁴)
 * @param stopAbove optional level: integration stops at the first t where y reaches it
 * @returns samples t[], y[] (steps + 1 points, fewer when stopped) and the crossing time if any
 * @throws ComputationError when f returns a non-finite value
 * @example rk4((t, y) => -y, 1, 1, 100).y.at(-1) // 0.3678794412 (e⁻¹ to 3e-11 with 100 steps)
 * @source hairer1993 §II.1 (table of the classical method; from memory)
 */
export function rk4(f: (t: number, y: number) => number, y0: number, tEnd: number, steps: number, stopAbove?: number) {
  requireInRange('tEnd', tEnd, POSITIVE, 's');
  const n = Math.max(1, Math.floor(steps));
  const h = tEnd / n;
  const t: number[] = [0];
  const y: number[] = [y0];
  let tc = 0;
  let yc = y0;
  let fc = call(f, tc, yc);
  for (let i = 0; i < n; i++) {
    const k1 = fc;
    const k2 = call(f, tc + h / 2, yc + (h / 2) * k1);
    const k3 = call(f, tc + h / 2, yc + (h / 2) * k2);
    const k4 = call(f, tc + h, yc + h * k3);
    const yn = yc + (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
    const tn = tc + h;
    const fn = call(f, tn, yn);
    if (stopAbove !== undefined && yc < stopAbove && yn >= stopAbove) {
      const tx = crossing(tc, yc, fc, h, yn, fn, stopAbove);
      t.push(tx);
      y.push(stopAbove);
      return { t, y, tCross: tx };
    }
    tc = tn; yc = yn; fc = fn;
    t.push(tc);
    y.push(yc);
  }
  return { t, y, tCross: undefined as number | undefined };
}

function call(f: (t: number, y: number) => number, t: number, y: number): number {
  const v = f(t, y);
  if (!Number.isFinite(v)) throw new ComputationError(`ODE right-hand side not finite at t = ${t}, y = ${y}`);
  return v;
}

/** Time inside [t0, t0+h] where the cubic Hermite interpolant reaches `level` (bisection, 60 halvings). */
function crossing(t0: number, y0: number, f0: number, h: number, y1: number, f1: number, level: number): number {
  const H = (s: number) => {
    const s2 = s * s, s3 = s2 * s;
    return (2 * s3 - 3 * s2 + 1) * y0 + (s3 - 2 * s2 + s) * h * f0 + (-2 * s3 + 3 * s2) * y1 + (s3 - s2) * h * f1;
  };
  let a = 0, b = 1;
  for (let i = 0; i < 60; i++) {
    const m = 0.5 * (a + b);
    if (H(m) >= level) b = m; else a = m;
  }
  return t0 + 0.5 * (a + b) * h;
}
