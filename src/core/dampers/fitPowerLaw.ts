/**
 * Least-squares power law F = C·|v|^α from force–velocity points, least squares in the force
 * itself (not in log F, which weights the slow points as heavily as the fast ones and is biased
 * once the forces carry additive noise). The problem separates (variable projection): for a given
 * α the best C is a linear least-squares solution in closed form, so only α is searched, by a
 * grid scan that brackets the minimum and a golden-section search inside the bracket.
 */
import { ComputationError } from '../errors.ts';
import { goldenSection } from '../numeric/goldenSection.ts';

export interface PowerLawFit {
  /** coefficient, N·(s/m)^α */ readonly C: number;
  readonly alpha: number;
  /** sum of squared force residuals, N² */ readonly sse: number;
  /** true when the best exponent lies on an end of the allowed range */ readonly atLimit: boolean;
}

/** Best C for a fixed α and the sum of squared residuals it leaves. */
function project(a: readonly number[], y: readonly number[], alpha: number): { C: number; sse: number } {
  const g = a.map((ai) => Math.pow(ai, alpha));
  let sgg = 0;
  let sgy = 0;
  for (let i = 0; i < a.length; i++) {
    sgg += g[i]! * g[i]!;
    sgy += g[i]! * y[i]!;
  }
  const C = sgy / sgg;
  let sse = 0;
  for (let i = 0; i < a.length; i++) sse += (y[i]! - C * g[i]!) ** 2;
  return { C, sse };
}

const GRID = 48;

/**
 * Fits y = C·a^α (a > 0) by least squares in y.
 *
 * $$C(\alpha) = \frac{\sum a_i^\alpha y_i}{\sum a_i^{2\alpha}},\qquad
 *   \hat\alpha = \arg\min_{\alpha_{\min}\le\alpha\le\alpha_{\max}} \sum_i \bigl(y_i - C(\alpha)\,a_i^\alpha\bigr)^2$$
 *
 * @param a velocity magnitudes, m/s, each > 0, at least two distinct
 * @param y forces on the same side, N (positive for a passive damper)
 * @param alphaMin smallest exponent searched (default 0.05)
 * @param alphaMax largest exponent searched (default 2)
 * @throws ComputationError for fewer than three points, fewer than two distinct velocities, or
 *   a best coefficient C ≤ 0 (forces against the direction of motion)
 * @example fitPowerLaw([0.05, 0.2, 0.8], [8944.27190999916, 17888.54381999832, 35777.08763999664]) // { C: 40000, alpha: 0.5 }
 * @source golub1973 (separable least squares, variable projection); press2007 §10.2 golden section
 *   and §15.4 linear least squares (from memory); fema274 §9.3 (power-law viscous dampers, from memory)
 */
export function fitPowerLaw(a: readonly number[], y: readonly number[], alphaMin = 0.05, alphaMax = 2): PowerLawFit {
  if (a.length < 3) throw new ComputationError(`a power-law fit needs at least three points on a side (got ${a.length})`);
  if (new Set(a).size < 2) throw new ComputationError('a power-law fit needs at least two different velocities');
  const step = (alphaMax - alphaMin) / GRID;
  let best = 0;
  let bestSse = Infinity;
  for (let k = 0; k <= GRID; k++) {
    const { sse } = project(a, y, alphaMin + k * step);
    if (sse < bestSse) { bestSse = sse; best = k; }
  }
  const lo = alphaMin + Math.max(0, best - 1) * step;
  const hi = alphaMin + Math.min(GRID, best + 1) * step;
  const m = goldenSection((al) => project(a, y, al).sse, lo, hi, 1e-13);
  const alpha = m.f <= bestSse ? m.x : alphaMin + best * step;
  const { C, sse } = project(a, y, alpha);
  if (!(C > 0)) throw new ComputationError('the best power law has C ≤ 0: the forces do not resist the motion (check the signs of v and F)');
  const atLimit = alpha - alphaMin < 1e-6 || alphaMax - alpha < 1e-6;
  return { C, alpha, sse, atLimit };
}
