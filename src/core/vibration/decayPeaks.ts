import { ComputationError } from '../errors.ts';
import { quadraticPeak } from '../records/quadraticPeak.ts';

export interface DecayPeak {
  /** time of the refined extremum, s */ readonly t: number;
  /** refined value, as recorded (offset included) */ readonly y: number;
  /** +1 for a maximum, −1 for a minimum */ readonly sign: 1 | -1;
  /** index of the raw sample extremum */ readonly index: number;
}

export interface DecayPeaks {
  readonly peaks: readonly DecayPeak[];
  /** centreline used for the zero crossings (mean over whole cycles), same unit as y */ readonly centre: number;
  /** noise estimate: median RMS residual of the local parabola fits, same unit as y */ readonly noise: number;
  /** half of the damped period from the coarse pass, s */ readonly halfPeriod: number;
}

/**
 * Heaviest damping at which clean records still give enough peaks, measured on noise-free
 * synthetic records (20 to 1000 samples per cycle, 3 to 12 periods; test/core/vibration/
 * ringDownLimit.test.ts re-measures them): released from rest (x₀, ẋ₀ = 0) the coarse pass finds
 * too few peaks above 5 % of the release excursion from ζ ≈ 0.215; started by a tap (x₀ = 0, ẋ₀)
 * too few usable peaks remain from ζ ≈ 0.30. Messages quote these, rounded down.
 */
export const RING_DOWN_ZETA_LIMIT = { release: 0.21, tap: 0.3 } as const;
/** The part of a refusal message that says how heavy a damping is too heavy. */
export const HEAVY_DAMPING_NOTE = `too heavily damped (clean records fail from ζ ≈ ${RING_DOWN_ZETA_LIMIT.release} when released from rest, ζ ≈ ${RING_DOWN_ZETA_LIMIT.tap} when started by a tap)`;

interface Lobe { readonly sign: 1 | -1; readonly from: number; readonly to: number }

/** Lobes between hysteresis crossings of ±h about the centre: one extremum per half cycle. */
function lobes(y: readonly number[], centre: number, h: number): Lobe[] {
  const out: Lobe[] = [];
  let state: 0 | 1 | -1 = 0;
  let start = 0;
  for (let i = 0; i < y.length; i++) {
    const v = y[i]! - centre;
    const s: 0 | 1 | -1 = v > h ? 1 : v < -h ? -1 : 0;
    if (s !== 0 && s !== state) {
      if (state !== 0) out.push({ sign: state, from: start, to: i });
      state = s;
      start = i;
    }
  }
  return out; // the lobe after the last crossing is incomplete and left out
}

function extremumIndex(y: readonly number[], lobe: Lobe): number {
  let best = lobe.from;
  for (let i = lobe.from; i < lobe.to; i++) if (lobe.sign * y[i]! > lobe.sign * y[best]!) best = i;
  return best;
}

function window(t: readonly number[], centre: number, half: number): [number, number] {
  let a = centre;
  let b = centre;
  while (a > 0 && t[centre]! - t[a - 1]! <= half) a--;
  while (b < t.length - 1 && t[b + 1]! - t[centre]! <= half) b++;
  return [a, b];
}

const median = (v: number[]): number => {
  const s = [...v].sort((p, q) => p - q);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : 0.5 * (s[m - 1]! + s[m]!);
};

/** Mean over an even number of coarse lobes (whole cycles); a fallback for short records. */
function wholeCycleMean(y: readonly number[], coarse: readonly Lobe[], fallback: number): number {
  const first = coarse[0]!.from;
  const last = coarse[coarse.length - (coarse.length % 2) - 1]!.to;
  return last - first > 4 ? y.slice(first, last).reduce((s, v) => s + v, 0) / (last - first) : fallback;
}

/**
 * Equilibrium from three consecutive extrema: they follow p_k = y_0 + C q^k (q = −e^{−σT_d/2}), so
 * Aitken's Δ² gives y_0 exactly, $y_0 = (p_0 p_2 - p_1^2)/(p_0 + p_2 - 2p_1)$; the median over the
 * triples resists noise. Undefined with fewer than three unclipped coarse extrema.
 */
function equilibrium(t: readonly number[], y: readonly number[], coarse: readonly Lobe[], idx: readonly number[], half: number): number | undefined {
  const p: number[] = [];
  idx.forEach((k, i) => {
    if (t[k]! - t[0]! < half / 4 || t[t.length - 1]! - t[k]! < half / 4) return;
    const [a, b] = window(t, k, half / 4);
    p.push(quadraticPeak(t.slice(a, b + 1), y.slice(a, b + 1), coarse[i]!.sign).y);
  });
  const est: number[] = [];
  for (let i = 0; i + 2 < p.length; i++) {
    const den = p[i]! + p[i + 2]! - 2 * p[i + 1]!;
    if (den !== 0) est.push((p[i]! * p[i + 2]! - p[i + 1]! * p[i + 1]!) / den);
  }
  return est.length > 0 ? median(est) : undefined;
}

/**
 * Finds the alternating extrema of a free-decay record, one per half cycle, guarding against
 * noise: an extremum counts only between two crossings of a hysteresis band about the centreline
 * (so noise near zero cannot split a half cycle), and each extremum is refined by a least-squares
 * parabola over ±1/8 of a period. Extrema are kept from the first complete lobe while they stay
 * above 8× the noise and 1 % of the largest excursion and keep the half-period spacing.
 *
 * @param t times, s, strictly increasing (uneven spacing allowed)
 * @param y recorded displacement, velocity or acceleration
 * @throws ComputationError for a flat record or one without two complete half cycles
 * @example ((t) => decayPeaks(t, t.map((s) => Math.exp(-2 * s) * Math.cos(Math.sqrt(96) * s))))(Array.from({ length: 400 }, (_, i) => i * 0.005)).peaks.length // 5 (one extremum per usable half cycle of 2 s at T_d = 0.641 s)
 * @source common practice, no source (hysteresis crossing detection); press2007 §15.4 (parabola fit)
 */
export function decayPeaks(t: readonly number[], y: readonly number[]): DecayPeaks {
  const n = y.length;
  if (n < 8) throw new ComputationError(`the record has ${n} samples; a ring-down needs many samples per cycle`);
  let centre = y.reduce((s, v) => s + v, 0) / n;
  const A = y.reduce((m, v) => Math.max(m, Math.abs(v - centre)), 0); // no spread: records reach 200 000 samples
  if (!(A > 0)) throw new ComputationError('the record is flat: no oscillation to analyse');
  // coarse passes: large lobes give the half period and the equilibrium; the second pass
  // repeats the first about the improved centreline
  let coarse: Lobe[] = [];
  let idx: number[] = [];
  let half = 0;
  for (let pass = 0; pass < 2; pass++) {
    coarse = lobes(y, centre, 0.05 * A).filter((l) => {
      const k = extremumIndex(y, l);
      return k > 0 && k < n - 1; // the record starts or ends inside this lobe
    });
    if (coarse.length < 2) throw new ComputationError(`found fewer than 3 peaks above 5 % of the largest excursion: the record does not show a ring-down (too short, ${HEAVY_DAMPING_NOTE}, or not an oscillation)`);
    idx = coarse.map((l) => extremumIndex(y, l));
    half = median(idx.slice(1).map((k, i) => t[k]! - t[idx[i]!]!));
    centre = equilibrium(t, y, coarse, idx, half) ?? wholeCycleMean(y, coarse, centre);
  }
  // noise from narrow parabola fits at the coarse peaks (model error there is ≪ noise)
  const rms: number[] = [];
  idx.forEach((k, i) => {
    const [a, b] = window(t, k, half / 8);
    if (b - a + 1 >= 6) rms.push(quadraticPeak(t.slice(a, b + 1), y.slice(a, b + 1), coarse[i]!.sign).rms);
  });
  const noise = rms.length > 0 ? median(rms) : 0;
  // fine pass
  const h = Math.min(0.05 * A, Math.max(4 * noise, 0.005 * A));
  const floor = Math.max(8 * noise, 0.01 * A);
  const peaks: DecayPeak[] = [];
  for (const lobe of lobes(y, centre, h)) {
    const k = extremumIndex(y, lobe);
    const [a, b] = window(t, k, half / 4);
    const clipped = t[k]! - t[0]! < half / 4 || t[n - 1]! - t[k]! < half / 4;
    if (clipped) { if (peaks.length === 0) continue; else break; }
    const p = quadraticPeak(t.slice(a, b + 1), y.slice(a, b + 1), lobe.sign);
    if (Math.abs(p.y - centre) < floor) break;
    const prev = peaks[peaks.length - 1];
    if (prev && (p.t - prev.t < 0.6 * half || p.t - prev.t > 1.4 * half)) break;
    peaks.push({ t: p.t, y: p.y, sign: lobe.sign, index: k });
  }
  return { peaks, centre, noise, halfPeriod: half };
}
