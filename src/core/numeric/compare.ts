/**
 * The one rule by which a computed number is compared with a reference number — used by the
 * verification cases (pages, `dampbook check`, the build), the unit tests and record replay, so a
 * case that passes in one place passes in all of them.
 *
 * Relative difference |computed − expected| / |expected|, absolute when the expected value is 0
 * (a reference of exactly zero has no scale). A non-finite computed value never passes.
 *
 * Common practice, no source: the usual relative-error test of numerical work.
 * @example relativeDifference(1.01, 1) // ≈ 0.01
 */
export function relativeDifference(computed: number, expected: number): number {
  const d = Math.abs(computed - expected);
  return expected === 0 ? d : d / Math.abs(expected);
}

/**
 * True when `computed` is within `tolerance` of `expected` (relative; absolute at 0), or within
 * the absolute `floor` (round-off residuals such as an energy-audit closure of 1e-13 that change by
 * their own size when an input moves in its last place).
 *
 * @example Number(withinTolerance(0.0851, 0.085, 2e-3)) // 1
 */
export function withinTolerance(computed: number, expected: number, tolerance: number, floor = 0): boolean {
  if (!Number.isFinite(computed)) return false;
  return relativeDifference(computed, expected) <= tolerance || Math.abs(computed - expected) <= floor;
}
