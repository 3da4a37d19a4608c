/**
 * Cool-down of a lumped body with the power off: the time from one temperature to a lower one.
 *
 * $$t_{cool} = \tau\,\ln\frac{T_{start} - T_\infty}{T_{target} - T_\infty}$$
 *
 * @param Tstart start temperature, K; Ttarget target, K; Tamb air, K; tau = C/UA, s (> 0)
 * @returns 0 when the start is at or below the target; undefined when the target is at or below
 *   the air temperature (approached, never reached)
 * @example coolDownTime(373.15, 323.15, 298.15, 1804) // ≈ 1982 s (100 °C → 50 °C in 25 °C air)
 * @source incropera2007 §5.3 eq. 5.6 with P = 0 (lumped capacitance; from memory)
 */
export function coolDownTime(Tstart: number, Ttarget: number, Tamb: number, tau: number): number | undefined {
  if (Ttarget <= Tamb) return undefined;
  if (Tstart <= Ttarget) return 0;
  return tau * Math.log((Tstart - Tamb) / (Ttarget - Tamb));
}
