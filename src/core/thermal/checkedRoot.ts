import { ComputationError } from '../errors.ts';
import { brentRoot } from '../numeric/brent.ts';

/** Largest remaining imbalance of a reported equilibrium, relative to the scale of the balance. */
export const BALANCE_RTOL = 1e-7;

/**
 * Root of a heat balance on a sign-changing bracket (Brent's method to `xTol`), checked: the
 * remaining imbalance must be below BALANCE_RTOL of the balance's scale, otherwise the bracket
 * holds a jump of f (a discontinuous correlation), not a root, and no temperature is reported.
 *
 * $$|f(x^{*})| \le 10^{-7}\,s,\qquad s = \max(|f(a)|, |f(b)|)\ \text{unless given}$$
 *
 * @param f the balance, finite on [a, b], f(a)·f(b) ≤ 0
 * @param a lower end; @param b upper end
 * @param what name of the balance for the message; @param unit unit of f
 * @param opts scale s of f (same unit), xTol on x (default 1e-9)
 * @returns x and the residual f(x)
 * @throws ComputationError naming the balance when the residual is too large (a jump) or there is no sign change
 * @example checkedRoot((x) => x * x - 2, 0, 2, 'x²', '').x // 1.41421356…
 * @source brent1973 ch. 4 (from memory); residual test: common practice, no source
 */
export function checkedRoot(f: (x: number) => number, a: number, b: number, what: string, unit: string, opts: { scale?: number; xTol?: number } = {}): { x: number; residual: number } {
  const x = brentRoot(f, a, b, { xTol: opts.xTol ?? 1e-9 });
  const residual = f(x);
  requireBalanced(residual, opts.scale ?? Math.max(Math.abs(f(a)), Math.abs(f(b))), x, what, unit);
  return { x, residual };
}

/**
 * Refuses a reported root whose remaining imbalance exceeds BALANCE_RTOL of the balance's scale.
 * @throws ComputationError naming the balance, the point and the imbalance
 */
export function requireBalanced(residual: number, scale: number, x: number, what: string, unit: string): void {
  if (!(Math.abs(residual) <= BALANCE_RTOL * scale)) {
    throw new ComputationError(`${what}: the bracket holds a jump, not a root — at ${x.toPrecision(8)} the balance is still off by ${residual.toPrecision(3)}${unit ? ' ' + unit : ''} (a discontinuous correlation)`);
  }
}
