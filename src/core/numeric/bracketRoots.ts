import { ComputationError } from '../errors.ts';
import { brentRoot } from './brent.ts';

/** One sign change of f found by scanning, refined by Brent's method. */
export interface Crossing {
  readonly x: number;
  /** +1 when f rises through zero, −1 when it falls. */
  readonly direction: 1 | -1;
}

/**
 * Every root of f on [a, b] that shows as a sign change on a uniform grid of `n` panels, each
 * refined by Brent's method. Roots closer together than (b − a)/n, or touching zeros without a
 * sign change, can be missed: choose n from the scale on which f can turn.
 *
 * @param f continuous and finite on [a, b]
 * @param a lower end, finite
 * @param b upper end, > a
 * @param n panels, integer ≥ 1 (default 200)
 * @returns the crossings in increasing x
 * @throws ComputationError when the interval is empty or f is not finite
 * @example bracketRoots(Math.sin, 1, 10).map((r) => r.x) // [3.14159, 6.28319, 9.42478] (π, 2π, 3π)
 * @source brent1973 ch. 4 (refinement; from memory)
 */
export function bracketRoots(f: (x: number) => number, a: number, b: number, n = 200, xTol = 1e-10): Crossing[] {
  if (!(Number.isFinite(a) && Number.isFinite(b) && b > a)) throw new ComputationError(`empty search interval [${a}, ${b}]`);
  const panels = Math.max(1, Math.floor(n));
  const out: Crossing[] = [];
  let x0 = a;
  let f0 = f(a);
  if (!Number.isFinite(f0)) throw new ComputationError(`function not finite at x = ${a}`);
  if (f0 === 0) out.push({ x: a, direction: 1 });
  for (let i = 1; i <= panels; i++) {
    const x1 = i === panels ? b : a + ((b - a) * i) / panels;
    const f1 = f(x1);
    if (!Number.isFinite(f1)) throw new ComputationError(`function not finite at x = ${x1}`);
    if (f1 === 0) out.push({ x: x1, direction: f0 < 0 ? 1 : -1 });
    else if (f0 !== 0 && Math.sign(f0) !== Math.sign(f1)) {
      out.push({ x: brentRoot(f, x0, x1, { xTol }), direction: f1 > 0 ? 1 : -1 });
    }
    x0 = x1;
    f0 = f1;
  }
  return out;
}
