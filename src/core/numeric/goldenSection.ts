/**
 * Golden-section search for the minimum of a function of one variable on [a, b]. Chosen over
 * Brent's parabolic step because the objectives here (sum of squared residuals against an
 * exponent or a knee velocity) are smooth but not always parabolic, and the search is cheap.
 */

export interface GoldenMinimum {
  readonly x: number;
  readonly f: number;
  readonly iterations: number;
}

const R = (Math.sqrt(5) - 1) / 2; // 0.618…, the golden ratio's reciprocal

/**
 * Minimises f on [a, b], assuming one minimum there (the caller brackets it by a grid scan).
 *
 * The bracket shrinks by $(\sqrt5-1)/2$ per step until $b-a \le \mathrm{tol}\cdot(1+|x|)$.
 *
 * @param f objective
 * @param a lower end
 * @param b upper end (b > a)
 * @param tol relative width at which to stop (default 1e-12; below about 1e-15 it cannot shrink)
 * @example goldenSection((x) => (x - 2) ** 2, 0, 5).x // 2.000000
 * @source press2007 §10.2 golden section search in one dimension (from memory)
 */
export function goldenSection(f: (x: number) => number, a: number, b: number, tol = 1e-12): GoldenMinimum {
  let lo = a;
  let hi = b;
  let x1 = hi - R * (hi - lo);
  let x2 = lo + R * (hi - lo);
  let f1 = f(x1);
  let f2 = f(x2);
  let iterations = 0;
  while (hi - lo > tol * (1 + Math.abs(x1)) && iterations < 200) {
    iterations++;
    if (f1 <= f2) {
      hi = x2; x2 = x1; f2 = f1;
      x1 = hi - R * (hi - lo); f1 = f(x1);
    } else {
      lo = x1; x1 = x2; f1 = f2;
      x2 = lo + R * (hi - lo); f2 = f(x2);
    }
  }
  return f1 <= f2 ? { x: x1, f: f1, iterations } : { x: x2, f: f2, iterations };
}
