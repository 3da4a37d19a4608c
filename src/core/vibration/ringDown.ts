import { ComputationError } from '../errors.ts';
import { linearFit } from '../records/linearFit.ts';
import { decayPeaks, HEAVY_DAMPING_NOTE, type DecayPeak } from './decayPeaks.ts';

export interface RingDownFit {
  /** damping ratio */ readonly zeta: number;
  /** decay rate σ = ζω_n, 1/s */ readonly sigma: number;
  /** damped circular frequency, rad/s */ readonly wd: number;
  /** undamped circular frequency √(σ² + ω_d²), rad/s */ readonly wn: number;
  /** logarithmic decrement per cycle σ·T_d */ readonly delta: number;
  /** R² of the weighted line through ln(half peak-to-peak) against time */ readonly r2: number;
  /** extrema used */ readonly peaks: readonly DecayPeak[];
  /** equilibrium (offset) of the record, same unit as the signal */ readonly offset: number;
  /** peak envelope: |y − offset| at the extrema ≈ envelope(t) */ readonly envelope: (t: number) => number;
  readonly noise: number;
}

/**
 * Damping of a linear oscillator from a free-decay (ring-down) record.
 *
 * Successive extrema of $y = y_0 + C e^{-\sigma t}\cos(\omega_d t+\phi)$ are half a damped
 * period apart, so the half peak-to-peak amplitude of consecutive extrema is
 * $$a_i = \tfrac12|p_{i+1}-p_i| = C\cosh(\sigma T_d/4)\,e^{-\sigma t_{mid,i}},$$
 * free of the offset $y_0$. A weighted least-squares line through $\ln a_i$ against
 * $t_{mid,i}$ (weights $a_i^2$, since noise of fixed size spoils small peaks most) gives σ; a
 * line through the peak times against their index gives $T_d/2$; then
 * $$\omega_n = \sqrt{\sigma^2+\omega_d^2},\qquad \zeta = \sigma/\omega_n,\qquad \delta = \sigma T_d.$$
 * Holds for displacement, velocity or acceleration records alike (same σ and ω_d).
 *
 * @param t times, s, strictly increasing
 * @param y signal samples
 * @throws ComputationError naming the cause: fewer than 4 usable extrema (3 half-cycle amplitudes),
 *   or amplitudes that do not decay significantly
 * @example ((t) => ringDown(t, t.map((s) => Math.exp(-2 * s) * Math.cos(Math.sqrt(96) * s))))(Array.from({ length: 400 }, (_, i) => i * 0.005)).zeta // 0.2000 (m = 1 kg, k = 100 N/m, c = 4 N·s/m: σ = 2, ω_d = √96)
 * @source rao2017 §2.6.3 (logarithmic decrement, section from memory); press2007 §15.2 (weighted line)
 */
export function ringDown(t: readonly number[], y: readonly number[]): RingDownFit {
  const found = decayPeaks(t, y);
  const p = found.peaks;
  if (p.length < 4) {
    throw new ComputationError(`found ${p.length} usable peaks (need at least 4, i.e. 3 half cycles): the record is too short, ${HEAVY_DAMPING_NOTE} or too noisy`);
  }
  const tm: number[] = [];
  const la: number[] = [];
  const w: number[] = [];
  for (let i = 0; i + 1 < p.length; i++) {
    const a = 0.5 * Math.abs(p[i + 1]!.y - p[i]!.y);
    tm.push(0.5 * (p[i]!.t + p[i + 1]!.t));
    la.push(Math.log(a));
    w.push(a * a);
  }
  const decay = linearFit(tm, la, w);
  const sigma = -decay.slope;
  if (!(sigma > 0) || sigma <= 2 * decay.slopeStdError) {
    throw new ComputationError(`the peak amplitudes do not decay (fitted rate ${sigma.toPrecision(3)} ± ${decay.slopeStdError.toPrecision(2)} 1/s): not a free decay, or a self-excited or forced record`);
  }
  const timing = linearFit(p.map((_, i) => i), p.map((q) => q.t));
  const Td = 2 * timing.slope;
  const wd = (2 * Math.PI) / Td;
  const wn = Math.hypot(sigma, wd);
  const scale = Math.exp(decay.intercept) / Math.cosh((sigma * Td) / 4);
  const envelope = (tt: number) => scale * Math.exp(-sigma * tt);
  const offset = p.reduce((s, q) => s + (q.y - q.sign * envelope(q.t)), 0) / p.length;
  return { zeta: sigma / wn, sigma, wd, wn, delta: sigma * Td, r2: decay.r2, peaks: p, offset, envelope, noise: found.noise };
}
