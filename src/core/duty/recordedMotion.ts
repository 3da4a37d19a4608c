/**
 * Power and energy of a recorded damper motion: instantaneous power F·v, energy of the record,
 * mean power, energy per detected cycle, peaks. Force is measured or supplied by a damper law.
 */
import { damperForce, validateLaw, type DamperLaw } from '../dampers/index.ts';
import { ComputationError } from '../errors.ts';
import { blockPower, MAX_POWER_BLOCKS } from './blockPower.ts';
import type { DutySummary } from './dutySummary.ts';
import type { ParsedRecord } from './recordedMotionCsv.ts';
import { differentiate, findSegments } from './recordSegments.ts';

export interface RecordedMotionResult {
  readonly t: Float64Array;
  readonly v: Float64Array;
  readonly F: Float64Array;
  readonly p: Float64Array;
  /** Energy of the record, J; time actually covered (gaps excluded), s. */
  readonly E: number;
  readonly duration: number;
  readonly meanPower: number;
  readonly cycleEnergies: number[];
  /** Index ranges [start, end] of the detected cycles (end inclusive: the next cycle's start). */
  readonly cycleRanges: [number, number][];
  readonly Fpeak: number;
  readonly vPeak: number;
  readonly vRms: number;
  /** True when the recorded force had the opposite sign convention and was flipped. */
  readonly flipped: boolean;
  readonly segments: ReturnType<typeof findSegments>;
  readonly summary: DutySummary;
}

/**
 * Analyses a parsed record.
 *
 * $$p(t) = F(t)\,v(t),\qquad E = \sum_{\text{segments}} \int p\,dt\ \text{(trapezoid)},\qquad \bar P = \frac{E}{\sum T_{segment}}$$
 * Cycles run between upward zero crossings of velocity (hysteresis band ±10 % of RMS velocity);
 * a cycle never spans a gap.
 *
 * @param rec parsed record (parseRecordedMotion)
 * @param law damper law used when the record has no force column (not hysteretic)
 * @param gapFactor an interval longer than this × the median interval is a gap
 * @throws ComputationError when no segment has two samples
 * @source common practice, no source (power from force × velocity); fornberg1988 (uneven differentiation)
 */
export function recordedMotion(rec: ParsedRecord, law: DamperLaw | undefined, gapFactor = 5): RecordedMotionResult {
  const n = rec.t.length;
  const t = Float64Array.from(rec.t);
  const seg = findSegments(rec.t, gapFactor);
  const v = new Float64Array(n);
  if (rec.v) v.set(rec.v);
  else for (const [a, b] of seg.ranges) differentiate(rec.t, rec.x!, a, b, v);
  const F = new Float64Array(n);
  let flipped = false;
  if (rec.F) F.set(rec.F);
  else {
    if (!law) throw new ComputationError('the record has no force column: choose a damper law');
    validateLaw(law);
    if (law.kind === 'hysteretic') throw new ComputationError('a loss-factor law needs harmonic motion; choose another law for a recorded motion');
    for (let i = 0; i < n; i++) F[i] = damperForce(law, v[i]!);
  }
  const p = new Float64Array(n);
  for (let i = 0; i < n; i++) p[i] = F[i]! * v[i]!;
  let E = 0;
  let duration = 0;
  const cum = new Float64Array(n);
  for (const [a, b] of seg.ranges) {
    if (b - a < 2) continue;
    duration += t[b - 1]! - t[a]!;
    for (let i = a + 1; i < b; i++) { E += 0.5 * (p[i]! + p[i - 1]!) * (t[i]! - t[i - 1]!); cum[i] = E; }
    cum[a] = a > 0 ? cum[a - 1]! : 0;
  }
  if (!(duration > 0)) throw new ComputationError('no part of the record has two samples between gaps');
  if (rec.F && E < 0) {
    flipped = true; E = -E;
    for (let i = 0; i < n; i++) { F[i] = -F[i]!; p[i] = -p[i]!; cum[i] = -cum[i]!; }
  }
  let vs = 0, vPeak = 0, Fpeak = 0;
  for (let i = 0; i < n; i++) { vs += v[i]! * v[i]!; vPeak = Math.max(vPeak, Math.abs(v[i]!)); Fpeak = Math.max(Fpeak, Math.abs(F[i]!)); }
  const vRms = Math.sqrt(vs / n);
  const band = 0.1 * vRms;
  const cycleEnergies: number[] = [];
  const cycleRanges: [number, number][] = [];
  for (const [a, b] of seg.ranges) {
    let armed = false;
    let start = -1;
    for (let i = a; i < b; i++) {
      if (v[i]! < -band) armed = true;
      else if (armed && v[i]! >= 0) {
        if (start >= 0) { cycleEnergies.push(cum[i]! - cum[start]!); cycleRanges.push([start, i]); }
        start = i; armed = false;
      }
    }
  }
  const meanPower = E / duration;
  return {
    t, v, F, p, E, duration, meanPower, cycleEnergies, cycleRanges, Fpeak, vPeak, vRms, flipped, segments: seg,
    summary: { meanPower, profile: blockPower(t, p, seg.ranges, MAX_POWER_BLOCKS) },
  };
}
