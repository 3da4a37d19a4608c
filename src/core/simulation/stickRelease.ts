import { ComputationError } from '../errors.ts';
/**
 * First time after `t0` at which the net non-friction force on a stuck mass exceeds the friction
 * force, |p(t) − k·z| > F_f, or Infinity when that does not happen before `tEnd`. The mass is
 * stuck while the force it would take to move it is within the friction force (static force
 * taken equal to the sliding force).
 *
 * Scans in steps of `dt` (a fraction of the excitation period) and bisects the crossing to
 * round-off, returning the first instant known to lie past the threshold.
 *
 * @param g net non-friction force as a function of time, N
 * @param Ff friction force, N, > 0
 * @param t0 start of sticking, s
 * @param tEnd end of the simulation, s
 * @param dt scan step, s, > 0
 * @example stickRelease((t) => 10 * Math.sin(t), 5, 0, 10, 0.01) // 0.5236 s (π/6)
 * @source denHartog1956 §8.6, Coulomb damping and stick-slip (section from memory); rao2017 §2.9 (from memory)
 */
/** Largest number of scan steps while stuck (bounds the work of one simulation). */
export const MAX_SCAN = 200_000;

export function stickRelease(g: (t: number) => number, Ff: number, t0: number, tEnd: number, dt: number, maxScan = MAX_SCAN): number {
  let a = t0;
  let scanned = 0;
  while (a < tEnd) {
    // a fast drive over a long stick would scan for hours: refuse instead of freezing the page
    if (++scanned > maxScan) throw new ComputationError(`simulation: the mass sticks for more than ${maxScan} scan steps of the drive; shorten the duration or lower the drive frequency`);
    const b = Math.min(a + dt, tEnd);
    if (Math.abs(g(b)) > Ff) {
      let lo = a;
      let hi = b;
      for (let i = 0; i < 80 && hi - lo > 1e-15 * Math.max(1, Math.abs(hi)); i++) {
        const mid = 0.5 * (lo + hi);
        if (Math.abs(g(mid)) > Ff) hi = mid;
        else lo = mid;
      }
      return hi;
    }
    a = b;
  }
  return Infinity;
}
