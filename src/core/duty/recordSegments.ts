/**
 * Splits a record at sampling gaps and differentiates displacement on an uneven time grid.
 */

/** Index ranges [start, end) of the pieces between gaps. */
export interface Segments {
  readonly ranges: [number, number][];
  /** Median sampling interval, s. */
  readonly dtMedian: number;
  readonly dtMin: number;
  readonly dtMax: number;
  /** Number of gaps (intervals longer than gapFactor × median). */
  readonly gaps: number;
}

/**
 * Finds gaps: an interval longer than `gapFactor` times the median interval ends a segment.
 *
 * @param t strictly increasing times, s (≥ 2 samples)
 * @param gapFactor > 1, default 5
 */
export function findSegments(t: readonly number[], gapFactor = 5): Segments {
  const n = t.length;
  const dt = new Float64Array(n - 1);
  for (let i = 0; i + 1 < n; i++) dt[i] = t[i + 1]! - t[i]!;
  const sorted = Float64Array.from(dt).sort();
  const dtMedian = sorted[Math.floor((n - 1) / 2)]!;
  const ranges: [number, number][] = [];
  let start = 0;
  for (let i = 0; i + 1 < n; i++) {
    if (dt[i]! > gapFactor * dtMedian) { ranges.push([start, i + 1]); start = i + 1; }
  }
  ranges.push([start, n]);
  return { ranges, dtMedian, dtMin: sorted[0]!, dtMax: sorted[n - 2]!, gaps: ranges.length - 1 };
}

/**
 * Velocity from displacement on an uneven grid, within one segment [a, b).
 *
 * $$\dot x_i = \frac{h_1^2 x_{i+1} - h_2^2 x_{i-1} + (h_2^2 - h_1^2)x_i}{h_1 h_2 (h_1 + h_2)},\qquad
 *   h_1 = t_i - t_{i-1},\ h_2 = t_{i+1} - t_i$$
 * (second order, exact for quadratics); one-sided differences at the segment ends.
 *
 * @source fornberg1988 (finite-difference weights on arbitrary grids; three-point case, from memory)
 */
export function differentiate(t: readonly number[], x: readonly number[], a: number, b: number, out: Float64Array): void {
  if (b - a < 2) { if (b - a === 1) out[a] = 0; return; }
  for (let i = a + 1; i < b - 1; i++) {
    const h1 = t[i]! - t[i - 1]!;
    const h2 = t[i + 1]! - t[i]!;
    out[i] = (h1 * h1 * x[i + 1]! - h2 * h2 * x[i - 1]! + (h2 * h2 - h1 * h1) * x[i]!) / (h1 * h2 * (h1 + h2));
  }
  out[a] = (x[a + 1]! - x[a]!) / (t[a + 1]! - t[a]!);
  out[b - 1] = (x[b - 1]! - x[b - 2]!) / (t[b - 1]! - t[b - 2]!);
}
