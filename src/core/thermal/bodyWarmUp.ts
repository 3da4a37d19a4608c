import { ComputationError, POSITIVE, requireInRange } from '../errors.ts';
import { integrateAdaptive } from '../ode/integrate.ts';
import { checkProfile, type PowerProfile, type ProfileEnd } from './powerProfile.ts';

/** Most power segments one body-model run may integrate (bounds the work at typing speed). */
export const MAX_BODY_SEGMENTS = 20000;

export interface BodyWarmUpRun {
  /** Sample times, s, and temperatures, K (segment ends and accepted steps). */
  readonly t: readonly number[];
  readonly y: readonly number[];
  /** First time the temperature reaches `stopAt`, s, when asked and reached. */
  readonly tCross: number | undefined;
  /** Energy put in by the power up to the end of the run, J (∫P dt, integrated with the state). */
  readonly energyIn: number;
}

/**
 * Lumped warm-up with a temperature-dependent heat loss under a piecewise-constant power,
 * integrated piecewise: one adaptive Dormand–Prince 5(4) run per power segment, so every switching
 * time (an on/off edge at d·t_p, a profile block edge) is a step edge and the power is never sampled
 * across a jump. The energy put in is integrated as a second state.
 *
 * $$C\frac{dT}{dt} = P(t) - Q(T),\qquad P(t) = P_i\ \text{on}\ [t_i, t_{i+1}),\quad \frac{dE}{dt} = P(t)$$
 *
 * @param Q heat loss at body temperature T, W (continuous)
 * @param Cth heat capacity, J/K, (0, ∞)
 * @param T0 start temperature, K
 * @param p the power profile (one period when repeated); on/off duty is {t: [0, d·t_p, t_p], P: [P, 0]}
 * @param end 'repeat' (period t_n) or 'off' (no power after t_n)
 * @param tEnd end of the run, s, (0, ∞)
 * @param stopAt optional temperature: the run stops where T first reaches it (event, located to round-off)
 * @returns samples, the crossing time and the energy put in
 * @throws InputRangeError for bad inputs; ComputationError for more than MAX_BODY_SEGMENTS segments
 * @example bodyWarmUp((T) => 0.745664 * (T - 298.15), 1395, 298.15, { t: [0, 1e6], P: [150] }, 'off', 3600, 373.15).tCross // ≈ 872.812 s (closed form τ ln(ΔT_ss/(ΔT_ss − ΔT_lim)))
 * @source incropera2007 §5.3 general lumped analysis (from memory); hairer1993 §II.4–II.6; dormand1980
 */
export function bodyWarmUp(Q: (T: number) => number, Cth: number, T0: number, p: PowerProfile, end: ProfileEnd, tEnd: number, stopAt?: number): BodyWarmUpRun {
  const C = requireInRange('Cth', Cth, POSITIVE, 'J/K');
  requireInRange('tEnd', tEnd, POSITIVE, 's');
  checkProfile(p);
  const n = p.P.length;
  const tp = p.t[n]!;
  const periods = end === 'repeat' ? Math.ceil(tEnd / tp) : 1;
  const segments = periods * n + (end === 'off' && tEnd > tp ? 1 : 0);
  if (segments > MAX_BODY_SEGMENTS) {
    throw new ComputationError(`the body model would need ${segments.toExponential(1)} power segments (at most ${MAX_BODY_SEGMENTS}): lengthen the duty period, shorten the time, or use the constant-UA model`);
  }
  const t: number[] = [0];
  const y: number[] = [T0];
  const state = Float64Array.from([T0, 0]);
  let tc = 0;
  let power = 0;
  const sys = {
    dim: 2,
    f(_t: number, s: Float64Array, d: Float64Array) {
      d[0] = (power - Q(s[0]!)) / C;
      d[1] = power;
    },
  };
  const opts = {
    rtol: 1e-9,
    atol: [1e-7, 1e-6 * p.P.reduce((a, b) => Math.max(a, b), 1) * tp],
    maxSteps: 100000,
    event: stopAt === undefined ? undefined : (_t: number, s: Float64Array) => stopAt - s[0]!,
    onStep: (st: { t1: number; y1: Float64Array }) => { t.push(st.t1); y.push(st.y1[0]!); },
  };
  if (stopAt !== undefined && T0 >= stopAt) return { t, y, tCross: 0, energyIn: 0 };
  for (let k = 0; k < periods && tc < tEnd; k++) {
    for (let i = 0; i < n && tc < tEnd; i++) {
      const t1 = Math.min(tEnd, k * tp + p.t[i + 1]!);
      if (!(t1 - tc > 1e-12 * Math.max(1, t1))) { tc = Math.max(tc, t1); continue; } // a sliver left by rounding
      power = p.P[i]!;
      const r = integrateAdaptive(sys, tc, state, t1, opts);
      state.set(r.y);
      tc = r.t;
      if (r.stoppedByEvent) return { t, y, tCross: r.t, energyIn: state[1]! };
    }
  }
  if (tEnd - tc > 1e-12 * tEnd) { // 'off': no power after the profile
    power = 0;
    const r = integrateAdaptive(sys, tc, state, tEnd, opts);
    state.set(r.y);
    if (r.stoppedByEvent) return { t, y, tCross: r.t, energyIn: state[1]! };
  }
  return { t, y, tCross: undefined, energyIn: state[1]! };
}
