import type { EmbeddedTableau } from './tableau.ts';
import type { OdeSystem } from './system.ts';

/** Scratch space for one embedded step: the stage derivatives, work vectors and the tableau packed flat. */
export interface StepWork {
  readonly k: Float64Array[];
  readonly yStage: Float64Array;
  /** Proposed solution at t + h. */
  readonly yNew: Float64Array;
  /** Local error estimate h·Σ(b_i − b̂_i)k_i. */
  readonly err: Float64Array;
  /** a_ij row by row (row i at offset i(i−1)/2), b_i and b_i − b̂_i as typed arrays (fast inner loops). */
  readonly aFlat: Float64Array;
  readonly b: Float64Array;
  readonly e: Float64Array;
}

/** The tableau packed once per tableau (read only): a run of many short segments packs it once, not per segment. */
const packed = new WeakMap<EmbeddedTableau, Pick<StepWork, 'aFlat' | 'b' | 'e'>>();

export function stepWork(tableau: EmbeddedTableau, dim: number): StepWork {
  let p = packed.get(tableau);
  if (!p) {
    p = {
      aFlat: Float64Array.from(tableau.a.flat()),
      b: Float64Array.from(tableau.b),
      e: Float64Array.from(tableau.b.map((bi, i) => bi - tableau.bHat[i]!)),
    };
    packed.set(tableau, p);
  }
  const k: Float64Array[] = [];
  for (let i = 0; i < tableau.c.length; i++) k.push(new Float64Array(dim));
  return { k, yStage: new Float64Array(dim), yNew: new Float64Array(dim), err: new Float64Array(dim), ...p };
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
 * @example ((w) => { w.k[0][0] = 1; rkStep(DORMAND_PRINCE_54, { dim: 1, f: (t, y, d) => { d[0] = y[0]; } }, 0, Float64Array.of(1), 0.1, w); return w.yNew[0]; })(stepWork(DORMAND_PRINCE_54, 1)) // 1.1051709183 (one step of y' = y, h = 0.1; e^{0.1} = 1.1051709181)
 * @source hairer1993 §II.1, eq. (1.8) (from memory)
 */
export function rkStep(tab: EmbeddedTableau, sys: OdeSystem, t: number, y: Float64Array, h: number, w: StepWork): number {
  const n = sys.dim;
  const s = tab.c.length;
  const { k, yStage, aFlat, b, e } = w;
  let off = 0;
  for (let i = 1; i < s; i++) {
    for (let d = 0; d < n; d++) {
      let acc = 0;
      for (let j = 0; j < i; j++) acc += aFlat[off + j]! * k[j]![d]!;
      yStage[d] = y[d]! + h * acc;
    }
    off += i;
    sys.f(t + tab.c[i]! * h, yStage, k[i]!);
  }
  for (let d = 0; d < n; d++) {
    let acc = 0;
    let err = 0;
    for (let i = 0; i < s; i++) {
      const kd = k[i]![d]!;
      acc += b[i]! * kd;
      err += e[i]! * kd;
    }
    w.yNew[d] = y[d]! + h * acc;
    w.err[d] = h * err;
  }
  // For an FSAL tableau the last stage point equals yNew, so k[s−1] is already f(t+h, yNew).
  return s - 1;
}
