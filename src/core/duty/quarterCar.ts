/**
 * The quarter-car model: sprung mass on a spring and damper, unsprung mass on a tyre spring,
 * driven by the road profile under the tyre. Exact frequency responses, squared magnitudes.
 */
import { POSITIVE, requireInRange } from '../errors.ts';

export interface QuarterCar {
  /** Sprung mass per corner, kg. */
  readonly ms: number;
  /** Unsprung mass per corner, kg. */
  readonly mu: number;
  /** Suspension spring rate at the wheel, N/m. */
  readonly ks: number;
  /** Tyre vertical rate, N/m. */
  readonly kt: number;
  /** Linear (or equivalent linear) damping at the wheel, N·s/m. */
  readonly c: number;
}

/** Checks quarter-car parameters; names the offending input. */
export function checkQuarterCar(q: QuarterCar): QuarterCar {
  requireInRange('ms', q.ms, POSITIVE, 'kg');
  requireInRange('mu', q.mu, POSITIVE, 'kg');
  requireInRange('ks', q.ks, POSITIVE, 'N/m');
  requireInRange('kt', q.kt, POSITIVE, 'N/m');
  requireInRange('c', q.c, POSITIVE, 'N·s/m');
  return q;
}

/** |H(f)|² of each response per unit road displacement. */
export interface QuarterCarGains {
  /** Damper (relative) velocity, (m/s)²/m². */
  readonly damperVelocity: number;
  /** Suspension travel z_s − z_u, m²/m². */
  readonly travel: number;
  /** Sprung-mass acceleration, (m/s²)²/m². */
  readonly bodyAcceleration: number;
  /** Dynamic tyre load k_t(z_r − z_u), N²/m². */
  readonly tyreLoad: number;
}

/**
 * Squared gains of the quarter car at frequency f (s = iω, ω = 2πf).
 *
 * $$a = m_s s^2 + cs + k_s,\quad b = m_u s^2 + cs + k_s + k_t,\quad d = cs + k_s,\quad \Delta = ab - d^2$$
 * $$\frac{Z_s - Z_u}{Z_r} = \frac{-k_t m_s s^2}{\Delta},\qquad \frac{Z_s}{Z_r} = \frac{k_t d}{\Delta},\qquad
 *   \frac{F_t}{Z_r} = k_t\left(1 - \frac{k_t a}{\Delta}\right) = \frac{k_t\,(a(b-k_t) - d^2)}{\Delta}$$
 * evaluated in the expanded form $\Delta = m_s m_u s^4 + (m_s+m_u)s^2 d + m_s k_t s^2 + k_t d$,
 * $a(b-k_t) - d^2 = m_s m_u s^4 + (m_s+m_u) s^2 d$, which has no cancelling k_s² terms.
 *
 * @param q quarter car (call checkQuarterCar first)
 * @param f frequency, Hz, ≥ 0
 * @example quarterCarGains({ ms: 240, mu: 36, ks: 16000, kt: 160000, c: 980 }, 0).travel // 0 (static road offset moves the car bodily)
 * @source wong2008 §7.2 quarter-car equations of motion (section from memory); closed form
 */
export function quarterCarGains(q: QuarterCar, f: number): QuarterCarGains {
  const w = 2 * Math.PI * f;
  const w2 = w * w;
  const cw = q.c * w;
  const M = q.ms + q.mu;
  // Expanded so that the k_s² terms of a·b and d² cancel exactly (they would lose digits when k_s ≫ k_t):
  // Δ = m_s m_u s⁴ + M s² d + m_s k_t s² + k_t d,  a(b − k_t) − d² = m_s m_u s⁴ + M s² d
  const m4 = q.ms * q.mu * w2 * w2;
  const dRe = m4 - M * w2 * q.ks - q.ms * q.kt * w2 + q.kt * q.ks;
  const dIm = cw * (q.kt - M * w2);
  const mag2 = dRe * dRe + dIm * dIm;
  const nRe = m4 - M * w2 * q.ks;
  const nIm = -M * w2 * cw;
  const rel2 = (q.kt * q.ms * w2) ** 2 / mag2;
  const zs2 = (q.kt * q.kt * (q.ks * q.ks + cw * cw)) / mag2;
  return {
    damperVelocity: w2 * rel2,
    travel: rel2,
    bodyAcceleration: w2 * w2 * zs2,
    tyreLoad: (q.kt * q.kt * (nRe * nRe + nIm * nIm)) / mag2,
  };
}

/**
 * Undamped natural frequencies of the coupled quarter car (body and wheel-hop modes), Hz: the roots of
 *
 * $$m_s m_u\,\omega^4 - \left[(m_s + m_u)k_s + m_s k_t\right]\omega^2 + k_s k_t = 0 .$$
 *
 * Response peaks sit near these when damping is light; the quadrature places panel edges around them.
 * @source wong2008 §7.2 (from memory); closed form
 */
export function quarterCarModes(q: QuarterCar): { body: number; wheel: number } {
  const a = q.ms * q.mu;
  const b = (q.ms + q.mu) * q.ks + q.ms * q.kt;
  const c = q.ks * q.kt;
  const disc = Math.sqrt(Math.max(0, b * b - 4 * a * c));
  const hi = (b + disc) / (2 * a);
  const lo = c / (a * hi); // product of roots = c/a: avoids cancellation in (b − disc)
  return { body: Math.sqrt(lo) / (2 * Math.PI), wheel: Math.sqrt(hi) / (2 * Math.PI) };
}

/**
 * Frequencies (Hz) where the quarter car's response can change character: the coupled undamped modes,
 * the mode with the damper locked, √(k_t/(m_s+m_u)), and the relaxation corners k_s/c, k_t/c, c/m_s, c/m_u
 * (rad/s ÷ 2π) that matter when the damper is very soft or very hard. The quadrature band spans them
 * with three decades to spare and brackets each with panel edges.
 * @source closed form (limits of the quarter-car characteristic polynomial)
 */
export function quarterCarCharacteristicFrequencies(q: QuarterCar): number[] {
  const m = quarterCarModes(q);
  const w = [q.ks / q.c, q.kt / q.c, q.c / q.ms, q.c / q.mu, Math.sqrt(q.kt / (q.ms + q.mu))];
  return [m.body, m.wheel, ...w.map((x) => x / (2 * Math.PI))].filter((f) => f > 0 && Number.isFinite(f));
}
