/**
 * Largest and smallest of a list of numbers, by a loop. `Math.max(...xs)` passes every element
 * as a call argument and overflows the stack at roughly 10⁵ elements (a 420 000-row record did);
 * these helpers have no size limit. An empty list gives the identity of the reduction
 * (−Infinity for a maximum, +Infinity for a minimum), as `Math.max()` and `Math.min()` do.
 */

/**
 * The largest value of `xs` (−Infinity for an empty list; NaN if any element is NaN, like Math.max).
 * @example maxOf([3, -7, 5]) // 5
 */
export function maxOf(xs: ArrayLike<number>): number {
  let m = -Infinity;
  for (let i = 0; i < xs.length; i++) {
    const x = xs[i]!;
    // +0 above −0, as Math.max orders them
    if (x > m || Number.isNaN(x) || (x === 0 && Object.is(m, -0))) m = x;
    if (Number.isNaN(m)) return NaN;
  }
  return m;
}

/**
 * The smallest value of `xs` (+Infinity for an empty list; NaN if any element is NaN, like Math.min).
 * @example minOf([3, -7, 5]) // -7
 */
export function minOf(xs: ArrayLike<number>): number {
  let m = Infinity;
  for (let i = 0; i < xs.length; i++) {
    const x = xs[i]!;
    if (x < m || Number.isNaN(x) || (Object.is(x, -0) && m === 0)) m = x;
    if (Number.isNaN(m)) return NaN;
  }
  return m;
}

/**
 * The largest magnitude |x| of `xs` (0 for an empty list: a magnitude is never negative).
 * @example maxAbsOf([3, -7, 5]) // 7
 */
export function maxAbsOf(xs: ArrayLike<number>): number {
  let m = 0;
  for (let i = 0; i < xs.length; i++) {
    const a = Math.abs(xs[i]!);
    if (a > m || Number.isNaN(a)) m = a;
    if (Number.isNaN(m)) return NaN;
  }
  return m;
}
