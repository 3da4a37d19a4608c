/**
 * Double-double numbers (an unevaluated sum hi + lo, about 32 significant digits) and one use of
 * them: Newton refinement of a polynomial root. The real part of a lightly damped pole is a tiny
 * fraction of its modulus; a root found in double precision has it only to ε·|s|, which is all the
 * accuracy there is when ζ ≈ ε. Refined in double-double, both parts come out to rounding.
 */

/** hi + lo with |lo| ≤ ulp(hi)/2. */
export type DD = readonly [number, number];

const SPLIT = 134217729; // 2^27 + 1

/** a + b exactly as a double-double (Knuth's TwoSum). */
function twoSum(a: number, b: number): DD {
  const s = a + b;
  const v = s - a;
  return [s, (a - (s - v)) + (b - v)];
}

/**
 * a·b exactly as a double-double (Dekker's product by splitting each factor into 26-bit halves).
 * @example ddProduct(134217729, 134217729)[1] // 1 (the low part the double product drops)
 * @source dekker1971 (mul12; from memory)
 */
export function ddProduct(a: number, b: number): DD {
  const p = a * b;
  const ca = SPLIT * a; const ah = ca - (ca - a); const al = a - ah;
  const cb = SPLIT * b; const bh = cb - (cb - b); const bl = b - bh;
  return [p, ((ah * bh - p) + ah * bl + al * bh) + al * bl];
}

/**
 * Sum of double-doubles, to about 2^−104 relative.
 * @example ddAdd([1, 1e-20], [-1, 0])[0] // 1e-20
 * @source dekker1971 (add2; from memory)
 */
export function ddAdd(a: DD, b: DD): DD {
  const [s, e] = twoSum(a[0], b[0]);
  const [h, l] = twoSum(s, e + a[1] + b[1]);
  return [h, l];
}

/**
 * Product of double-doubles (the lo·lo term is below the precision kept).
 * @example ddMul([1, 1e-17], [1, 1e-17]) // [1, 2e-17]
 * @source dekker1971 (mul2; from memory)
 */
export function ddMul(a: DD, b: DD): DD {
  const [p, e] = ddProduct(a[0], b[0]);
  return twoSum(p, e + a[0] * b[1] + a[1] * b[0]);
}

const neg = (a: DD): DD => [-a[0], -a[1]];
const cmul = (ar: DD, ai: DD, br: DD, bi: DD): [DD, DD] => [ddAdd(ddMul(ar, br), neg(ddMul(ai, bi))), ddAdd(ddMul(ar, bi), ddMul(ai, br))];

/**
 * Newton steps $z \leftarrow z - p(z)/p'(z)$ with p and p′ evaluated by Horner's rule in double-double
 * complex arithmetic; the correction itself is formed in double (it is small). Returns the root and
 * the estimated error of each part: the last correction plus the rounding of the double result.
 *
 * @param c coefficients, ascending, as double-doubles (ddProduct, ddAdd); z a root to about double precision
 * @param steps Newton steps, default 2 (from double accuracy one step reaches double-double, the second measures the error)
 * @example refineRoot([[-2, 0], [0, 0], [1, 0]], { re: 1.4142, im: 0 }).z.re // 1.41421356237310
 * @source dekker1971 (double-length arithmetic; from memory); press2007 §9.5 (root polishing; section from memory)
 */
export function refineRoot(c: readonly DD[], z: { re: number; im: number }, steps = 2): { z: { re: number; im: number }; error: { re: number; im: number } } {
  let zr: DD = [z.re, 0]; let zi: DD = [z.im, 0];
  let last = { re: Infinity, im: Infinity };
  for (let s = 0; s < steps; s++) {
    let pr: DD = c[c.length - 1]!; let pi: DD = [0, 0]; let dr: DD = [0, 0]; let di: DD = [0, 0];
    for (let i = c.length - 2; i >= 0; i--) {
      const [tr, ti] = cmul(dr, di, zr, zi); dr = ddAdd(tr, pr); di = ddAdd(ti, pi);
      const [ur, ui] = cmul(pr, pi, zr, zi); pr = ddAdd(ur, c[i]!); pi = ui;
    }
    const P = { re: pr[0] + pr[1], im: pi[0] + pi[1] };
    const D = { re: dr[0] + dr[1], im: di[0] + di[1] };
    const m = Math.max(Math.abs(D.re), Math.abs(D.im));
    if (m === 0 || !Number.isFinite(m)) break;
    const Dr = D.re / m; const Di = D.im / m; const dd = Dr * Dr + Di * Di;
    const xr = (P.re * Dr + P.im * Di) / dd / m; const xi = (P.im * Dr - P.re * Di) / dd / m;
    zr = ddAdd(zr, [-xr, 0]); zi = ddAdd(zi, [-xi, 0]);
    last = { re: Math.abs(xr), im: Math.abs(xi) };
  }
  const re = zr[0] + zr[1]; const im = zi[0] + zi[1];
  // a root of multiplicity m sits about m·|p/p′| from the iterate: 4× the last step covers a close pair
  const e = 4 * Math.hypot(last.re, last.im);
  return { z: { re, im }, error: { re: Number.EPSILON * Math.abs(re) + e, im: Number.EPSILON * Math.abs(im) + e } };
}
