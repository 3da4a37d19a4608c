/**
 * Composite 8-point Gauss–Legendre quadrature of several integrands sharing their sample points.
 *
 * $$\int_a^b f\,dx \approx \sum_{p=1}^{P} \frac{h}{2} \sum_{i=1}^{8} w_i\, f\!\left(a + (p - \tfrac12)h + \tfrac{h}{2}\xi_i\right),\qquad h = \frac{b-a}{P}$$
 *
 * Exact for polynomials of degree 15 on each panel. Why fixed and not adaptive: for an integrand
 * that is a smooth exponential-times-trigonometric (a linear oscillator's response) on panels of at
 * most about one radian of phase and one e-fold of decay, the rule's error is below 1e-14 relative
 * with 8 evaluations per panel, where adaptive Simpson needed about 250 for 1e-13.
 *
 * @param f integrands at x, an array of fixed length n, finite on [a, b]
 * @param a lower limit; b upper limit
 * @param panels number of equal panels, an integer ≥ 1
 * @returns the n integral estimates
 * @example gaussLegendre((x) => [Math.sin(x), x ** 15], 0, Math.PI, 2) // [2, 5627013.8]
 * @source abramowitz1964 Table 25.4 (nodes and weights for n = 8)
 */
const NODES = [0.1834346424956498, 0.525532409916329, 0.7966664774136267, 0.9602898564975363] as const;
const WEIGHTS = [0.362683783378362, 0.3137066458778873, 0.2223810344533745, 0.1012285362903763] as const;

export function gaussLegendre(f: (x: number) => readonly number[], a: number, b: number, panels = 1): number[] {
  if (!(Number.isInteger(panels) && panels >= 1)) throw new RangeError(`gaussLegendre: panels must be an integer ≥ 1, got ${panels}`);
  const h = (b - a) / panels;
  let sums: number[] | undefined;
  for (let p = 0; p < panels; p++) {
    const mid = a + (p + 0.5) * h;
    for (let i = 0; i < 4; i++) {
      for (const sign of [-1, 1]) {
        const y = f(mid + sign * 0.5 * h * NODES[i]!);
        sums ??= y.map(() => 0);
        for (let j = 0; j < y.length; j++) sums[j]! += WEIGHTS[i]! * y[j]!;
      }
    }
  }
  return sums!.map((s) => 0.5 * h * s);
}
