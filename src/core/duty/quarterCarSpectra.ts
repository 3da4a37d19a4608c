/**
 * The quarter car's squared gains, and the ISO 2631-1 weighting, as rational functions of u = ω²
 * in pole–zero form, for the closed-form variances (mellinRational).
 */
import type { Complex } from '../complex/index.ts';
import { ddAdd, ddMul, ddProduct, polynomialRoots, refineRoot, type RationalSpectrum } from '../numeric/index.ts';
import type { QuarterCar } from './quarterCar.ts';
import type { WeightingFilter } from './comfortWeighting.ts';

export interface QuarterCarSpectra {
  readonly damperVelocity: RationalSpectrum;
  readonly travel: RationalSpectrum;
  readonly bodyAcceleration: RationalSpectrum;
  readonly tyreLoad: RationalSpectrum;
  /** Body acceleration times the squared weighting. */
  readonly weightedAcceleration: RationalSpectrum;
}

/** Roots p = −s of a s² + b s + c (a, b, c > 0): Re p > 0; the smaller real root as c/(a p₁), no cancellation. */
function stableQuadratic(a: number, b: number, c: number): [Complex, Complex] {
  const disc = b * b - 4 * a * c;
  if (disc < 0) { const im = Math.sqrt(-disc) / (2 * a); return [{ re: b / (2 * a), im }, { re: b / (2 * a), im: -im }]; }
  const p1 = (b + Math.sqrt(disc)) / (2 * a);
  return [{ re: p1, im: 0 }, { re: c / (a * p1), im: 0 }];
}

type Pole = { readonly p: Complex; readonly error: { readonly re: number; readonly im: number } };

/**
 * The roots of a real polynomial as exact conjugate pairs, and real where the imaginary part is within
 * its error of zero, so mellinRational can tie the errors within each pair (c + p̄ = 2 Re p exactly).
 */
function conjugatePairs(roots: readonly Pole[]): Pole[] {
  const real = roots.filter((r) => Math.abs(r.p.im) <= 4 * r.error.im).map((r) => ({ p: { re: r.p.re, im: 0 }, error: { re: r.error.re, im: Math.abs(r.p.im) + r.error.im } }));
  const up = roots.filter((r) => r.p.im > 4 * r.error.im);
  const down = roots.filter((r) => -r.p.im > 4 * r.error.im);
  if (up.length !== down.length) return [...roots];
  const out: Pole[] = [...real];
  for (const a of up) {
    let best = 0;
    down.forEach((b, i) => { if (Math.hypot(b.p.re - a.p.re, b.p.im + a.p.im) < Math.hypot(down[best]!.p.re - a.p.re, down[best]!.p.im + a.p.im)) best = i; });
    const b = down.splice(best, 1)[0]!;
    const re = (a.p.re + b.p.re) / 2; const im = (a.p.im - b.p.im) / 2;
    const error = { re: Math.max(a.error.re, b.error.re) + Math.abs(a.p.re - b.p.re) / 2, im: Math.max(a.error.im, b.error.im) + Math.abs(a.p.im + b.p.im) / 2 };
    out.push({ p: { re, im }, error }, { p: { re, im: -im }, error });
  }
  return out;
}

/** Roots p = −s of the biquad s² + (ω/Q)s + ω², whose |·|² at s = iω' is (u − ω²)² + uω²/Q². */
const biquad = (w: number, Q: number) => stableQuadratic(1, w / Q, w * w);

/**
 * Pole–zero forms of the quarter car's squared gains (quarterCarGains) and of $|W(f)|^2|H_{\ddot z_s}|^2$:
 * with $\Delta(s) = m_s m_u s^4 + c M s^3 + (M k_s + m_s k_t)s^2 + c k_t s + k_s k_t$ and its roots $s_j = -p_j$,
 * $|\Delta(i\omega)|^2 = (m_s m_u)^2\prod_j (u + p_j^2)$, and
 * $$|H_v|^2 = \frac{k_t^2 m_s^2 u^3}{|\Delta|^2},\ |H_x|^2 = \frac{k_t^2 m_s^2 u^2}{|\Delta|^2},\
 *   |H_a|^2 = \frac{k_t^2 u^2 (k_s^2 + c^2 u)}{|\Delta|^2},\
 *   |H_F|^2 = \frac{k_t^2 u^2\,|m_s m_u s^2 + M c s + M k_s|^2}{|\Delta|^2}$$
 * and the weighting's biquads in the same form (each $|s^2 + (\omega_0/Q)s + \omega_0^2|^2 = (u + p_+^2)(u + p_-^2)$).
 * The roots of Δ come from polynomialRoots; where the real part is not already known to 1e-12 (a lightly
 * damped mode) they are refined by Newton steps in double-double arithmetic (refineRoot), so that part is
 * right to rounding too; the weighting's are closed forms.
 *
 * @param q quarter car (validated); w the weighting (WEIGHTING_WK)
 * @throws ComputationError when the quartic's roots cannot be found
 * @example quarterCarSpectra({ ms: 240, mu: 36, ks: 16000, kt: 160000, c: 980 }, WEIGHTING_WK).damperVelocity.poles.length // 4
 * @source wong2008 §7.2 (quarter-car equations of motion; section from memory); iso2631_1 Annex A (weighting filters, from memory); closed form
 */
export function quarterCarSpectra(q: QuarterCar, w: WeightingFilter): QuarterCarSpectra {
  const M = q.ms + q.mu;
  const a4 = q.ms * q.mu;
  // the coefficients of Δ to about 32 digits from the inputs themselves (M = m_s + m_u included), so the
  // refined real part of a nearly undamped mode is that of the car as given, not of rounded coefficients
  const Mdd = ddAdd([q.ms, 0], [q.mu, 0]);
  const dd = [ddProduct(q.ks, q.kt), ddProduct(q.c, q.kt), ddAdd(ddMul(Mdd, [q.ks, 0]), ddProduct(q.ms, q.kt)), ddMul([q.c, 0], Mdd), ddProduct(q.ms, q.mu)];
  const poles = conjugatePairs(polynomialRoots(dd.map((x) => x[0] + x[1])).map((r) => {
    // a root whose real part double precision already gives to 1e-12 relative is kept as it is (the
    // refinement costs most of the work); only lightly damped or clustered ones are refined
    if (r.error <= 1e-12 * Math.abs(r.z.re)) return { p: { re: -r.z.re, im: -r.z.im }, error: { re: r.error, im: r.error } };
    const f = refineRoot(dd, r.z);
    return { p: { re: -f.z.re, im: -f.z.im }, error: f.error };
  }));
  const g = (q.kt * q.ms) / a4;
  const acc: RationalSpectrum = { gain: ((q.kt * q.c) / a4) ** 2, zeroOrder: 2, zeros: [{ re: q.ks / q.c, im: 0 }], poles };
  const tw = 2 * Math.PI;
  const [w1, w2, w3, w4] = [w.f1 * tw, w.f2 * tw, w.f3 * tw, w.f4 * tw];
  const wz = [...acc.zeros, { re: w3, im: 0 }];
  const wp = [...biquad(w1, Math.SQRT1_2), ...biquad(w2, Math.SQRT1_2), ...biquad(w4, w.Q4)];
  if (w.step) { wz.push(...biquad(w.step.f5 * tw, w.step.Q5)); wp.push(...biquad(w.step.f6 * tw, w.step.Q6)); }
  return {
    damperVelocity: { gain: g * g, zeroOrder: 3, zeros: [], poles },
    travel: { gain: g * g, zeroOrder: 2, zeros: [], poles },
    bodyAcceleration: acc,
    tyreLoad: { gain: q.kt * q.kt, zeroOrder: 2, zeros: stableQuadratic(a4, M * q.c, M * q.ks), poles },
    // |H_h|² = u²/(u² + ω₁⁴), |H_l|² = ω₂⁴/(u² + ω₂⁴), |H_t|² = ω₄⁴(u + ω₃²)/(ω₃²·biquad), |H_s|² = biquad₅/biquad₆
    weightedAcceleration: { gain: (acc.gain * w2 ** 4 * w4 ** 4) / (w3 * w3), zeroOrder: 4, zeros: wz, poles: [...poles, ...wp.map((p) => ({ p }))] },
  };
}
