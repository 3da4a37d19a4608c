import { ComputationError, POSITIVE, requireInRange } from '../errors.ts';
import { integrateAdaptive } from '../ode/integrate.ts';
import { MAX_BODY_SEGMENTS } from './bodyWarmUp.ts';
import { checkProfile, type PowerProfile, type ProfileEnd } from './powerProfile.ts';
import { maxOf } from '../numeric/index.ts';

/** Most integration steps one two-node run may take (a stiff oil node would take millions: refused instead). */
export const MAX_TWO_NODE_STEPS = 10000;

/** Oil and body as two lumped nodes joined by a conductance; both start at T0. SI. */
export interface TwoNodeBody {
  readonly Coil: number; // J/K, heat capacity of the oil (and what moves with it)
  readonly Cbody: number; // J/K, heat capacity of the tubes, rod and fittings
  readonly Gob: number; // W/K, oil-to-body conductance (internal convection over the wetted wall)
  readonly T0: number; // K
}

export interface TwoNodeRun {
  /** Sample times (s) with the oil and body temperatures there (K): segment ends and accepted steps. */
  readonly t: readonly number[];
  readonly oil: readonly number[];
  readonly body: readonly number[];
  /** First time the oil reaches `stopAt`, s, when asked and reached. */
  readonly tCross: number | undefined;
  /** Energy audit over the run, J: put in (∫P dt), shed by the body (∫Q dt), stored (ΣC·ΔT at the end). */
  readonly energyIn: number;
  readonly energyLost: number;
  readonly energyStored: number;
  /** Highest oil and body temperatures at the samples, K. */
  readonly oilPeak: number;
  readonly bodyPeak: number;
}

/**
 * Two-node warm-up: the damper's power heats the oil, the oil heats the body through G_ob, the body
 * sheds Q(T_b) to the air. Integrated piecewise like `bodyWarmUp` (one adaptive Dormand–Prince 5(4)
 * run per power segment, never across a switching time); energy put in and shed are integrated as
 * extra states so the run carries its own audit (stored + shed = put in).
 *
 * $$C_o\dot T_o = P(t,T_o) - G_{ob}(T_o - T_b),\qquad C_b\dot T_b = G_{ob}(T_o - T_b) - Q(T_b)$$
 *
 * `heating(P_i, T_o)` turns the segment's power into the power at the present oil temperature
 * (default: P_i itself; the damping-fade page passes the harmonic-stroke power at c(T_o)).
 * As G_ob → ∞ the oil follows the body and the one-node model C dT/dt = P − Q(T), C = C_o + C_b,
 * is recovered.
 *
 * @param Q heat shed by the body at its temperature, W (continuous)
 * @param b the two nodes: C_o, C_b (0, ∞) J/K, G_ob (0, ∞) W/K, T0 K
 * @param p power profile (one period when repeated); @param end 'repeat' | 'off'
 * @param tEnd end of the run, s, (0, ∞)
 * @param opts stopAt: stop where the oil first reaches it, K; heating: see above
 * @throws InputRangeError for bad inputs; ComputationError for more than MAX_BODY_SEGMENTS segments or
 *   when the integrator gives up (oil node far faster than the run: use one node)
 * @example twoNodeWarmUp((T) => 0.745664 * (T - 298.15), { Coil: 475, Cbody: 920, Gob: 1e3, T0: 298.15 }, { t: [0, 1e6], P: [150] }, 'off', 3600, { stopAt: 373.15 }).tCross // ≈ 871.453 s (matrix-exponential closed form 871.4526 s; the one-node model gives 872.8 s)
 * @source incropera2007 §5.3 lumped capacitance, energy balance per node (from memory); hairer1993 §II.4–II.6; dormand1980
 */
export function twoNodeWarmUp(
  Q: (Tb: number) => number, b: TwoNodeBody, p: PowerProfile, end: ProfileEnd, tEnd: number,
  opts: { readonly stopAt?: number | undefined; readonly heating?: ((P: number, Toil: number) => number) | undefined } = {},
): TwoNodeRun {
  const Co = requireInRange('Coil', b.Coil, POSITIVE, 'J/K');
  const Cb = requireInRange('Cbody', b.Cbody, POSITIVE, 'J/K');
  const G = requireInRange('Gob', b.Gob, POSITIVE, 'W/K');
  const T0 = requireInRange('T0', b.T0, POSITIVE, 'K');
  requireInRange('tEnd', tEnd, POSITIVE, 's');
  checkProfile(p);
  const n = p.P.length;
  const tp = p.t[n]!;
  const periods = end === 'repeat' ? Math.ceil(tEnd / tp) : 1;
  const segments = periods * n + (end === 'off' && tEnd > tp ? 1 : 0);
  if (segments > MAX_BODY_SEGMENTS) {
    throw new ComputationError(`the two-node model would need ${segments.toExponential(1)} power segments (at most ${MAX_BODY_SEGMENTS}): lengthen the duty period or shorten the time`);
  }
  // an explicit method needs about |λ_fast|·t/3 steps when the oil node is fast (stiff): refuse before integrating
  const tauFast = 1 / (G * (1 / Co + 1 / Cb));
  const stiff = () => new ComputationError(`the two-node run needs more than ${MAX_TWO_NODE_STEPS} steps: the oil follows the body within ${tauFast.toPrecision(2)} s (G_ob large against C_oil), far faster than the run; use one node, or the constant-UA model`);
  if (tEnd / (3 * tauFast) > MAX_TWO_NODE_STEPS) throw stiff();
  const heat = opts.heating ?? ((P: number) => P);
  const stopAt = opts.stopAt;
  const t: number[] = [0];
  const oil: number[] = [T0];
  const body: number[] = [T0];
  let oilPeak = T0;
  let bodyPeak = T0;
  const state = Float64Array.from([T0, T0, 0, 0]);
  let power = 0;
  const sys = {
    dim: 4,
    f(_t: number, s: Float64Array, d: Float64Array) {
      const h = heat(power, s[0]!);
      const q = G * (s[0]! - s[1]!);
      const loss = Q(s[1]!);
      d[0] = (h - q) / Co;
      d[1] = (q - loss) / Cb;
      d[2] = h;
      d[3] = loss;
    },
  };
  const eScale = 1e-6 * Math.max(1, maxOf(p.P)) * tp;
  let budget = MAX_TWO_NODE_STEPS;
  const opt = {
    rtol: 1e-9,
    atol: [1e-7, 1e-7, eScale, eScale],
    event: stopAt === undefined ? undefined : (_t: number, s: Float64Array) => stopAt - s[0]!,
    onStep: (st: { t1: number; y1: Float64Array }) => {
      t.push(st.t1); oil.push(st.y1[0]!); body.push(st.y1[1]!);
      oilPeak = Math.max(oilPeak, st.y1[0]!); bodyPeak = Math.max(bodyPeak, st.y1[1]!);
    },
  };
  const done = (tCross: number | undefined): TwoNodeRun => ({
    t, oil, body, tCross, energyIn: state[2]!, energyLost: state[3]!,
    energyStored: Co * (state[0]! - T0) + Cb * (state[1]! - T0), oilPeak, bodyPeak,
  });
  if (stopAt !== undefined && T0 >= stopAt) return done(0);
  let tc = 0;
  let hNext: number | undefined; // each segment starts at the step the last one ended with
  const run = (t1: number, P: number): boolean => {
    power = P;
    let r;
    try {
      r = integrateAdaptive(sys, tc, state, t1, { ...opt, maxSteps: budget, h0: hNext });
      hNext = r.hNext;
    } catch (e) {
      if (!(e instanceof ComputationError)) throw e;
      throw stiff();
    }
    budget -= r.stats.accepted + r.stats.rejected;
    state.set(r.y);
    tc = r.t;
    return r.stoppedByEvent;
  };
  for (let k = 0; k < periods && tc < tEnd; k++) {
    for (let i = 0; i < n && tc < tEnd; i++) {
      const t1 = Math.min(tEnd, k * tp + p.t[i + 1]!);
      if (!(t1 - tc > 1e-12 * Math.max(1, t1))) { tc = Math.max(tc, t1); continue; } // a sliver left by rounding
      if (run(t1, p.P[i]!)) return done(tc);
    }
  }
  if (tEnd - tc > 1e-12 * tEnd && run(tEnd, 0)) return done(tc); // 'off': no power after the profile
  return done(undefined);
}
