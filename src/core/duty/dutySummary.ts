/**
 * What a duty calculation hands to the thermal pages: the mean power the damper turns into
 * heat and, where there is one, its time profile.
 */
export interface DutySummary {
  /** Mean power over the duty, W (≥ 0). */
  readonly meanPower: number;
  /** Instantaneous (or cycle-averaged) power against time: t in s, P in W. */
  readonly profile?: { readonly t: number[]; readonly P: number[] };
}

/**
 * Thins a power profile to at most `maxPoints` by averaging over equal blocks of samples,
 * so the energy (∑P·Δt) of an evenly sampled profile is kept.
 *
 * @param t times, s, increasing; P powers, W, same length
 * @param maxPoints largest number of points kept, ≥ 2
 */
export function thinProfile(t: readonly number[], P: readonly number[], maxPoints = 2000): { t: number[]; P: number[] } {
  const n = Math.min(t.length, P.length);
  if (n <= maxPoints) return { t: t.slice(0, n), P: P.slice(0, n) };
  const block = Math.ceil(n / maxPoints);
  const tt: number[] = [];
  const pp: number[] = [];
  for (let i = 0; i < n; i += block) {
    const end = Math.min(n, i + block);
    let st = 0;
    let sp = 0;
    for (let j = i; j < end; j++) { st += t[j]!; sp += P[j]!; }
    tt.push(st / (end - i));
    pp.push(sp / (end - i));
  }
  return { t: tt, P: pp };
}
