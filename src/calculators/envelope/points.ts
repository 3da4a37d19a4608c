/**
 * The sample points of an envelope, in unit-cube coordinates (0 = low end, 1 = high end of each
 * varied input): every corner of the box, then a fixed low-discrepancy (Halton) set inside it.
 * Fixed, not random: the same inputs give the same envelope on every machine and in every run.
 */

/** First primes: one Halton base per varied input (at most 8 inputs are varied). */
const PRIMES = [2, 3, 5, 7, 11, 13, 17, 19] as const;

/** Most inputs one envelope varies: 2^8 = 256 corners is still a fraction of a second. */
export const MAX_VARIED = PRIMES.length;

/** Interior samples added to the corners (stated on the page and in the CLI's method text). */
export const INTERIOR_SAMPLES = 64;

/** All 2^k corners; corner i has input j at its high end when bit j of i is set. */
export function corners(k: number): number[][] {
  const out: number[][] = [];
  for (let i = 0; i < 2 ** k; i++) out.push(Array.from({ length: k }, (_, j) => (i >> j) & 1));
  return out;
}

/** The radical inverse of n in base b: n's digits mirrored behind the point (van der Corput). */
function radicalInverse(n: number, b: number): number {
  let inv = 0;
  let f = 1 / b;
  for (let m = n; m > 0; m = Math.floor(m / b)) {
    inv += (m % b) * f;
    f /= b;
  }
  return inv;
}

/**
 * `n` points of the Halton sequence in k dimensions (indices 1…n, so no point sits on a corner
 * or on the low faces): strictly inside the cube for every index used here.
 */
export function interiorPoints(n: number, k: number): number[][] {
  return Array.from({ length: n }, (_, i) => Array.from({ length: k }, (_, j) => radicalInverse(i + 1, PRIMES[j]!)));
}
