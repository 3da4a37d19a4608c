/**
 * All roots of a real polynomial of low degree by the Aberth–Ehrlich simultaneous iteration, started
 * on circles from the Newton polygon, each root with an a-posteriori error estimate.
 */
import { ComputationError } from '../errors.ts';
import type { Complex } from '../complex/index.ts';

export interface PolynomialRoot {
  readonly z: Complex;
  /** Estimated absolute error of z: n·|p(z)/p′(z)| (at least rounding). */
  readonly error: number;
}

/** p(z) and p′(z) by Horner's rule; coefficients ascending (c[0] + c[1] z + …). */
function horner(c: readonly number[], zr: number, zi: number): [number, number, number, number] {
  let pr = c[c.length - 1]!; let pi = 0; let dr = 0; let di = 0;
  for (let i = c.length - 2; i >= 0; i--) {
    const tr = dr * zr - di * zi + pr; di = dr * zi + di * zr + pi; dr = tr;
    const ur = pr * zr - pi * zi + c[i]!; pi = pr * zi + pi * zr; pr = ur;
  }
  return [pr, pi, dr, di];
}

/**
 * Starting points: one circle per edge of the upper convex hull of (i, ln|c_i|), radius
 * (|c_i|/|c_j|)^{1/(j−i)} with j − i points on it, so roots of very different size (a quarter car's
 * wheel and body modes, a relaxation pole at k_s/c) each get a start of about the right modulus.
 */
function starts(c: readonly number[]): [number, number][] {
  const n = c.length - 1;
  const pts = c.map((x, i) => [i, x === 0 ? -Infinity : Math.log(Math.abs(x))] as const).filter((p) => p[1] > -Infinity);
  const hull: (readonly [number, number])[] = [];
  for (const p of pts) {
    while (hull.length >= 2) {
      const a = hull[hull.length - 2]!; const b = hull[hull.length - 1]!;
      if ((b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0]) >= 0) hull.pop(); else break;
    }
    hull.push(p);
  }
  const out: [number, number][] = [];
  for (let h = 0; h + 1 < hull.length; h++) {
    const [i, li] = hull[h]!; const [j, lj] = hull[h + 1]!;
    const r = Math.exp((li - lj) / (j - i));
    // an angle offset keeps starts off the real axis, where real coefficients would pin them
    for (let k = 0; k < j - i; k++) { const t = (2 * Math.PI * k) / (j - i) + (2 * Math.PI * h) / n + 0.4; out.push([r * Math.cos(t), r * Math.sin(t)]); }
  }
  return out;
}

/**
 * Roots of $p(z) = \sum_{i=0}^{n} c_i z^i$ by the Aberth–Ehrlich step
 * $$z_k \leftarrow z_k - \frac{w_k}{1 - w_k \sum_{j\ne k} (z_k - z_j)^{-1}},\qquad w_k = \frac{p(z_k)}{p'(z_k)},$$
 * to convergence (cubic for simple roots; the repulsion term keeps two iterates from settling on one
 * root, which plain Newton polishing cannot promise); the error estimate is n·|p/p′| at the result, at
 * least 4ε|z|. Near-multiple roots converge slowly and carry a
 * larger estimate; the caller decides whether that is good enough.
 *
 * @param c real coefficients, ascending, finite, c[n] ≠ 0, c[0] ≠ 0 (divide out roots at 0 first); degree 1–16
 * @throws ComputationError when the coefficients are not finite, the degree is out of range or the iteration does not settle
 * @example polynomialRoots([2, -3, 1]).map((r) => r.z.re).sort() // [1, 2]
 * @source aberth1973 (the simultaneous iteration); bini1996 (Newton-polygon starting circles, from memory)
 */
export function polynomialRoots(c: readonly number[]): PolynomialRoot[] {
  const n = c.length - 1;
  if (n < 1 || n > 16 || !c.every(Number.isFinite) || c[n] === 0 || c[0] === 0) throw new ComputationError('polynomial roots: need finite coefficients, degree 1–16, non-zero first and last');
  const z = starts(c);
  const done = new Array<boolean>(n).fill(false);
  const last = new Array<number>(n).fill(Infinity);
  for (let it = 0; it < 200 && done.includes(false); it++) {
    for (let k = 0; k < n; k++) {
      if (done[k]) continue;
      const [zr, zi] = z[k]!;
      const [pr, pi, dr, di] = horner(c, zr, zi);
      const dd = dr * dr + di * di;
      if (pr === 0 && pi === 0) { done[k] = true; continue; }
      if (dd === 0) { z[k] = [zr * 1.1 + 1e-3, zi + 1e-3]; continue; }
      const wr = (pr * dr + pi * di) / dd; const wi = (pi * dr - pr * di) / dd;
      let sr = 0; let si = 0;
      for (let j = 0; j < n; j++) {
        if (j === k) continue;
        const ar = zr - z[j]![0]; const ai = zi - z[j]![1]; const m = ar * ar + ai * ai;
        if (m > 0) { sr += ar / m; si -= ai / m; }
      }
      // step = w / (1 − w·s)
      const br = 1 - (wr * sr - wi * si); const bi = -(wr * si + wi * sr); const bm = br * br + bi * bi;
      const xr = bm > 0 ? (wr * br + wi * bi) / bm : wr; const xi = bm > 0 ? (wi * br - wr * bi) / bm : wi;
      z[k] = [zr - xr, zi - xi];
      // settled: at rounding level, or no longer shrinking once small (rounding noise in p(z) near a cluster)
      const step = Math.hypot(xr, xi); const size = Math.hypot(zr, zi);
      if (step <= 4 * Number.EPSILON * size || (step <= 1e-8 * size && step >= 0.5 * last[k]!)) done[k] = true;
      last[k] = step;
    }
  }
  if (!z.every(([a, b]) => Number.isFinite(a) && Number.isFinite(b))) throw new ComputationError('polynomial roots: the iteration did not settle');
  // error estimate a posteriori: a root of multiplicity m sits about m·|p/p′| from the iterate, so n·|p/p′|
  // bounds it for any cluster; no Newton step is applied here, as one could jump onto a close neighbour
  return z.map(([zr, zi]) => {
    const [pr, pi, dr, di] = horner(c, zr, zi);
    const w = Math.hypot(pr, pi) / Math.hypot(dr, di);
    return { z: { re: zr, im: zi }, error: Math.max(Number.isFinite(w) ? n * w : Infinity, 4 * Number.EPSILON * Math.hypot(zr, zi)) };
  });
}
