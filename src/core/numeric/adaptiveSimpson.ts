import { ComputationError } from '../errors.ts';

/**
 * Adaptive Simpson quadrature with Richardson extrapolation.
 *
 * $$S(a,b) = \frac{b-a}{6}\left[f(a) + 4f\!\left(\tfrac{a+b}{2}\right) + f(b)\right],\qquad
 *   |S_{left}+S_{right}-S| \le 15\,\varepsilon \Rightarrow \text{accept } S_{left}+S_{right} + \frac{S_{left}+S_{right}-S}{15}$$
 *
 * Why adaptive: energy integrals such as ∫c·v² dt of an overdamped release have a transient
 * hundreds of times faster than the rest of the window; a uniform grid wastes work or loses digits.
 *
 * @param f integrand, finite on [a, b]
 * @param a lower limit
 * @param b upper limit
 * @param absTol absolute error target for the whole interval, > 0
 * @param maxDepth recursion limit (each level halves the panel), default 40
 * @param maxEvals evaluations of f allowed, default 2,000,000: when rounding noise in f exceeds the
 *   tolerance everywhere (an integrand of subnormal numbers), every panel would split to maxDepth,
 *   2^40 evaluations; past the budget the answer is refused instead of computed for hours
 * @returns the integral estimate
 * @throws ComputationError when the budget of evaluations is spent
 * @example adaptiveSimpson(Math.sin, 0, Math.PI, 1e-12) // 2
 * @source lyness1969 (the stopping rule and the /15 correction)
 */
export function adaptiveSimpson(f: (x: number) => number, a: number, b: number, absTol: number, maxDepth = 40, maxEvals = 2_000_000): number {
  const budget = { left: maxEvals - 3 };
  const fa = f(a);
  const fb = f(b);
  const m = 0.5 * (a + b);
  const fm = f(m);
  const whole = ((b - a) / 6) * (fa + 4 * fm + fb);
  return refine(f, a, b, fa, fm, fb, whole, absTol, maxDepth, budget);
}

function refine(f: (x: number) => number, a: number, b: number, fa: number, fm: number, fb: number, whole: number, tol: number, depth: number, budget: { left: number }): number {
  budget.left -= 2;
  if (budget.left < 0) throw new ComputationError(`quadrature did not reach its tolerance within its budget of evaluations on [${a.toPrecision(3)}, ${b.toPrecision(3)}] (the integrand is noise at this scale)`);
  const m = 0.5 * (a + b);
  const lm = 0.5 * (a + m);
  const rm = 0.5 * (m + b);
  const flm = f(lm);
  const frm = f(rm);
  const left = ((m - a) / 6) * (fa + 4 * flm + fm);
  const right = ((b - m) / 6) * (fm + 4 * frm + fb);
  const delta = left + right - whole;
  if (depth <= 0 || Math.abs(delta) <= 15 * tol) return left + right + delta / 15;
  return refine(f, a, m, fa, flm, fm, left, tol / 2, depth - 1, budget) + refine(f, m, b, fm, frm, fb, right, tol / 2, depth - 1, budget);
}
