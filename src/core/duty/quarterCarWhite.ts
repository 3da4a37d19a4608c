/**
 * Closed-form variances of the quarter car driven by white road velocity (ISO 8608 with w = 2).
 */
import { ISO_8608_N0_SQUARED } from '../constants.ts';
import type { QuarterCar } from './quarterCar.ts';

export interface QuarterCarVariances {
  /** σ² of damper velocity ż_s − ż_u, (m/s)². */
  readonly damperVelocity: number;
  /** σ² of suspension travel z_s − z_u, m². */
  readonly travel: number;
  /** σ² of sprung-mass acceleration, (m/s²)². */
  readonly bodyAcceleration: number;
  /** σ² of dynamic tyre load, N². */
  readonly tyreLoad: number;
}

/**
 * Stationary variances for white road velocity of one-sided level G0 (two-sided intensity W = G0/2),
 * from the Lyapunov equation of the 4-state model (q₁ = z_s − z_u, q₂ = z_u − z_r, ż_s, ż_u).
 *
 * $$\sigma^2_{\dot z_s-\dot z_u} = \frac{W k_t}{2c},\quad \sigma^2_{z_s-z_u} = \frac{W(m_s+m_u)}{2c},\quad
 *   \sigma^2_{\ddot z_s} = \frac{W\,[c^2 k_t + k_s^2(m_s+m_u)]}{2c\,m_s^2}$$
 * $$\sigma^2_{F_t} = \frac{W\,[c^2 k_t M^2 + k_s^2 M^3 - 2k_s k_t m_s m_u M + k_t^2 m_s^2 m_u]}{2c\,m_s^2},\quad M = m_s + m_u$$
 * and the mean damper power $\bar P = c\,\sigma^2_{\dot z_s-\dot z_u} = W k_t/2 = \pi^2 k_t G_d(n_0) n_0^2 V$,
 * independent of c, k_s and both masses.
 *
 * @param q quarter car (validated)
 * @param G0 one-sided road velocity PSD level, (m/s)²/Hz
 * @example quarterCarWhiteVariances({ ms: 240, mu: 36, ks: 16000, kt: 160000, c: 980 }, 2.021295e-3).damperVelocity // 0.0825018 (m/s)²
 * @source gobbi2001 (same closed forms, equation numbers from memory); zuo2013 (power independent
 *   of suspension parameters, published abstract); derived here with the Lyapunov equation
 *   (closed form, checked by quadrature)
 */
export function quarterCarWhiteVariances(q: QuarterCar, G0: number): QuarterCarVariances {
  const W = G0 / 2;
  const M = q.ms + q.mu;
  const den = 2 * q.c;
  return {
    damperVelocity: (W * q.kt) / den,
    travel: (W * M) / den,
    bodyAcceleration: (W * (q.c * q.c * q.kt + q.ks * q.ks * M)) / (den * q.ms * q.ms),
    tyreLoad: (W * (q.c * q.c * q.kt * M * M + q.ks * q.ks * M ** 3 - 2 * q.ks * q.kt * q.ms * q.mu * M + q.kt * q.kt * q.ms * q.ms * q.mu)) / (den * q.ms * q.ms),
  };
}

/**
 * Mean power a quarter-car damper dissipates on a w = 2 road (any damper law, any masses).
 *
 * $$\bar P = \pi^2 k_t\, G_d(n_0)\, n_0^2\, V$$
 *
 * @param kt tyre rate, N/m; Gd0 m³; V m/s
 * @example whiteRoadDamperPower(160e3, 256e-6, 20) // 80.8518 W
 * @source zuo2013 (independence of damper power from suspension parameters); closed form
 */
export function whiteRoadDamperPower(kt: number, Gd0: number, V: number): number {
  return Math.PI ** 2 * kt * Gd0 * ISO_8608_N0_SQUARED * V;
}
