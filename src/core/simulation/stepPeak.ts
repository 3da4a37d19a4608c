import type { AcceptedStep } from '../ode/index.ts';

/** A step is searched only when its estimate reaches the running peak within this share. */
const NEAR = 1e-3;
/** Offset of the slope probe at a step end, and half-width of the second parabola, in steps. */
const PROBE = 1e-3;
const SECOND = 1 / 64;

/** Vertex of the last `vertex` call: θ and value (module scratch: the search runs per step and allocates nothing). */
let vTheta = 0;
let vValue = 0;

/** Vertex (θ, value) of the parabola through (a, ga), (a + d, gb), (a + 2d, gc), left in vTheta, vValue; the middle point when it does not open downwards. */
function vertex(a: number, d: number, ga: number, gb: number, gc: number): void {
  const curv = ga - 2 * gb + gc;
  if (!(curv < 0)) { vTheta = a + d; vValue = gb; return; }
  const u = Math.max(-1, Math.min(1, (ga - gc) / (2 * curv))); // offset from the middle, in d
  vTheta = a + d + u * d;
  vValue = gb - 0.25 * (ga - gc) * u;
}

/** Number of watched quantities at most (|ż|, |F_d|, stored energy, |W|). */
const MAX_Q = 8;
const vals = new Float64Array(5 * MAX_Q);
const probe = new Float64Array(MAX_Q);

/**
 * Largest values of n quantities g_q(t, y) inside one accepted step, located on the dense output
 * and written into `running` (which holds the peaks so far). `states` holds the state at θ = 0,
 * ¼, ½, ¾, 1 (the recorder interpolates them once for its audit). Around the largest sample of a
 * quantity its peak is found by two parabolas: one through the three samples, then one through
 * dense-output values at that vertex ± 1/64 step, whose vertex is evaluated; the error of the second
 * is of order (h/64)³, below the interpolant's own. When the largest sample is at a step end, a
 * probe 10⁻³ step inside tells whether g still falls towards that end (a peak inside this step) or
 * rises through it (the neighbouring step holds it). Samples a quarter step apart read a
 * sinusoidal peak low by up to 1 − cos(ωh/8): 1 − cos(π/32) ≈ 0.48 % at the integrator's largest
 * step h = T/8 (0.29 % was measured at rtol 1e-4).
 *
 * Only a quantity whose sampled estimate comes within 10⁻³ of its running peak is searched, so a
 * steady or decaying run pays a few dense-output evaluations per peak, not per step.
 *
 * @param g writes the n quantities (each ≥ 0) of the time and state into out[0..n)
 * @param running the peaks so far, updated in place
 * @param states the five sampled states of the step
 * @param tmp scratch state of the system's dimension
 * @source hairer1993 §II.6 dense output (from memory); successive parabolic interpolation: common practice, no source
 */
export function stepPeaks(s: AcceptedStep, g: (t: number, y: ArrayLike<number>, out: Float64Array, at: number) => void, running: Float64Array, states: readonly ArrayLike<number>[], tmp: Float64Array): void {
  const n = running.length;
  const h = s.t1 - s.t0;
  for (let i = 0; i < 5; i++) g(s.t0 + 0.25 * i * h, states[i]!, vals, i * n);
  for (let q = 0; q < n; q++) {
    let j = 0;
    for (let i = 1; i < 5; i++) if (vals[i * n + q]! > vals[j * n + q]!) j = i;
    const best = vals[j * n + q]!;
    const run = running[q]!;
    if (best > run) running[q] = best;
    if (!(h > 0) || Math.max(best, run) === 0) continue;
    if (j === 4 || j === 0) {
      if (best < (1 - NEAR) * run) continue;
      if (!(at(s, g, tmp, j === 4 ? 1 - PROBE : PROBE, q) > best)) continue; // rising through the end: the neighbour step's peak
      j = j === 4 ? 3 : 1;
    }
    vertex((j - 1) / 4, 0.25, vals[(j - 1) * n + q]!, best, vals[(j + 1) * n + q]!);
    if (Math.max(vValue, best) < (1 - NEAR) * running[q]!) continue;
    const lo = Math.max(0, vTheta - SECOND), hi = Math.min(1, vTheta + SECOND);
    const d = (hi - lo) / 2;
    const ga = at(s, g, tmp, lo, q), gb = at(s, g, tmp, lo + d, q), gc = at(s, g, tmp, hi, q);
    vertex(lo, d, ga, gb, gc);
    running[q] = Math.max(running[q]!, ga, gb, gc, at(s, g, tmp, vTheta, q));
  }
}

/** Quantity q at θ of the step, on the dense output. */
function at(s: AcceptedStep, g: (t: number, y: ArrayLike<number>, out: Float64Array, at: number) => void, tmp: Float64Array, th: number, q: number): number {
  s.interpolate(th, tmp);
  g(s.t0 + th * (s.t1 - s.t0), tmp, probe, 0);
  return probe[q]!;
}
