import { InputRangeError, requireInRange } from '../errors.ts';
import { DORMAND_PRINCE_54 } from './dormandPrince.ts';
import { rkStep, stepWork } from './rkStep.ts';
import type { OdeStats, OdeSystem } from './system.ts';
import type { EmbeddedTableau } from './tableau.ts';

/**
 * Integrates y' = f(t, y) over [t0, tEnd] in `steps` equal steps with the propagated
 * (higher-order) solution of an embedded pair and no error control. Used to measure the
 * convergence order of a tableau: the global error of a method of order p falls as h^p.
 *
 * $$h = \frac{t_{end} - t_0}{N},\qquad y_{n+1} = y_n + h\sum_i b_i k_i$$
 *
 * @param steps number of steps N, integer in [1, 1e7]
 * @returns the state at tEnd and the work counters
 * @example integrateFixed({ dim: 1, f: (t, y, d) => { d[0] = y[0]; } }, 0, [1], 1, 10).y[0] // 2.7182818 (e; error 6e-9 with 10 steps)
 * @source hairer1993 §II.3, order of a Runge–Kutta method (from memory)
 */
export function integrateFixed(
  sys: OdeSystem, t0: number, y0: ArrayLike<number>, tEnd: number, steps: number, tableau: EmbeddedTableau = DORMAND_PRINCE_54,
): { y: Float64Array; stats: OdeStats } {
  requireInRange('steps', steps, { min: 1, max: 1e7 });
  if (!Number.isInteger(steps)) throw new InputRangeError('steps', steps, { min: 1, max: 1e7 }, '', 'must be an integer');
  const w = stepWork(tableau, sys.dim);
  const y = Float64Array.from(y0);
  const h = (tEnd - t0) / steps;
  const stats: OdeStats = { accepted: 0, rejected: 0, evaluations: 0 };
  const s = tableau.c.length;
  sys.f(t0, y, w.k[0]!);
  stats.evaluations++;
  for (let i = 0; i < steps; i++) {
    const t = t0 + i * h;
    stats.evaluations += rkStep(tableau, sys, t, y, h, w);
    y.set(w.yNew);
    stats.accepted++;
    if (tableau.fsal) w.k[0]!.set(w.k[s - 1]!);
    else { sys.f(t + h, y, w.k[0]!); stats.evaluations++; }
  }
  return { y, stats };
}
