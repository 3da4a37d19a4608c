import { ComputationError } from '../errors.ts';

/** Options of the bracketing root finder. */
export interface BrentOptions {
  /** Absolute tolerance on x (default 1e-12·max(1, |x|) is added on top). */
  readonly xTol?: number;
  /** Largest number of function evaluations (default 200). */
  readonly maxEval?: number;
}

/**
 * Root of a continuous function on a sign-changing bracket by Brent's method: inverse quadratic
 * interpolation or the secant step when it stays inside the bracket and shrinks it fast enough,
 * bisection otherwise. Never leaves the bracket, so it converges whenever f changes sign.
 *
 * $$x_{new} = \frac{a f_b f_c}{(f_a-f_b)(f_a-f_c)} + \frac{b f_a f_c}{(f_b-f_a)(f_b-f_c)} + \frac{c f_a f_b}{(f_c-f_a)(f_c-f_b)}$$
 * with the bisection safeguard $|x_{new}-b| < \tfrac12|m|$ (m half the bracket).
 *
 * @param f continuous on [a, b], finite everywhere there
 * @param a one end of the bracket
 * @param b other end; f(a)·f(b) ≤ 0
 * @returns x with |x − x*| ≤ 2·(1e-15·|x| + xTol/2), x* a root in [a, b]
 * @throws ComputationError when f(a) and f(b) have the same sign, f is not finite, or maxEval is hit
 * @example brentRoot((x) => x * x - 2, 0, 2) // 1.414214 (√2, to the default tolerance)
 * @source brent1973 ch. 4 (algorithm zero; from memory)
 */
export function brentRoot(f: (x: number) => number, a: number, b: number, opts: BrentOptions = {}): number {
  const xTol = opts.xTol ?? 1e-12;
  const maxEval = opts.maxEval ?? 200;
  let fa = f(a);
  let fb = f(b);
  check(fa, a);
  check(fb, b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (Math.sign(fa) === Math.sign(fb)) {
    throw new ComputationError(`no sign change on [${a}, ${b}]: f = ${fa.toPrecision(4)}, ${fb.toPrecision(4)}`);
  }
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let n = 0; n < maxEval; n++) {
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a; fc = fa; d = b - a; e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b; b = c; c = a;
      fa = fb; fb = fc; fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * xTol;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      let p: number;
      let q: number;
      const s = fb / fa;
      if (a === c) {
        p = 2 * m * s; // secant
        q = 1 - s;
      } else {
        const qq = fa / fc; // inverse quadratic interpolation
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m; e = m;
      }
    } else {
      d = m; e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
    check(fb, b);
  }
  throw new ComputationError(`root not found within ${maxEval} evaluations`);
}

function check(v: number, x: number): void {
  if (!Number.isFinite(v)) throw new ComputationError(`function not finite at x = ${x}`);
}
