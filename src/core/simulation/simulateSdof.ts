import type { DamperLaw } from '../dampers/index.ts';
import { ComputationError, requireInRange } from '../errors.ts';
import { integrateAdaptive, type OdeStats, type OdeSystem } from '../ode/index.ts';
import { effectiveLoad, validateModel, type SdofModel } from './model.ts';
import { ED, RunRecorder, V, W, XD, Z, type SimulationHistory } from './recorder.ts';
import { seriesLaw } from './seriesLaw.ts';
import { stickRelease } from './stickRelease.ts';
import { timeDomainLaw } from './timeDomainLaw.ts';

/** Work limit: a run needing more steps is stiff or chattering and is refused, not left to hang a page. */
// bounds the work of one run (about a second in a browser); beyond it the inputs are refused
const MAX_STEPS = 100_000;

export interface SimulationOptions {
  /** Simulated time, s, (0, 1e5]. */
  readonly duration: number;
  /** Relative tolerance of the integrator, [1e-13, 1e-3], default 1e-9. */
  readonly rtol?: number;
  /** Number of evenly spaced samples for charts (0 = none), default 0. */
  readonly samples?: number;
}

export interface SimulationResult {
  readonly history: SimulationHistory;
  readonly E0: number; // initial energy, J
  readonly dissipated: number; // J, ∫F_d·ż dt
  readonly input: number; // J, ∫p·ż dt
  readonly finalEnergy: number; // J, kinetic + spring at the end
  readonly xEnd: number; // m
  readonly vEnd: number; // m/s
  /** max over the run of |E_k + E_s + E_D − W − E_0|, J. */
  readonly residual: number;
  /** max(E_0, largest stored energy, largest |input work|), J: what the residual is measured against. */
  readonly energyScale: number;
  /** residual / energyScale. */
  readonly closure: number;
  readonly xMax: number; // m, largest |z|
  readonly vMax: number; // m/s
  readonly forceMax: number; // N, largest |damper force|
  /** Largest |z| within the last reference period (settled amplitude under harmonic drive), m. */
  readonly xLastPeriod: number;
  /** Mean damper power over the last reference period (or the whole run if shorter), W. */
  readonly powerLastPeriod: number;
  /** Time spent stuck (Coulomb law), s. */
  readonly stuckTime: number;
  readonly stats: OdeStats & { segments: number };
  /** The law integrated (hysteretic replaced by its viscous equivalent). */
  readonly law: DamperLaw;
  /** Power law with α < 1: speed below which the force was taken linear, m/s (0 = not used). */
  readonly vLinear: number;
  /** Velocity scale the tolerances and v_ε refer to, m/s. */
  readonly vScale: number;
  readonly omegaRef: number; // rad/s
}

/**
 * Time response of an SDOF oscillator with a nonlinear damper, with an energy audit.
 *
 * $$m\ddot z + F_d(\dot z) + k z = p(t),\qquad \dot E_D = F_d(\dot z)\,\dot z,\qquad \dot W = p(t)\,\dot z$$
 * $$\text{residual}(t) = \tfrac12 m\dot z^2 + \tfrac12 k z^2 + E_D - W - E_0$$
 *
 * E_D and W are integrated as extra states by the same Dormand–Prince 5(4) steps, so the residual
 * measures the integration error, not an identity. Coulomb friction is not smoothed: the motion is
 * split at every velocity reversal (located on the dense output); there the mass sticks while
 * |p − kz| ≤ F_f and slides again, in the direction of p − kz, when that force exceeds F_f.
 * Hysteretic damping is replaced by c = ηk/ω_ref, and a power law with α < 1 is made linear below
 * a small speed v_ε (see timeDomainLaw). With a series stiffness k_s (model.ks) the damper's own
 * displacement x_d is a fifth state moved by the law's inverse, the damper force is k_s(z − x_d)
 * and ½k_s(z − x_d)² joins the stored energy of the audit (see seriesLaw). For base excitation z is
 * the relative motion, E_k = ½mż² its kinetic energy and W the work of the inertia load −mÿ.
 *
 * @example simulateSdof({ m: 1, k: 100, law: { kind: 'linear', c: 4 }, excitation: { kind: 'none' }, x0: 0.01, v0: 0 }, { duration: 1 }).xEnd // −1.36092e-3 m
 * @throws InputRangeError for a bad model or duration; ComputationError if the run needs more than
 *   300 000 steps (stiff) or 200 000 stick–slip segments (chattering)
 * @source hairer1993 §II.4–II.6 (integrator, dense output; from memory); chopra2017 §3.6, §3.8 (energy of an SDOF; from memory)
 */
export function simulateSdof(model: SdofModel, opts: SimulationOptions): SimulationResult {
  validateModel(model);
  const tEnd = requireInRange('duration', opts.duration, { min: 0, max: 1e5, minExclusive: true }, 's');
  const rtol = requireInRange('rtol', opts.rtol ?? 1e-9, { min: 1e-13, max: 1e-3 });
  const { m, k } = model;
  const wn = Math.sqrt(k / m);
  const ex = model.excitation;
  const omegaRef = ex.kind === 'none' ? wn : ex.omega;
  const p = effectiveLoad(model);
  const pAmp = ex.kind === 'force' ? ex.F0 : ex.kind === 'base' ? m * ex.Y * ex.omega * ex.omega : 0;

  // scales for the absolute tolerances: a length, its velocity and its energy. The driven
  // amplitude is taken as p_amp/max(k, mω²), the stiffness- or mass-controlled asymptote of the
  // linear response |H(ω)|·p_amp/k, which it never exceeds away from resonance (1/max(1, r²) ≤
  // 1/|1 − r²|): for base excitation far above resonance that is the base amplitude Y, where
  // p_amp/k = Y·r² was r² times too large and loosened atol by as much.
  // floor of 1 nm: below it the motion is of no engineering interest and tolerances would underflow
  const drive = ex.kind === 'none' ? 0 : pAmp / Math.max(k, m * ex.omega * ex.omega);
  const L = Math.max(Math.abs(model.x0), Math.abs(model.v0) / wn, drive, 1e-9);
  const vScale = L * Math.max(wn, omegaRef);
  const Escale0 = 0.5 * k * L * L;
  const ks = model.ks;
  const atol = [rtol * L, rtol * vScale, rtol * Escale0, rtol * Escale0, rtol * L];
  const sl = ks === undefined ? undefined : seriesLaw(model.law, ks, omegaRef, vScale, Math.max(wn, omegaRef));
  const td = sl ? { law: sl.law, force: (v: number) => v, vLinear: sl.vLinear } : timeDomainLaw(model.law, omegaRef, vScale, m, Math.max(wn, omegaRef));
  const law = td.law;
  const damper = td.force;
  // with a series spring the damper force is the spring's, k_s(z − x_d), and x_d moves at the law's inverse
  const springForce = (y: ArrayLike<number>) => ks! * (y[Z]! - y[XD]!);
  const seriesEnergy = ks === undefined ? undefined : (y: ArrayLike<number>) => 0.5 * ks * (y[Z]! - y[XD]!) ** 2;
  const coulomb = law.kind === 'coulomb' ? law.Ff : 0;
  const periodRef = (2 * Math.PI) / omegaRef;
  const hMax = Math.min((2 * Math.PI) / wn, periodRef) / 8;

  let slip = 0; // Coulomb: +1/−1 sliding direction, 0 stuck
  const forceAt = (t: number, y: ArrayLike<number>): number => {
    if (sl) return springForce(y);
    if (!coulomb) return damper(y[V]!);
    return slip !== 0 ? slip * coulomb : p(t) - k * y[Z]!; // while stuck the friction holds p − kz
  };
  const E0 = 0.5 * m * model.v0 ** 2 + 0.5 * k * model.x0 ** 2;
  const rec = new RunRecorder(m, k, E0, tEnd, Math.max(0, Math.floor(opts.samples ?? 0)), tEnd - periodRef, forceAt, seriesEnergy);
  const sys: OdeSystem = {
    dim: sl ? 5 : 4,
    f(t, y, dy) {
      const v = y[V]!;
      const fd = sl ? springForce(y) : coulomb ? slip * coulomb : damper(v);
      const load = p(t);
      dy[Z] = v;
      dy[V] = (load - fd - k * y[Z]!) / m;
      if (sl) { dy[XD] = sl.velocity(fd); dy[ED] = fd * dy[XD]!; } else dy[ED] = fd * v;
      dy[W] = load * v;
    },
  };
  const decide = (t: number, z: number): number => {
    const g = p(t) - k * z;
    return Math.abs(g) <= coulomb ? 0 : Math.sign(g);
  };

  let t = 0;
  // a series spring starts relaxed: the damper holds the initial displacement
  let y: Float64Array = Float64Array.from(sl ? [model.x0, model.v0, 0, 0, model.x0] : [model.x0, model.v0, 0, 0]);
  if (coulomb) slip = model.v0 !== 0 ? Math.sign(model.v0) : decide(0, model.x0);
  rec.start(y);
  const stats = { accepted: 0, rejected: 0, evaluations: 0, segments: 0 };
  let stuckTime = 0;
  while (t < tEnd) {
    if (++stats.segments > 200_000) throw new ComputationError('simulation: more than 200 000 stick–slip transitions (chattering)');
    if (coulomb && slip === 0) {
      const z = y[Z]!;
      const tr = stickRelease((s) => p(s) - k * z, coulomb, t, tEnd, periodRef / 200);
      const tStop = Math.min(tr, tEnd);
      rec.hold(t, tStop, y);
      stuckTime += tStop - t;
      t = tStop;
      if (tr >= tEnd) break;
      slip = Math.sign(p(t) - k * z);
      continue;
    }
    const left = MAX_STEPS - stats.accepted - stats.rejected;
    const budgetError = (at: number) => new ComputationError(`simulation: more than ${MAX_STEPS.toLocaleString('en-GB').replace(/,/g, ' ')} integration steps in all before t = ${tEnd} s (stopped at t = ${at.toPrecision(6)} s, ${stats.segments} stick–slip phases): shorten the duration or lower the excitation frequency${ks !== undefined ? '; a series stiffness far stiffer than the damper (small c/k_s) needs tiny steps: leave ks empty for a rigid connection' : ''}`);
    if (left <= 0) throw budgetError(t);
    let sol;
    try {
      sol = integrateAdaptive(sys, t, y, tEnd, {
        rtol, atol, hMax, maxSteps: left, onStep: (s) => rec.step(s),
        event: coulomb ? (_t, s) => slip * s[V]! : undefined,
      });
    } catch (e) {
      // the integrator counts only this phase's steps; say what ran out: the budget of the whole run
      if (e instanceof ComputationError && /^ODE: more than/.test(e.message)) throw budgetError(Number(/stopped at t = ([^ ]+) s/.exec(e.message)?.[1] ?? t));
      throw e;
    }
    stats.accepted += sol.stats.accepted; stats.rejected += sol.stats.rejected; stats.evaluations += sol.stats.evaluations;
    t = sol.t;
    y = sol.y;
    if (sol.stoppedByEvent) {
      y[V] = 0; // the reversal is located to round-off; pin the velocity to exactly zero
      slip = decide(t, y[Z]!);
    }
  }
  rec.finish(y);

  const energyScale = Math.max(E0, rec.maxStored, rec.maxInput);
  return {
    history: rec.history, E0, dissipated: y[ED]!, input: y[W]!,
    finalEnergy: 0.5 * m * y[V]! ** 2 + 0.5 * k * y[Z]! ** 2 + (seriesEnergy ? seriesEnergy(y) : 0), xEnd: y[Z]!, vEnd: y[V]!,
    residual: rec.residual, energyScale, closure: energyScale > 0 ? rec.residual / energyScale : 0,
    xMax: rec.xMax, vMax: rec.vMax, forceMax: rec.forceMax, xLastPeriod: rec.xLast,
    powerLastPeriod: (y[ED]! - rec.edAtLastFrom) / (tEnd - Math.max(0, rec.tLastFrom)),
    stuckTime, stats, law, vLinear: td.vLinear, vScale, omegaRef,
  };
}
