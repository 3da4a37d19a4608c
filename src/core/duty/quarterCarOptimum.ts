/**
 * Damping that minimises the body acceleration (comfort) or the dynamic tyre load (road holding)
 * of a linear quarter car on a road whose velocity is white (ISO 8608, w = 2).
 */
import { checkQuarterCar, type QuarterCar } from './quarterCar.ts';

/**
 * Minimising the closed-form variances of quarterCarWhiteVariances over c (each has the form
 * A·c + B/c, least at c = √(B/A)):
 *
 * $$c_{comfort} = k_s\sqrt{\frac{m_s + m_u}{k_t}},\qquad
 *   c_{grip} = \sqrt{\frac{k_s^2 M^3 - 2k_s k_t m_s m_u M + k_t^2 m_s^2 m_u}{k_t M^2}},\quad M = m_s + m_u$$
 *
 * The comfort optimum is for the unweighted body acceleration; the W_k-weighted value (ISO 2631-1)
 * is shallow around it. Both are at the wheel (divide by MR² for the damper).
 *
 * @param car masses (kg) and rates (N/m) at the wheel; its c is not used
 * @throws InputRangeError naming the input out of range
 * @example quarterCarOptimalDamping({ ms: 240, mu: 36, ks: 16000, kt: 160000 }).comfort // 664.53 N·s/m
 * @source gobbi2001 optimal damping for discomfort and road holding on a white-velocity road (equation numbers from memory); derived here from the closed-form variances (closed form)
 */
export function quarterCarOptimalDamping(car: Omit<QuarterCar, 'c'>): { comfort: number; roadHolding: number } {
  const q = checkQuarterCar({ ...car, c: 1 });
  const M = q.ms + q.mu;
  const num = q.ks * q.ks * M ** 3 - 2 * q.ks * q.kt * q.ms * q.mu * M + q.kt * q.kt * q.ms * q.ms * q.mu;
  return { comfort: q.ks * Math.sqrt(M / q.kt), roadHolding: Math.sqrt(num / (q.kt * M * M)) };
}
