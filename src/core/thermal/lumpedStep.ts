/**
 * One exact step of a lumped body at constant power: the temperature after Δt.
 *
 * $$T_{i+1} = T_\infty + \frac{P_i}{UA} + \Big(T_i - T_\infty - \frac{P_i}{UA}\Big)\,e^{-\Delta t_i/\tau},\qquad \tau = \frac{C}{UA}$$
 *
 * Written as θ = T − T∞ with expm1, so a step much shorter than τ keeps full precision:
 * $\theta_{i+1} = \theta_i + (\theta_{eq} - \theta_i)(1 - e^{-\Delta t/\tau})$, $\theta_{eq} = P_i/UA$.
 * No validation here (inner loop): callers check P ≥ 0, Δt ≥ 0, τ > 0, UA > 0 once.
 *
 * @param theta rise above ambient at the start, K
 * @param P power during the step, W
 * @param dt step, s
 * @param tau time constant C/UA, s
 * @param UA conductance to ambient, W/K
 * @returns rise above ambient after dt, K
 * @example lumpedStep(0, 50, 600, 1870.8, 0.745664) // ≈ 18.398 K (50 W, 600 s from ambient)
 * @source incropera2007 §5.3, eq. 5.6 generalised to a heat source (lumped capacitance; from memory)
 */
export function lumpedStep(theta: number, P: number, dt: number, tau: number, UA: number): number {
  return theta + (P / UA - theta) * -Math.expm1(-dt / tau);
}
