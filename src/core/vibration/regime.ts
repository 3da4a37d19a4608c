/** The three kinds of free motion of a viscously damped SDOF system. */
export type DampingRegime = 'underdamped' | 'critically damped' | 'overdamped';

/**
 * Relative band around ζ = 1 treated as critical. Why: ζ is computed from measured c, k, m;
 * a difference below one part in 10⁹ is round-off, and the critical form is the stable one there.
 */
export const CRITICAL_BAND = 1e-9;

/**
 * Classifies free motion by damping ratio: ζ < 1 oscillates, ζ = 1 is the fastest
 * non-oscillating return, ζ > 1 creeps back.
 *
 * @param zeta damping ratio, [0, ∞)
 * @source rao2017 §2.6.2 (section from memory)
 */
export function dampingRegime(zeta: number): DampingRegime {
  if (Math.abs(zeta - 1) <= CRITICAL_BAND) return 'critically damped';
  return zeta < 1 ? 'underdamped' : 'overdamped';
}
