/**
 * A piecewise-constant heating power against time, as a duty calculation hands it to the
 * thermal pages: power P_i from t_i to t_{i+1}, i = 0 … n−1, with t_0 = 0 and t_n the end.
 */
import { ComputationError, requireInRange } from '../errors.ts';

export interface PowerProfile {
  /** Segment boundaries, s: t[0] = 0 < t[1] < … < t[n] = end of the profile (length n + 1). */
  readonly t: readonly number[];
  /** Power in each segment, W, ≥ 0 (length n). */
  readonly P: readonly number[];
}

/** What happens after the profile's end: it starts again (period t_n), or the power stays off. */
export type ProfileEnd = 'repeat' | 'off';

/** Most segments a profile may have: bounds the work of every profile calculation. */
export const MAX_PROFILE_SEGMENTS = 2000;
/** Largest power of one segment, W (far above any damper; keeps every sum finite). */
export const MAX_PROFILE_POWER = 1e9;
/** Largest profile end time, s (about 30 years: every product with a time stays finite). */
export const MAX_PROFILE_TIME = 1e9;

/**
 * Checks a profile: boundaries start at 0 and strictly increase, powers are finite and ≥ 0,
 * at most MAX_PROFILE_SEGMENTS segments. Returns the profile unchanged.
 *
 * @throws InputRangeError naming `input` (with the segment) for a bad number; ComputationError
 *   for a profile with no segment or too many
 */
export function checkProfile(p: PowerProfile, input = 'profile'): PowerProfile {
  const n = p.P.length;
  if (n < 1 || p.t.length !== n + 1) throw new ComputationError(`${input}: a profile needs at least one segment and one more boundary than segments`);
  if (n > MAX_PROFILE_SEGMENTS) throw new ComputationError(`${input}: ${n} segments; at most ${MAX_PROFILE_SEGMENTS}`);
  if (p.t[0] !== 0) requireInRange(input, p.t[0]!, { min: 0, max: 0 }, 's');
  for (let i = 0; i < n; i++) {
    requireInRange(input, p.P[i]!, { min: 0, max: MAX_PROFILE_POWER }, 'W');
    requireInRange(input, p.t[i + 1]!, { min: p.t[i]!, max: MAX_PROFILE_TIME, minExclusive: true }, 's');
  }
  return p;
}

/** Mean power of a profile over its length, W: (Σ P_i Δt_i) / t_n. */
export function profileMeanPower(p: PowerProfile): number {
  let e = 0;
  for (let i = 0; i < p.P.length; i++) e += p.P[i]! * (p.t[i + 1]! - p.t[i]!);
  return e / p.t[p.t.length - 1]!;
}

/** Power at time s inside the profile (0 ≤ s < t_n), W; binary search on the boundaries. */
export function profilePowerAt(p: PowerProfile, s: number): number {
  let lo = 0;
  let hi = p.P.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (p.t[mid]! <= s) lo = mid; else hi = mid - 1;
  }
  return p.P[lo]!;
}
