import { ComputationError } from '../errors.ts';
import { adaptiveSimpson } from '../numeric/adaptiveSimpson.ts';
import { freeResponse, type FreeOscillator } from './freeResponse.ts';

/** Energy bookkeeping of a free damped oscillator, sampled on a time grid (SI). */
export interface EnergyHistory {
  readonly t: number[]; // s
  readonly x: number[]; // m
  readonly v: number[]; // m/s
  readonly kinetic: number[]; // J
  readonly spring: number[]; // J
  readonly dissipated: number[]; // J, ∫ c v² dt
  readonly total: number[]; // J, kinetic + spring + dissipated
  readonly initial: number; // J
  /** max |total − initial| / initial over the grid (0 when initial = 0). */
  readonly closure: number;
}

/**
 * Samples x, v and the three energies of free motion on [0, tEnd]. The dissipated energy is
 * integrated independently of the closed form for the stored energy,
 *
 * $$E_D(t) = \int_0^t c\,\dot x^2\,d\tau$$
 *
 * by adaptive Simpson quadrature between samples (target 1e-10·E₀ per interval), so the
 * reported closure |E_k + E_s + E_D − E_0|/E_0 is a real audit of the response, not an identity.
 *
 * @param p oscillator (validated by freeResponse)
 * @param tEnd duration, s, (0, ∞)
 * @param samples number of grid points, ≥ 2
 * @source rao2017 §2.6 (energy of free damped motion; section from memory); lyness1969 (quadrature)
 */
export function energyHistory(p: FreeOscillator, tEnd: number, samples = 401): EnergyHistory {
  if (!(tEnd > 0 && Number.isFinite(tEnd))) throw new ComputationError(`duration must be positive, got ${tEnd}`);
  if (!(samples >= 2)) throw new ComputationError(`need at least 2 samples, got ${samples}`);
  const state = freeResponse(p);
  const initial = 0.5 * p.m * p.v0 * p.v0 + 0.5 * p.k * p.x0 * p.x0;
  const out: EnergyHistory = { t: [], x: [], v: [], kinetic: [], spring: [], dissipated: [], total: [], initial, closure: 0 };
  const dt = tEnd / (samples - 1);
  const tol = Math.max(initial, Number.MIN_VALUE) * 1e-10;
  const power = (t: number): number => {
    const { v } = state(t);
    return p.c * v * v;
  };
  let dissipated = 0;
  let worst = 0;
  for (let i = 0; i < samples; i++) {
    const t = i * dt;
    if (i > 0) dissipated += adaptiveSimpson(power, t - dt, t, tol, 30);
    const { x, v } = state(t);
    const ek = 0.5 * p.m * v * v;
    const es = 0.5 * p.k * x * x;
    const total = ek + es + dissipated;
    out.t.push(t); out.x.push(x); out.v.push(v);
    out.kinetic.push(ek); out.spring.push(es); out.dissipated.push(dissipated); out.total.push(total);
    if (initial > 0) worst = Math.max(worst, Math.abs(total - initial) / initial);
  }
  return { ...out, closure: worst };
}

/**
 * A time window that shows the interesting part of free motion: until the envelope has fallen
 * to about 1 % for damped motion, capped at 30 damped periods for very light damping.
 */
export function responseWindow(wn: number, zeta: number): number {
  if (zeta < 1) {
    const period = (2 * Math.PI) / (wn * Math.sqrt(1 - zeta * zeta));
    const decay = zeta > 0 ? Math.log(100) / (zeta * wn) : Infinity;
    return Math.min(Math.max(decay, 3 * period), 30 * period);
  }
  // the slowest root sets the creep back: ωn(ζ − √(ζ²−1)) written as ωn/(ζ + √(ζ²−1)),
  // which does not cancel for large ζ
  const slow = wn / (zeta + Math.sqrt(Math.max(zeta * zeta - 1, 0)));
  return Math.log(100) / slow;
}
