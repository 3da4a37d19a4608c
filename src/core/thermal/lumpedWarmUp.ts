import { NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';

/** A lumped body heated at constant power with a constant conductance to ambient. SI. */
export interface LumpedBody {
  readonly P: number; // W, heating power
  readonly Cth: number; // J/K, heat capacity
  readonly UA: number; // W/K, conductance to ambient
  readonly Tamb: number; // K
  readonly T0?: number; // K, start temperature (default Tamb)
}

/**
 * Lumped-capacitance warm-up at constant power and constant conductance: the closed form of
 * C dT/dt = P − UA(T − T_∞).
 *
 * $$T(t) = T_{ss} + (T_0 - T_{ss})\,e^{-t/\tau},\qquad \tau = \frac{C}{UA},\qquad T_{ss} = T_\infty + \frac{P}{UA}$$
 * $$t_{lim} = \tau\ln\frac{T_{ss}-T_0}{T_{ss}-T_{lim}}\quad (T_0 < T_{lim} < T_{ss})$$
 *
 * @param b power W [0, ∞), C J/K (0, ∞), UA W/K (0, ∞), temperatures K (0, ∞)
 * @returns τ (s), T_ss (K), T(t) and the time to reach a temperature (undefined when never reached)
 * @throws InputRangeError for bad inputs
 * @example lumpedWarmUp({P:50,Cth:1395,UA:0.745664,Tamb:298.15}).tau // 1870.8 s
 * @source incropera2007 §5.2–5.3 eq. 5.6 with a heat source (from memory)
 */
export function lumpedWarmUp(b: LumpedBody) {
  const P = requireInRange('P', b.P, NON_NEGATIVE, 'W');
  const C = requireInRange('Cth', b.Cth, POSITIVE, 'J/K');
  const UA = requireInRange('UA', b.UA, POSITIVE, 'W/K');
  const Tamb = requireInRange('Tamb', b.Tamb, POSITIVE, 'K');
  const T0 = requireInRange('T0', b.T0 ?? Tamb, POSITIVE, 'K');
  const tau = C / UA;
  const Tss = Tamb + P / UA;
  return {
    tau,
    Tss,
    T0,
    /** Temperature at time t ≥ 0, K. */
    at: (t: number): number => Tss + (T0 - Tss) * Math.exp(-requireInRange('t', t, NON_NEGATIVE, 's') / tau),
    /** Time to reach T (K) from T0; 0 when T0 is already there; undefined when never reached. */
    timeTo: (T: number): number | undefined => {
      if ((T - T0) * (Tss - T0) <= 0) return T === T0 ? 0 : undefined; // wrong direction or no change
      if (Math.abs(T - T0) >= Math.abs(Tss - T0)) return undefined; // approached but never reached
      return tau * Math.log((Tss - T0) / (Tss - T)); // log1p form not needed: ratio ≥ 1
    },
  };
}
