import { ComputationError } from '../errors.ts';

export interface LinearFit {
  readonly intercept: number;
  readonly slope: number;
  /** coefficient of determination of the (weighted) fit, 1 for a perfect line */
  readonly r2: number;
  /** standard error of the slope (weighted residuals, n − 2 degrees of freedom); 0 when n = 2 */
  readonly slopeStdError: number;
  readonly n: number;
}

/**
 * Weighted least-squares straight line y ≈ a + b·x.
 *
 * $$b = \frac{\sum w(x-\bar x)(y-\bar y)}{\sum w(x-\bar x)^2},\quad a = \bar y - b\bar x,\quad
 *   R^2 = 1-\frac{\sum w\,(y-a-bx)^2}{\sum w\,(y-\bar y)^2}$$
 * with weighted means $\bar x, \bar y$ (centred sums avoid cancellation).
 *
 * @param x abscissae (at least two distinct values)
 * @param y ordinates, same length
 * @param w non-negative weights (default all 1)
 * @throws ComputationError for fewer than two points or all x equal
 * @example linearFit([0, 1, 2], [1, 3, 5]).slope // 2
 * @source press2007 §15.2 (fitting data to a straight line)
 */
export function linearFit(x: readonly number[], y: readonly number[], w?: readonly number[]): LinearFit {
  const n = x.length;
  if (n < 2 || y.length !== n) throw new ComputationError(`a straight-line fit needs at least two points (got ${n})`);
  const wt = (i: number) => (w ? w[i]! : 1);
  let sw = 0, sx = 0, sy = 0;
  for (let i = 0; i < n; i++) { sw += wt(i); sx += wt(i) * x[i]!; sy += wt(i) * y[i]!; }
  const mx = sx / sw;
  const my = sy / sw;
  let sxx = 0, sxy = 0, syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i]! - mx;
    const dy = y[i]! - my;
    sxx += wt(i) * dx * dx; sxy += wt(i) * dx * dy; syy += wt(i) * dy * dy;
  }
  if (!(sxx > 0)) throw new ComputationError('a straight-line fit needs at least two distinct abscissae');
  const slope = sxy / sxx;
  const intercept = my - slope * mx;
  let sse = 0;
  for (let i = 0; i < n; i++) sse += wt(i) * (y[i]! - intercept - slope * x[i]!) ** 2;
  const r2 = syy > 0 ? 1 - sse / syy : 1;
  const slopeStdError = n > 2 ? Math.sqrt(sse / (n - 2) / sxx) : 0;
  return { intercept, slope, r2, slopeStdError, n };
}
