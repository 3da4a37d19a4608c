import { ComputationError, InputRangeError, POSITIVE, requireInRange } from '../errors.ts';
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
 * A segment ends early once the temperature has settled: within a segment the equation is scalar
 * and autonomous, so T(t) is monotone and cannot cross an equilibrium T* (P_i = Q(T*)). When
 * P_i − Q changes sign between T and T + δ in the direction T moves (δ = the integrator's
 * tolerance on T, atol + rtol·|T|; Q continuous, so T* lies in that interval), T stays between T
 * and T* for the rest of the segment, and T + δ/2 holds it to within δ/2. Without this, a body
 * with a small heat capacity (τ = C/UA ≪ segment) costs an explicit method ~τ⁻¹ steps per second
 * at its stability limit: 100 000 steps for nothing.
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
  const RTOL = 1e-9;
  const ATOL_T = 1e-7;
  let stepsInSegment = 0;
  let settledAt = NaN; // the temperature a settled segment holds to its end
  /** After some steps in a segment (every 8th from the 32nd): has T settled? (see above) */
  const settled = (_t: number, s: Float64Array): boolean => {
    if (++stepsInSegment < 32 || stepsInSegment % 8 !== 0) return false;
    const T = s[0]!;
    const f = power - Q(T);
    const d = (f > 0 ? 1 : -1) * (ATOL_T + RTOL * Math.abs(T));
    // a limit inside the interval would be crossed at an unknown time: integrate on
    if (stopAt !== undefined && (stopAt - T) * (stopAt - (T + d)) <= 0) return false;
    if (f !== 0) {
      let ahead: number;
      try { ahead = power - Q(T + d); } catch (e) { if (e instanceof InputRangeError) return false; throw e; } // T + δ past Q's range: integrate on
      if (ahead * f > 0) return false;
    }
    settledAt = f === 0 ? T : T + 0.5 * d;
    return true;
  };
  const opts = {
    rtol: RTOL,
    atol: [ATOL_T, 1e-6 * p.P.reduce((a, b) => Math.max(a, b), 1) * tp],
    maxSteps: 100000,
    event: stopAt === undefined ? undefined : (_t: number, s: Float64Array) => stopAt - s[0]!,
    onStep: (st: { t1: number; y1: Float64Array }) => { t.push(st.t1); y.push(st.y1[0]!); },
    stopAfter: settled,
  };
  let hNext: number | undefined;
  /** Integrates one segment at the current power to t1; true when it stopped at the limit. */
  const segment = (t1: number): boolean => {
    stepsInSegment = 0;
    const r = integrateAdaptive(sys, tc, state, t1, { ...opts, h0: hNext });
    hNext = r.hNext;
    state.set(r.y);
    tc = r.t;
    if (r.stoppedByEvent) return true;
    if (r.stoppedEarly) { // settled: T holds, the energy grows at the segment's power
      state[0] = settledAt;
      state[1] = state[1]! + power * (t1 - tc);
      tc = t1;
      t.push(t1); y.push(settledAt);
    }
    return false;
  };
  if (stopAt !== undefined && T0 >= stopAt) return { t, y, tCross: 0, energyIn: 0 };
  for (let k = 0; k < periods && tc < tEnd; k++) {
    for (let i = 0; i < n && tc < tEnd; i++) {
      const t1 = Math.min(tEnd, k * tp + p.t[i + 1]!);
      if (!(t1 - tc > 1e-12 * Math.max(1, t1))) { tc = Math.max(tc, t1); continue; } // a sliver left by rounding
      power = p.P[i]!;
      if (segment(t1)) return { t, y, tCross: tc, energyIn: state[1]! };
    }
  }
  if (tEnd - tc > 1e-12 * tEnd) { // 'off': no power after the profile
    power = 0;
    if (segment(tEnd)) return { t, y, tCross: tc, energyIn: state[1]! };
  }
  return { t, y, tCross: undefined, energyIn: state[1]! };
}
