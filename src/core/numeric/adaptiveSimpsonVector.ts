/**
 * Adaptive Simpson quadrature of several integrands that share their sample points (one call of
 * `f` gives every component), so integrals of the same expensive transfer function cost one
 * evaluation per point instead of one per integral.
 */

/**
 * Each component follows the scalar rule of adaptiveSimpson with its own absolute tolerance; a
 * panel is split until every component meets its own (so each is at least as refined as alone).
 *
 * $$|S^{(i)}_{left}+S^{(i)}_{right}-S^{(i)}| \le 15\,\varepsilon_i\ \forall i \Rightarrow \text{accept } S_{left}+S_{right} + \frac{S_{left}+S_{right}-S}{15}$$
 *
 * @param f integrands at x, an array of fixed length n, finite on [a, b]
 * @param a lower limit; b upper limit
 * @param absTol absolute error target of each component for the whole interval, each > 0
 * @param maxDepth recursion limit (each level halves the panel), default 40
 * @returns the n integral estimates
 * @example adaptiveSimpsonVector((x) => [Math.sin(x), x * x], 0, Math.PI, [1e-12, 1e-12]) // [2, 10.335426]
 * @source lyness1969 (the stopping rule and the /15 correction, applied per component)
 */
export function adaptiveSimpsonVector(f: (x: number) => readonly number[], a: number, b: number, absTol: readonly number[], maxDepth = 40): number[] {
  const fa = f(a);
  const fb = f(b);
  const fm = f(0.5 * (a + b));
  const whole = fa.map((_, i) => ((b - a) / 6) * (fa[i]! + 4 * fm[i]! + fb[i]!));
  const out = new Array<number>(fa.length).fill(0);
  refine(f, a, b, fa, fm, fb, whole, absTol, maxDepth, out);
  return out;
}

function refine(f: (x: number) => readonly number[], a: number, b: number, fa: readonly number[], fm: readonly number[], fb: readonly number[], whole: readonly number[], tol: readonly number[], depth: number, out: number[]): void {
  const m = 0.5 * (a + b);
  const flm = f(0.5 * (a + m));
  const frm = f(0.5 * (m + b));
  const n = fa.length;
  const left = new Array<number>(n);
  const right = new Array<number>(n);
  let ok = depth <= 0;
  let all = true;
  for (let i = 0; i < n; i++) {
    left[i] = ((m - a) / 6) * (fa[i]! + 4 * flm[i]! + fm[i]!);
    right[i] = ((b - m) / 6) * (fm[i]! + 4 * frm[i]! + fb[i]!);
    if (Math.abs(left[i]! + right[i]! - whole[i]!) > 15 * tol[i]!) all = false;
  }
  ok ||= all;
  if (ok) {
    for (let i = 0; i < n; i++) {
      const delta = left[i]! + right[i]! - whole[i]!;
      out[i] = out[i]! + left[i]! + right[i]! + delta / 15;
    }
    return;
  }
  const half = tol.map((t) => t / 2);
  refine(f, a, m, fa, flm, fm, left, half, depth - 1, out);
  refine(f, m, b, fm, frm, fb, right, half, depth - 1, out);
}
