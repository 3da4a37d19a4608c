import { ComputationError, InputRangeError, POSITIVE, requireInRange } from '../errors.ts';
import { denseCoefficients, evalDense } from './denseOutput.ts';
import { DORMAND_PRINCE_54 } from './dormandPrince.ts';
import { errorNorm } from './errorNorm.ts';
import { eulerStepBound, initialStep } from './initialStep.ts';
import { rkStep, stepWork } from './rkStep.ts';
import type { OdeStats, OdeSystem } from './system.ts';
import type { EmbeddedTableau } from './tableau.ts';

/** An accepted step, handed to `onStep`; the arrays are reused, copy what you keep. */
export interface AcceptedStep {
  readonly t0: number;
  readonly t1: number;
  readonly y0: Float64Array;
  readonly y1: Float64Array;
  /** State at t0 + θ(t1 − t0), θ ∈ [0, 1], from the continuous extension. */
  interpolate(theta: number, out: Float64Array): void;
}

export interface AdaptiveOptions {
  /** Relative tolerance, (0, 0.1]. */
  readonly rtol: number;
  /** Absolute tolerance, one value or one per component (unit of that component), > 0. */
  readonly atol: number | ArrayLike<number>;
  readonly hMax?: number;
  readonly maxSteps?: number;
  /**
   * First step to try, s (> 0). A run continued from an earlier one (the next power segment) passes
   * that run's `hNext`: the step that was working, instead of two evaluations that guess one.
   */
  readonly h0?: number | undefined;
  readonly tableau?: EmbeddedTableau;
  /**
   * Terminal event: integration stops at the first point where g(t, y) turns negative (g ≥ 0 at
   * the start). The point is located on the continuous extension by bisection to round-off, and
   * the state there is recomputed by one step of the method from the start of the step.
   */
  readonly event?: ((t: number, y: Float64Array) => number) | undefined;
  readonly onStep?: (step: AcceptedStep) => void;
  /**
   * Checked after every accepted step (after `onStep`): true ends the run there, at that step's end
   * (`stoppedEarly`). For a caller that can finish the interval another way (a settled state).
   */
  readonly stopAfter?: ((t: number, y: Float64Array) => boolean) | undefined;
}

export interface AdaptiveSolution {
  /** Where integration stopped: tEnd, or the event time. */
  readonly t: number;
  readonly y: Float64Array;
  readonly stoppedByEvent: boolean;
  /** `stopAfter` ended the run before tEnd. */
  readonly stoppedEarly?: boolean;
  readonly stats: OdeStats;
  /** The step size the controller proposed next, s: `h0` for a run that continues this one. */
  readonly hNext: number;
}

/**
 * Integrates y' = f(t, y) from t0 to tEnd with an embedded Runge–Kutta pair and step-size
 * control (default Dormand–Prince 5(4)); error per unit step is kept near the scaled tolerance.
 *
 * $$h_{new} = h\cdot\min\!\left(f_{max},\ \max\!\left(0.2,\ 0.9\,\|\mathrm{err}\|^{-1/(\hat p+1)}\right)\right)$$
 * with f_max = 10, and 1 right after a rejected step.
 *
 * @param sys the system
 * @param t0 start time, s
 * @param y0 initial state (not modified)
 * @param tEnd end time, s, > t0
 * @throws InputRangeError for bad tolerances; ComputationError when the step size underflows or
 *   `maxSteps` is exceeded (the problem is stiff or singular at these tolerances)
 * @example integrateAdaptive({ dim: 1, f: (t, y, d) => { d[0] = -y[0]; } }, 0, [1], 1, { rtol: 1e-10, atol: 1e-12 }).y[0] // 0.3678794 (e^{-1})
 * @source hairer1993 §II.4, eqs. (4.12)–(4.13) (from memory); dormand1980
 */
export function integrateAdaptive(sys: OdeSystem, t0: number, y0: ArrayLike<number>, tEnd: number, opts: AdaptiveOptions): AdaptiveSolution {
  const tab = opts.tableau ?? DORMAND_PRINCE_54;
  const n = sys.dim;
  requireInRange('rtol', opts.rtol, { min: 0, max: 0.1, minExclusive: true });
  if (!(tEnd > t0)) throw new InputRangeError('tEnd', tEnd, { min: t0, max: Infinity, minExclusive: true, maxExclusive: true }, 's');
  const atol = new Float64Array(n);
  for (let i = 0; i < n; i++) atol[i] = requireInRange('atol', typeof opts.atol === 'number' ? opts.atol : opts.atol[i]!, POSITIVE);
  const hMax = opts.hMax ?? tEnd - t0;
  const maxSteps = opts.maxSteps ?? 1_000_000;
  const stats: OdeStats = { accepted: 0, rejected: 0, evaluations: 0 };
  const w = stepWork(tab, n);
  const s = tab.c.length;
  const y = Float64Array.from(y0);
  const yPrev = new Float64Array(n);
  const yEv = new Float64Array(n);
  let t = t0;
  sys.f(t, y, w.k[0]!);
  stats.evaluations++;
  let h: number;
  if (opts.h0 !== undefined) h = Math.min(requireInRange('h0', opts.h0, POSITIVE, 's'), hMax, eulerStepBound(y, w.k[0]!, opts.rtol, atol));
  else { h = initialStep(sys, t, y, w.k[0]!, tab.order, opts.rtol, atol, hMax); stats.evaluations++; }
  // what the controller wanted before a last step was cut to end exactly at tEnd
  let hWanted = h;
  const expo = 1 / (tab.embeddedOrder + 1);
  let rejectedLast = false;
  let hStep = 0;
  // dense-output coefficients of the last accepted step, computed on first use
  const dense = new Float64Array(5 * n);
  let denseReady = false;
  const interp = (theta: number, out: Float64Array): void => {
    if (!denseReady) { denseCoefficients(tab, yPrev, y, w.k, hStep, dense); denseReady = true; }
    evalDense(dense, theta, out);
  };
  // one object for every accepted step, its times set before it is handed out (no getters on the hot path)
  const step: { t0: number; t1: number; readonly y0: Float64Array; readonly y1: Float64Array; readonly interpolate: AcceptedStep['interpolate'] } = {
    t0: t, t1: t, y0: yPrev, y1: y, interpolate: interp,
  };

  while (t < tEnd) {
    if (stats.accepted + stats.rejected >= maxSteps) throw new ComputationError(`ODE: more than ${maxSteps} steps before t = ${tEnd} s (stopped at t = ${t.toPrecision(6)} s)`);
    // stretch a step by up to 1 % to land on tEnd rather than leave a sliver below the round-off of t
    const last = t + 1.01 * h >= tEnd;
    hWanted = h;
    if (last) h = tEnd - t;
    if (!(h > Math.abs(t) * 1e-14 + 1e-300)) throw new ComputationError(`ODE: step size underflow at t = ${t.toPrecision(6)} s`);
    stats.evaluations += rkStep(tab, sys, t, y, h, w);
    const e = errorNorm(w.err, y, w.yNew, opts.rtol, atol);
    if (!Number.isFinite(e)) { h *= 0.2; stats.rejected++; rejectedLast = true; continue; }
    if (e > 1) {
      h *= Math.max(0.2, 0.9 * Math.pow(e, -expo));
      stats.rejected++;
      rejectedLast = true;
      continue;
    }
    stats.accepted++;
    yPrev.set(y);
    const tPrev = t;
    y.set(w.yNew);
    t = last ? tEnd : t + h;
    hStep = t - tPrev;
    denseReady = false;
    if (opts.event && opts.event(t, y) < 0) {
      const thEv = locate(opts.event, tPrev, hStep, interp, yEv);
      const tEv = tPrev + thEv * hStep;
      // report the part of the step up to the event, re-parametrised so θ = 1 is the event
      // the state at the event: one fresh step of size θh from the step start (order 5, where the
      // interpolant is order 4); the interpolant still serves points inside the partial step
      const yAt = Float64Array.from(yEv);
      if (thEv > 0) {
        const w2 = stepWork(tab, n);
        sys.f(tPrev, yPrev, w2.k[0]!);
        stats.evaluations += 1 + rkStep(tab, sys, tPrev, yPrev, thEv * hStep, w2);
        yAt.set(w2.yNew);
      }
      opts.onStep?.({
        t0: tPrev, t1: tEv, y0: yPrev, y1: yAt,
        interpolate: (theta, out) => interp(theta * thEv, out),
      });
      return { t: tEv, y: yAt, stoppedByEvent: true, stats, hNext: hStep };
    }
    step.t0 = tPrev; step.t1 = t;
    opts.onStep?.(step);
    if (opts.stopAfter && t < tEnd && opts.stopAfter(t, y)) return { t, y, stoppedByEvent: false, stoppedEarly: true, stats, hNext: hStep };
    if (tab.fsal) w.k[0]!.set(w.k[s - 1]!);
    else { sys.f(t, y, w.k[0]!); stats.evaluations++; }
    const grow = rejectedLast ? 1 : 10;
    h = Math.min(hMax, h * Math.min(grow, Math.max(0.2, 0.9 * Math.pow(Math.max(e, 1e-10), -expo))));
    rejectedLast = false;
    if (t >= tEnd) h = Math.max(h, Math.min(hWanted, hMax)); // a cut last step says nothing about the step size
  }
  return { t, y, stoppedByEvent: false, stats, hNext: h };
}

/** Bisection on θ for the first sign change of g from ≥ 0 to < 0 inside the last step; returns θ. */
function locate(g: (t: number, y: Float64Array) => number, t0: number, h: number, interp: (th: number, out: Float64Array) => void, out: Float64Array): number {
  let lo = 0;
  let hi = 1;
  for (let it = 0; it < 60 && hi - lo > 1e-15; it++) {
    const mid = 0.5 * (lo + hi);
    interp(mid, out);
    if (g(t0 + mid * h, out) < 0) hi = mid;
    else lo = mid;
  }
  interp(hi, out);
  return hi;
}
