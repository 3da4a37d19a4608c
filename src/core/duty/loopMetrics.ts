/**
 * Loop metrics of a measured force–displacement record, cycle by cycle: the quantities a
 * prototype test of a seismic damper or isolator reports (energy per loop, effective stiffness,
 * effective damping, force at zero displacement, loop fullness, cycle-to-cycle spread).
 */
import { ComputationError, InputRangeError } from '../errors.ts';

export interface CycleLoop {
  /** ∮F dx, J. */
  readonly Eloop: number;
  /** Displacement extremes from the cycle's mid-stroke, m (Δ⁻ negative). */
  readonly dPlus: number;
  readonly dMinus: number;
  /** Forces at those extremes, N. */
  readonly FPlus: number;
  readonly FMinus: number;
  /** |F| where the displacement passes zero moving +x (extending) and −x, N (mean of the crossings). */
  readonly F0up: number;
  readonly F0down: number;
  readonly keff: number;
  /** Undefined when the loop has almost no force at the stroke ends (a velocity-only damper: k_eff → 0). */
  readonly betaEff: number | undefined;
  readonly fullness: number;
}

export interface LoopMetrics {
  readonly cycles: CycleLoop[];
  /** Means over the cycles. */
  readonly Eloop: number;
  readonly keff: number;
  /** Undefined when any cycle's is (see CycleLoop). */
  readonly betaEff: number | undefined;
  readonly F0: number;
  readonly F0up: number;
  readonly F0down: number;
  readonly fullness: number;
  /** Largest |E_i − Ē|/Ē over the cycles (0 for one cycle). */
  readonly EloopDevMax: number;
}

/** Mean end force below this fraction of the peak force: β_eff is not reported. */
export const BETA_MIN_END_FORCE = 0.05;

/** Vertex of the parabola through three samples of x(t), and F interpolated on the same parabola in t. */
function vertex(t: ArrayLike<number>, x: ArrayLike<number>, F: ArrayLike<number>, i: number, lo: number, hi: number): { x: number; F: number } {
  if (i <= lo || i >= hi) return { x: x[i]!, F: F[i]! };
  const t0 = t[i - 1]!, t1 = t[i]!, t2 = t[i + 1]!;
  const lag = (y0: number, y1: number, y2: number, s: number) =>
    (y0 * (s - t1) * (s - t2)) / ((t0 - t1) * (t0 - t2)) + (y1 * (s - t0) * (s - t2)) / ((t1 - t0) * (t1 - t2)) + (y2 * (s - t0) * (s - t1)) / ((t2 - t0) * (t2 - t1));
  // x = a s² + b s + c through the three points; vertex at −b/2a (kept inside the bracket)
  const d1 = (x[i]! - x[i - 1]!) / (t1 - t0), d2 = (x[i + 1]! - x[i]!) / (t2 - t1);
  const a = (d2 - d1) / (t2 - t0);
  if (a === 0) return { x: x[i]!, F: F[i]! };
  const s = Math.min(t2, Math.max(t0, (t0 + t1) / 2 - d1 / (2 * a)));
  return { x: lag(x[i - 1]!, x[i]!, x[i + 1]!, s), F: lag(F[i - 1]!, F[i]!, F[i + 1]!, s) };
}

function cycleLoop(t: ArrayLike<number>, xr: ArrayLike<number>, F: ArrayLike<number>, a: number, b: number): CycleLoop {
  let lo = Infinity, hi = -Infinity, iMax = a, iMin = a, Fmax = 0;
  for (let i = a; i <= b; i++) {
    if (xr[i]! > hi) { hi = xr[i]!; iMax = i; }
    if (xr[i]! < lo) { lo = xr[i]!; iMin = i; }
    Fmax = Math.max(Fmax, Math.abs(F[i]!));
  }
  const mid = (hi + lo) / 2;
  let E = 0, up = 0, nUp = 0, down = 0, nDown = 0;
  for (let i = a + 1; i <= b; i++) {
    const x0 = xr[i - 1]! - mid, x1 = xr[i]! - mid;
    E += 0.5 * (F[i]! + F[i - 1]!) * (x1 - x0);
    if ((x0 < 0 && x1 >= 0) || (x0 > 0 && x1 <= 0)) {
      const f = F[i - 1]! + ((F[i]! - F[i - 1]!) * (0 - x0)) / (x1 - x0);
      if (x1 > x0) { up += Math.abs(f); nUp++; } else { down += Math.abs(f); nDown++; }
    }
  }
  const p = vertex(t, xr, F, iMax, a, b), m = vertex(t, xr, F, iMin, a, b);
  const dPlus = p.x - mid, dMinus = m.x - mid;
  const span = Math.abs(dPlus) + Math.abs(dMinus);
  if (!(span > 0) || !(Fmax > 0)) throw new ComputationError('a detected cycle has no stroke or no force: loop metrics need a moving, loaded damper');
  const keff = (Math.abs(p.F) + Math.abs(m.F)) / span;
  const D = span / 2;
  return {
    Eloop: E, dPlus, dMinus, FPlus: p.F, FMinus: m.F,
    F0up: nUp ? up / nUp : 0, F0down: nDown ? down / nDown : 0,
    keff,
    // β_eff = E/(2π k_eff Δ²) grows without bound as a purely viscous loop's k_eff → 0; below
    // 5 % of F_max at the stroke ends (β_eff ≳ 10 for an elliptical loop) it means nothing: sensor
    // ripple or friction alone would set k_eff
    betaEff: (Math.abs(p.F) + Math.abs(m.F)) / 2 > BETA_MIN_END_FORCE * Fmax ? E / (2 * Math.PI * keff * D * D) : undefined,
    fullness: E / (4 * Fmax * D),
  };
}

/**
 * Displacement of a velocity-only record for the loop: trapezoid integral of v within each
 * segment from 0 (loop metrics measure each cycle from its own mid-stroke, so the constant of
 * integration does not matter).
 */
export function loopDisplacement(t: ArrayLike<number>, v: ArrayLike<number>, ranges: readonly (readonly [number, number])[]): Float64Array {
  const x = new Float64Array(t.length);
  for (const [a, b] of ranges) for (let i = a + 1; i < b; i++) x[i] = x[i - 1]! + 0.5 * (v[i]! + v[i - 1]!) * (t[i]! - t[i - 1]!);
  return x;
}

/**
 * Loop metrics per cycle and their means.
 *
 * $$E_{loop} = \oint F\,dx,\quad k_{eff} = \frac{|F^+| + |F^-|}{|\Delta^+| + |\Delta^-|},\quad
 *   \beta_{eff} = \frac{E_{loop}}{2\pi k_{eff} \Delta^2} = \frac{2}{\pi}\frac{E_{loop}}{k_{eff}(|\Delta^+|+|\Delta^-|)^2},\quad
 *   \text{fullness} = \frac{E_{loop}}{4 F_{max} \Delta}$$
 * with Δ = (|Δ⁺| + |Δ⁻|)/2 measured from the cycle's mid-stroke; ∮F dx by the trapezoid rule
 * (exact for the elastic part kx over a closed cycle); Δ± and F± at the vertex of the parabola
 * through the three samples around each extreme (a sampled extreme sits up to half a step from
 * the true one, where a viscous force is not zero); F₀ linearly interpolated at each zero crossing.
 *
 * @param t times, s (increasing); x displacement, m; F force, N (same length)
 * @param cycles index ranges [start, end] (end inclusive, usually the next cycle's start)
 * @throws InputRangeError when the arrays differ in length or no cycle is given;
 *   ComputationError for a cycle with no stroke or no force
 * @example loopMetrics(Array.from({length: 1001}, (_, i) => i / 1000), Array.from({length: 1001}, (_, i) => 0.02 * Math.sin(2 * Math.PI * i / 1000)), Array.from({length: 1001}, (_, i) => 4000 * Math.sin(2 * Math.PI * i / 1000) + 200 * Math.PI * Math.cos(2 * Math.PI * i / 1000)), [[0, 1000]]).Eloop // 39.478 (π·c·ω·X², c = 5000 N·s/m, 1 Hz, X = 20 mm)
 * @source asce7_16 §17.8.5.1–17.8.5.2 eqs. 17.8-1, 17.8-2 (effective stiffness and damping of prototype tests, from memory); same definitions in §18.6 for damping devices (from memory)
 */
export function loopMetrics(t: ArrayLike<number>, x: ArrayLike<number>, F: ArrayLike<number>, cycles: readonly (readonly [number, number])[]): LoopMetrics {
  if (x.length !== t.length || F.length !== t.length) throw new InputRangeError('csv', `${t.length}/${x.length}/${F.length} samples`, undefined, '', 'time, displacement and force need the same number of samples');
  if (cycles.length === 0) throw new InputRangeError('csv', '0 cycles', undefined, '', 'loop metrics need at least one complete cycle');
  const loops = cycles.map(([a, b]) => cycleLoop(t, x, F, a, b));
  const mean = (f: (c: CycleLoop) => number) => loops.reduce((s, c) => s + f(c), 0) / loops.length;
  const Eloop = mean((c) => c.Eloop);
  const F0up = mean((c) => c.F0up), F0down = mean((c) => c.F0down);
  const EloopDevMax = Eloop > 0 ? loops.reduce((m, c) => Math.max(m, Math.abs(c.Eloop - Eloop) / Eloop), 0) : 0;
  return {
    cycles: loops, Eloop, keff: mean((c) => c.keff),
    betaEff: loops.every((c) => c.betaEff !== undefined) ? mean((c) => c.betaEff!) : undefined,
    F0: (F0up + F0down) / 2, F0up, F0down, fullness: mean((c) => c.fullness), EloopDevMax,
  };
}
