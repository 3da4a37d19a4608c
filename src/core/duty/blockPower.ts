/**
 * A recorded power trace as block-averaged power over equal blocks of time: the short form of a
 * duty that the warm-up page takes as a power profile.
 */
import { ComputationError } from '../errors.ts';

/** Most blocks handed over (keeps a page address short). */
export const MAX_POWER_BLOCKS = 100;

export interface BlockPower {
  /** Block boundaries in covered time, s: 0, D/N, …, D (length N + 1). */
  readonly t: number[];
  /** Mean power of each block, W (length N); may be negative where stored energy was returned. */
  readonly P: number[];
  /** Energy of the trace, J (= Σ P_k Δt_k). */
  readonly E: number;
}

/**
 * Energy per block of the piecewise-linear power trace (the trapezoid rule's own interpolant),
 * integrated exactly, so the blocks carry exactly the trapezoid energy of the record on any,
 * even uneven, sampling. Gaps between segments are removed: covered time runs on from one
 * segment to the next, as in the record's mean power.
 *
 * $$E_k = \int_{kD/N}^{(k+1)D/N} p(\tau)\,d\tau,\qquad P_k = \frac{N\,E_k}{D},\qquad \sum_k P_k\,\frac{D}{N} = \sum_i \tfrac12(p_i + p_{i+1})(t_{i+1} - t_i)$$
 *
 * @param t sample times, s, increasing within each segment
 * @param p instantaneous power, W, same length
 * @param ranges index ranges [start, end) of the segments between gaps (findSegments)
 * @param blocks number of blocks N (1 … MAX_POWER_BLOCKS); fewer when the record has fewer intervals
 * @throws ComputationError when no segment covers any time
 * @example blockPower([0, 1, 3], [0, 2, 2], [[0, 3]], 2).P // [1.333333, 2] (2 J in [0, 1.5) over 1.5 s, 3 J in [1.5, 3))
 * @source common practice, no source (block averaging of a sampled signal; trapezoid rule)
 */
export function blockPower(t: ArrayLike<number>, p: ArrayLike<number>, ranges: readonly (readonly [number, number])[], blocks = MAX_POWER_BLOCKS): BlockPower {
  let D = 0;
  let intervals = 0;
  for (const [a, b] of ranges) if (b - a >= 2) { D += t[b - 1]! - t[a]!; intervals += b - a - 1; }
  if (!(D > 0)) throw new ComputationError('no part of the record covers any time');
  const N = Math.max(1, Math.min(MAX_POWER_BLOCKS, Math.floor(blocks), intervals));
  const w = D / N;
  const energy = new Array<number>(N).fill(0);
  let E = 0;
  let offset = 0; // covered time at the start of the current segment
  for (const [a, b] of ranges) {
    if (b - a < 2) continue;
    for (let i = a; i + 1 < b; i++) {
      const u0 = offset + (t[i]! - t[a]!);
      const u1 = offset + (t[i + 1]! - t[a]!);
      const p0 = p[i]!;
      const slope = (p[i + 1]! - p0) / (u1 - u0);
      E += 0.5 * (p0 + p[i + 1]!) * (u1 - u0);
      // split the interval at block boundaries; integrate the linear piece exactly on each part
      let lo = u0;
      let k = Math.min(N - 1, Math.floor(u0 / w));
      while (lo < u1) {
        const hi = k >= N - 1 ? u1 : Math.max(lo, Math.min(u1, (k + 1) * w));
        const pm = p0 + slope * (0.5 * (lo + hi) - u0);
        energy[k]! += pm * (hi - lo);
        lo = hi;
        k++;
      }
    }
    offset += t[b - 1]! - t[a]!;
  }
  const tb = Array.from({ length: N + 1 }, (_, k) => (k === N ? D : k * w));
  return { t: tb, P: energy.map((e) => e / w), E };
}
