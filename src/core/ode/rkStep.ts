import type { EmbeddedTableau } from './tableau.ts';
import type { OdeSystem } from './system.ts';

/** Scratch space for one embedded step: the stage derivatives and two work vectors. */
export interface StepWork {
  readonly k: Float64Array[];
  readonly yStage: Float64Array;
  /** Proposed solution at t + h. */
  readonly yNew: Float64Array;
  /** Local error estimate h·Σ(b_i − b̂_i)k_i. */
  readonly err: Float64Array;
}

export function stepWork(tableau: EmbeddedTableau, dim: number): StepWork {
  return {
    k: tableau.c.map(() => new Float64Array(dim)),
    yStage: new Float64Array(dim),
    yNew: new Float64Array(dim),
    err: new Float64Array(dim),
  };
}

/**
 * One explicit embedded Runge–Kutta step from (t, y) with step h. On entry `w.k[0]` must hold
 * f(t, y) (the FSAL derivative or a fresh evaluation). On return `w.yNew` holds the propagated
 * solution, `w.err` the embedded error estimate and, for FSAL tableaux, `w.k[s−1]` = f(t+h, yNew).
 *
 * $$k_i = f\Big(t + c_i h,\; y + h\sum_{j<i} a_{ij} k_j\Big),\quad
 *   y_{new} = y + h\sum_i b_i k_i,\quad \mathrm{err} = h\sum_i (b_i - \hat b_i) k_i$$
 *
 * @returns the number of right-hand-side evaluations made (s − 1)
 * @source hairer1993 §II.1, eq. (1.8) (from memory)
 */
export function rkStep(tab: EmbeddedTableau, sys: OdeSystem, t: number, y: Float64Array, h: number, w: StepWork): number {
  const n = sys.dim;
  const s = tab.c.length;
  for (let i = 1; i < s; i++) {
    const row = tab.a[i]!;
    for (let d = 0; d < n; d++) {
      let acc = 0;
      for (let j = 0; j < i; j++) acc += row[j]! * w.k[j]![d]!;
      w.yStage[d] = y[d]! + h * acc;
    }
    sys.f(t + tab.c[i]! * h, w.yStage, w.k[i]!);
  }
  for (let d = 0; d < n; d++) {
    let acc = 0;
    let e = 0;
    for (let i = 0; i < s; i++) {
      const kd = w.k[i]![d]!;
      acc += tab.b[i]! * kd;
      e += (tab.b[i]! - tab.bHat[i]!) * kd;
    }
    w.yNew[d] = y[d]! + h * acc;
    w.err[d] = h * e;
  }
  // For an FSAL tableau the last stage point equals yNew, so k[s−1] is already f(t+h, yNew).
  return s - 1;
}
