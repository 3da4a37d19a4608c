/**
 * Least-squares bilinear damper law: slope c₁ below a knee velocity and c₂ above it, continuous
 * at the knee, with one knee shared by rebound and compression (the law of laws.ts has one
 * knee). For a fixed knee the slopes of each side are a linear least-squares problem in two
 * unknowns; the knee is found by scanning candidates and refining the best by golden section.
 */
import { ComputationError } from '../errors.ts';
import { goldenSection } from '../numeric/goldenSection.ts';

/** One side of the damper (rebound or compression) as magnitudes: a = |v| > 0, y = force magnitude. */
export interface FitSide {
  readonly a: readonly number[];
  readonly y: readonly number[];
}

export interface BilinearFit {
  readonly vknee: number;
  /** slopes per side, in the order given, N·s/m */ readonly slopes: readonly { readonly c1: number; readonly c2: number }[];
  /** sum of squared force residuals over all sides, N² */ readonly sse: number;
}

/** Slopes of one side for a knee, from the 2×2 normal equations; Infinity SSE when singular. */
function sideFit(s: FitSide, vk: number): { c1: number; c2: number; sse: number } {
  let s11 = 0, s12 = 0, s22 = 0, b1 = 0, b2 = 0;
  for (let i = 0; i < s.a.length; i++) {
    const p = Math.min(s.a[i]!, vk);
    const q = Math.max(s.a[i]! - vk, 0);
    s11 += p * p; s12 += p * q; s22 += q * q; b1 += p * s.y[i]!; b2 += q * s.y[i]!;
  }
  const det = s11 * s22 - s12 * s12;
  if (!(det > 1e-14 * s11 * s22)) return { c1: NaN, c2: NaN, sse: Infinity };
  const c1 = (b1 * s22 - b2 * s12) / det;
  const c2 = (s11 * b2 - s12 * b1) / det;
  let sse = 0;
  for (let i = 0; i < s.a.length; i++) sse += (s.y[i]! - c1 * Math.min(s.a[i]!, vk) - c2 * Math.max(s.a[i]! - vk, 0)) ** 2;
  return { c1, c2, sse };
}

const total = (sides: readonly FitSide[], vk: number) => sides.reduce((sum, s) => sum + sideFit(s, vk).sse, 0);

/**
 * Fits |F| = c₁|v| (|v| ≤ v_k), c₁v_k + c₂(|v| − v_k) (|v| > v_k) on every side with one knee.
 *
 * $$\min_{v_k}\sum_{\text{sides}}\min_{c_1,c_2}\sum_i\bigl(y_i - c_1\min(a_i,v_k) - c_2\max(a_i-v_k,0)\bigr)^2$$
 *
 * The knee is searched where every side has at least two points below and two above it, first on
 * 101 even steps plus the measured speeds (at most about 200 of them), then by golden section.
 *
 * @param sides one or two sides (rebound, compression), each with at least four points
 * @throws ComputationError when a side has fewer than four points or no knee leaves two points on
 *   each side of it
 * @example fitBilinear([{ a: [0.05, 0.1, 0.2, 0.4, 0.8], y: [100, 200, 300, 500, 900] }]).vknee // 0.1
 * @source press2007 §15.4 linear least squares, §10.2 golden section (from memory); dixon2007
 *   ch. 5 (bilinear damper characteristics, from memory)
 */
export function fitBilinear(sides: readonly FitSide[]): BilinearFit {
  let lo = -Infinity;
  let hi = Infinity;
  for (const s of sides) {
    if (s.a.length < 4) throw new ComputationError(`a bilinear fit needs at least four points on each side with data (got ${s.a.length})`);
    const sorted = [...s.a].sort((x, y) => x - y);
    lo = Math.max(lo, sorted[1]!);
    hi = Math.min(hi, sorted[sorted.length - 2]!);
  }
  if (!(hi > lo)) throw new ComputationError('no knee velocity leaves two points below and two above it on every side: add points over a wider velocity range');
  // candidates: an even grid plus every measured speed inside the range (the SSE kinks there)
  const cands = Array.from({ length: 101 }, (_, i) => lo + ((hi - lo) * i) / 100);
  const measured = [...new Set(sides.flatMap((s) => s.a.filter((a) => a > lo && a < hi)))];
  const every = Math.max(1, Math.ceil(measured.length / 200)); // long sheets: the grid is fine enough
  measured.forEach((a, i) => { if (i % every === 0) cands.push(a); });
  cands.sort((x, y) => x - y);
  let best = 0;
  let bestSse = Infinity;
  cands.forEach((vk, i) => { const e = total(sides, vk); if (e < bestSse) { bestSse = e; best = i; } });
  if (!Number.isFinite(bestSse)) throw new ComputationError('the bilinear fit is singular for every knee: the velocities are too few or repeated');
  const m = goldenSection((vk) => total(sides, vk), cands[Math.max(0, best - 1)]!, cands[Math.min(cands.length - 1, best + 1)]!, 1e-13);
  const vknee = m.f <= bestSse ? m.x : cands[best]!;
  const fits = sides.map((s) => sideFit(s, vknee));
  return { vknee, slopes: fits.map(({ c1, c2 }) => ({ c1, c2 })), sse: fits.reduce((sum, f) => sum + f.sse, 0) };
}
