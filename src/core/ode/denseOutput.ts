import type { EmbeddedTableau } from './tableau.ts';

/**
 * Continuous extension of a Dormand–Prince step: the state anywhere inside an accepted step
 * [t, t + h] from the step's own stages, fourth-order accurate, without new evaluations.
 *
 * $$y(t+\theta h) = r_1 + \theta\Big(r_2 + (1-\theta)\big(r_3 + \theta\,(r_4 + (1-\theta)\,r_5)\big)\Big)$$
 * with $r_1 = y_0$, $r_2 = y_1 - y_0$, $r_3 = h k_1 - r_2$, $r_4 = r_2 - h k_7 - r_3$,
 * $r_5 = h\sum_i d_i k_i$.
 *
 * @param tab a tableau with `dense` coefficients and FSAL (k_7 = f(t+h, y_1))
 * @param y0 state at the start of the step
 * @param y1 state at the end of the step
 * @param k stage derivatives of the step
 * @param h step size, s
 * @param theta position in the step, [0, 1]
 * @param out receives the interpolated state
 * Checked: at θ = 0 it returns y0 and at θ = 1 it returns y1 exactly (test/core/ode); the
 *   integrators' examples exercise it end to end.
 * @source hairer1993 §II.6, dense output of DOPRI5 (from memory)
 */
export function denseOutput(
  tab: EmbeddedTableau, y0: Float64Array, y1: Float64Array, k: readonly Float64Array[], h: number, theta: number, out: Float64Array,
): void {
  const r = new Float64Array(5 * y0.length);
  denseCoefficients(tab, y0, y1, k, h, r);
  evalDense(r, theta, out);
}

/** The five coefficient vectors r₁…r₅ of one step, packed [r1 | r2 | r3 | r4 | r5] (length 5n). */
export function denseCoefficients(
  tab: EmbeddedTableau, y0: Float64Array, y1: Float64Array, k: readonly Float64Array[], h: number, r: Float64Array,
): void {
  const d = tab.dense;
  if (!d) throw new Error(`${tab.name} has no dense output`);
  const n = y0.length;
  const s = k.length;
  for (let i = 0; i < n; i++) {
    const r2 = y1[i]! - y0[i]!;
    const r3 = h * k[0]![i]! - r2;
    let acc = 0;
    for (let j = 0; j < s; j++) acc += d[j]! * k[j]![i]!;
    r[i] = y0[i]!;
    r[n + i] = r2;
    r[2 * n + i] = r3;
    r[3 * n + i] = r2 - h * k[s - 1]![i]! - r3;
    r[4 * n + i] = h * acc;
  }
}

/** Evaluates the dense-output polynomial from packed coefficients at θ ∈ [0, 1]. */
export function evalDense(r: Float64Array, theta: number, out: Float64Array): void {
  const n = out.length;
  const th1 = 1 - theta;
  for (let i = 0; i < n; i++) {
    out[i] = r[i]! + theta * (r[n + i]! + th1 * (r[2 * n + i]! + theta * (r[3 * n + i]! + th1 * r[4 * n + i]!)));
  }
}
