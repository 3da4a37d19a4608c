import { InputRangeError, POSITIVE, requireInRange } from '../errors.ts';

/**
 * Logarithmic decrement per cycle from two peaks of a free decay, n cycles apart.
 *
 * $$\delta = \frac{1}{n}\ln\frac{x_1}{x_{1+n}}$$
 *
 * @param x1 first peak amplitude, > 0 (any unit: only the ratio matters)
 * @param xn peak n cycles later, in the same unit, 0 < xn < x1
 * @param n whole number of cycles between the peaks, integer ≥ 1
 * @returns δ per cycle, dimensionless
 * @throws InputRangeError naming 'xn' when the later peak is not smaller (no decay), naming 'n'
 *   when n is not a whole number ≥ 1
 * @example logDecrementFromPeaks(1, 1 / 16, 1) // 2.772589 (ln 16)
 * @source rao2017 §2.6, logarithmic decrement (section from memory)
 */
export function logDecrementFromPeaks(x1: number, xn: number, n: number): number {
  requireInRange('x1', x1, POSITIVE);
  requireInRange('xn', xn, POSITIVE);
  requireInRange('n', n, { min: 1, max: 1e6 });
  if (!Number.isInteger(n)) throw new InputRangeError('n', n, { min: 1, max: 1e6 }, '', 'a whole number of cycles');
  if (xn >= x1) throw new InputRangeError('xn', xn, { min: 0, max: x1, minExclusive: true, maxExclusive: true }, '', 'the later peak must be smaller than x1 for a decaying record');
  return Math.log(x1 / xn) / n;
}
