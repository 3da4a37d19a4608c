/**
 * ∫₀^∞ u^(σ−1) N(u)/D(u) du for a rational N/D with simple poles off the positive real axis, in
 * closed form by residues, with a rounding-and-pole-error bound and a cancellation figure.
 */
import { ComputationError } from '../errors.ts';
import { exp, expm1, log, mul, type Complex } from '../complex/index.ts';

/**
 * R(u) = gain · u^m · Π_z (u + q_z²) / Π_k (u + p_k²), every factor written through its root's square
 * root in the right half plane: p_k = −s_k for the poles s_k of a stable system (u = ω² = −s²), and
 * likewise q_z for the zeros. Differences of squares are then formed as (q − p)(q + p), exact to
 * rounding however close two roots come.
 */
export interface RationalSpectrum {
  readonly gain: number;
  /** Order m of the zero at u = 0. */
  readonly zeroOrder: number;
  readonly zeros: readonly Complex[];
  /**
   * Poles, Re p > 0, distinct; `error` bounds |δ Re p| and |δ Im p| apart (default 4ε of each part, the
   * rounding of a closed form), so the tiny real part of a lightly damped pole can be stated exactly.
   * Give conjugate pairs as exact conjugates (R real on the real axis): their errors are then tied.
   */
  readonly poles: readonly { readonly p: Complex; readonly error?: { readonly re: number; readonly im: number } }[];
}

export interface MellinValue {
  readonly value: number;
  /** Bound on the relative error from rounding and from the stated pole errors (Infinity: no answer). */
  readonly relError: number;
  /** Σ|terms| / |value|: how much the partial fractions cancel (1 when they do not). */
  readonly cancellation: number;
}

const EPS = Number.EPSILON;

/**
 * Mellin transform of a rational function by partial fractions: with $u_k = -p_k^2$ and residues
 * $r_k = \operatorname{gain}\,u_k^m\prod_z(u_k + q_z^2)/\prod_{j\ne k}(u_k - u_j)$,
 * $$\int_0^\infty u^{\sigma-1}\frac{N(u)}{D(u)}\,du = \frac{\pi}{\sin\pi\sigma}\sum_k r_k\,p_k^{2(\sigma-1)}$$
 * (principal powers), valid in the strip −m < σ < n, n = #poles − m − #zeros (R ~ u^{−n} at ∞); each
 * pole term is $\int_0^\infty u^{\sigma-1}(u + a)^{-1}du = \pi a^{\sigma-1}/\sin\pi\sigma$ with a = p_k².
 * At an integer σ₀ inside the strip the sum vanishes with the sine; within 1/4 of one the sum is taken
 * as $\sum_k r_k p_k^{2(\sigma_0-1)}\operatorname{expm1}(2\delta\ln p_k)$, δ = σ − σ₀ (the exact zero
 * removed), and at δ = 0 as its limit $(-1)^{\sigma_0}\sum_k 2 r_k p_k^{2(\sigma_0-1)}\ln p_k$: no
 * extrapolation error, rounding only.
 *
 * @param r gain > 0, zero order m ≥ 0, zeros and poles with Re > 0, poles distinct
 * @param sigma exponent, inside the strip of convergence
 * @throws ComputationError when σ is outside the strip (the integral diverges) or a pole has Re p ≤ 0
 * @example mellinRational({ gain: 1, zeroOrder: 0, zeros: [], poles: [{ p: complex(1, 0) }] }, 0.5).value // 3.141593 (∫ u^{-1/2}/(u+1) du = π)
 * @source gradshteyn2007 3.222.2 (∫ x^{μ−1}/(x + a) dx = π a^{μ−1}/sin μπ; from memory); flajolet1995 §1 (Mellin transforms, strip of convergence and residues; section from memory)
 */
export function mellinRational(r: RationalSpectrum, sigma: number): MellinValue {
  const np = r.poles.length;
  const m = r.zeroOrder;
  const top = np - m - r.zeros.length;
  if (!(sigma > -m && sigma < top)) throw new ComputationError(`Mellin transform: σ = ${sigma} lies outside the strip (${-m}, ${top}); the integral diverges`);
  if (!r.poles.every((q) => q.p.re > 0) || !r.zeros.every((q) => q.re > 0) || !(r.gain > 0)) throw new ComputationError('Mellin transform: a pole on or right of the imaginary axis (an unstable or undamped system)');
  const s0 = Math.round(sigma);
  const delta = sigma - s0;
  const nearInt = Math.abs(delta) < 0.25 && s0 > -m && s0 < top;
  const e = nearInt ? s0 - 1 : sigma - 1;
  const sgn = s0 % 2 === 0 ? 1 : -1;
  // prefactor π/sin(πσ), written with δ near an integer so the small sine is exact
  const pre = nearInt ? (delta === 0 ? sgn : (sgn * Math.PI) / Math.sin(Math.PI * delta)) : Math.PI / Math.sin(Math.PI * sigma);
  const own = (p: Complex) => ({ re: 4 * EPS * Math.abs(p.re), im: 4 * EPS * Math.abs(p.im) });
  const pe = r.poles.map((q) => q.error ?? own(q.p));
  const lgain = Math.log(r.gain);
  let sr = 0; let si = 0; let abs = 0; let err = 0;
  for (let k = 0; k < np; k++) {
    const p = r.poles[k]!.p;
    const ep = pe[k]!;
    const ap = Math.hypot(p.re, p.im);
    const dp = Math.hypot(ep.re, ep.im);
    const L = log(p);
    // The term r_k·p_k^{2e} is built as the exponential of a sum of logarithms: poles of a stiff car
    // span twenty decades and more, and products of a dozen such factors leave the double range.
    // u_k^m = (−p²)^m: log u_k = 2 ln p + iπ (any branch does for an integer power)
    let lr = lgain + m * 2 * L.re + 2 * e * L.re;
    let li = m * (2 * L.im + Math.PI) + 2 * e * L.im;
    let lsize = Math.abs(lgain) + (m + 2 * Math.abs(e)) * 2 * Math.hypot(L.re, L.im);
    // relative error of the residue from the errors of the roots, part by part
    let rootErr = (2 * m * dp) / ap;
    // A real R has its poles and zeros in conjugate pairs; a pair given as exact conjugates stays one
    // under the errors, so c − p = 2i·Im c and c + p = 2 Re p carry only the error of that one part.
    // Each factor u_k + c² = c² − p_k² is taken as (c − p_k)(c + p_k): no cancellation however close.
    // A zero equal to this pole in double (k_s/c against a relaxation pole when c is huge) makes the
    // residue vanish: the term is then left out, and the factor's own error bounds what it could be.
    let vanishes = false;
    const factor = (c: Complex, ec: { re: number; im: number }, sign: number): void => {
      const conj = c.re === p.re && c.im === -p.im;
      const e1 = conj ? ec.im + ep.im : Math.hypot(ec.re + ep.re, ec.im + ep.im);
      const e2 = conj ? ec.re + ep.re : e1;
      const same = c.re === p.re && c.im === p.im;
      if (same && sign < 0) throw new ComputationError('Mellin transform: two poles coincide');
      if (same) vanishes = true;
      const d1 = same ? { re: Math.log(Math.hypot(ec.re + ep.re, ec.im + ep.im)), im: 0 } : log({ re: c.re - p.re, im: c.im - p.im }); const d2 = log({ re: c.re + p.re, im: c.im + p.im });
      if (!same) rootErr += e1 / Math.exp(d1.re);
      rootErr += e2 / Math.exp(d2.re);
      lr += sign * (d1.re + d2.re); li += sign * (d1.im + d2.im);
      lsize += Math.hypot(d1.re, d1.im) + Math.hypot(d2.re, d2.im);
    };
    for (const z of r.zeros) factor(z, own(z), 1);
    for (let j = 0; j < np; j++) if (j !== k) factor(r.poles[j]!.p, pe[j]!, -1);
    const t = exp({ re: lr, im: li });
    const at = Math.exp(lr);
    let term: Complex; let dT: number; // dT: |∂term/∂ln p| / |t|
    if (!nearInt) { term = t; dT = 2 * Math.abs(e); }
    else if (delta === 0) { term = mul(t, { re: 2 * L.re, im: 2 * L.im }); dT = 4 * Math.abs(e) * Math.hypot(L.re, L.im) + 2; }
    else {
      const x = expm1({ re: 2 * delta * L.re, im: 2 * delta * L.im });
      term = mul(t, x);
      dT = 2 * Math.abs(e) * Math.hypot(x.re, x.im) + 2 * Math.abs(delta) * Math.hypot(1 + x.re, x.im);
    }
    const aT = Math.hypot(term.re, term.im);
    // rounding (of the logarithms summed, then of the exponential and products), the root errors
    // through the residue, and this pole's error through ln p
    err += aT * (EPS * (4 * (np + r.zeros.length + m) + 8 + lsize) + rootErr) + at * dT * (dp / ap + EPS * Math.hypot(L.re, L.im));
    if (vanishes) { err += aT; continue; }
    sr += term.re; si += term.im; abs += aT;
  }
  const value = pre * sr;
  const scale = Math.abs(pre);
  const mag = Math.abs(value);
  const relError = (scale * (err + EPS * np * abs) + Math.abs(pre * si)) / mag;
  if (!Number.isFinite(value) || !Number.isFinite(relError) || mag === 0) return { value: Number.isFinite(value) ? value : 0, relError: Infinity, cancellation: Infinity };
  return { value, relError, cancellation: (scale * abs) / mag };
}
