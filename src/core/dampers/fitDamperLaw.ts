/**
 * Characterises a damper from force–velocity points: the least-squares law of the chosen kind,
 * its fit quality, and a fit per direction when the sheet has both rebound and compression.
 *
 * Linear and power laws are symmetric (laws.ts): their main fit uses every point, which for equal
 * velocity sets in both directions is the law dissipating the same energy per harmonic cycle as
 * the two sides together (linear: the mean of the two coefficients). The bilinear law keeps the
 * two sides apart with one shared knee, so its main fit already is per direction.
 */
import { ComputationError } from '../errors.ts';
import { damperForce } from './damperForce.ts';
import type { DamperLaw } from './laws.ts';
import { fitLinearOrigin } from './fitLinear.ts';
import { fitPowerLaw } from './fitPowerLaw.ts';
import { fitBilinear, type FitSide } from './fitBilinear.ts';

export type FitLawKind = 'linear' | 'power' | 'bilinear';

export interface DamperLawFit {
  /** the fitted law (bilinear: a side without data copies the other side; see hasRebound/hasCompression) */
  readonly law: DamperLaw;
  /** law fitted to the rebound points alone (bilinear: the main fit), when there are any */
  readonly rebound: DamperLaw | undefined;
  /** law fitted to the compression points alone, when there are any */
  readonly compression: DamperLaw | undefined;
  readonly r2: number;
  /** root-mean-square force residual, N */ readonly rmsError: number;
  /** F_i − F_fit(v_i), N, in the order of the points */ readonly residuals: readonly number[];
  readonly nRebound: number;
  readonly nCompression: number;
  /** power law: the exponent lies on an end of the searched range */ readonly alphaAtLimit: boolean;
}

/** Splits signed points into rebound (v > 0) and compression (v < 0) magnitudes; v = 0 is in neither. */
export function splitSides(v: readonly number[], F: readonly number[]): { rebound: FitSide; compression: FitSide } {
  const r = { a: [] as number[], y: [] as number[] };
  const c = { a: [] as number[], y: [] as number[] };
  v.forEach((vi, i) => {
    if (vi > 0) { r.a.push(vi); r.y.push(F[i]!); } else if (vi < 0) { c.a.push(-vi); c.y.push(-F[i]!); }
  });
  return { rebound: r, compression: c };
}

function fitSymmetric(kind: 'linear' | 'power', s: FitSide): { law: DamperLaw; atLimit: boolean } {
  if (kind === 'linear') return { law: { kind, c: fitLinearOrigin(s.a, s.y) }, atLimit: false };
  const p = fitPowerLaw(s.a, s.y);
  return { law: { kind, C: p.C, alpha: p.alpha }, atLimit: p.atLimit };
}

/**
 * Fits a damper law to signed force–velocity points.
 *
 * $$R^2 = 1 - \frac{\sum_i (F_i - \hat F(v_i))^2}{\sum_i (F_i - \bar F)^2},\qquad
 *   e_{\mathrm{rms}} = \sqrt{\tfrac1n\sum_i (F_i - \hat F(v_i))^2}$$
 *
 * @param v velocities, m/s (positive rebound)
 * @param F forces, N, signed like v, gas force removed
 * @param kind law to fit
 * @throws ComputationError when the points cannot determine the law (too few, one velocity only,
 *   forces against the motion)
 * @example fitDamperLaw([-0.2, -0.1, 0.1, 0.2], [-196, -98, 98, 196], 'linear').law // { c: 980 }
 * @source press2007 §15.1 (R² and the residual sum of squares) and §15.4 (from memory)
 */
export function fitDamperLaw(v: readonly number[], F: readonly number[], kind: FitLawKind): DamperLawFit {
  if (v.length < 2) throw new ComputationError(`a fit needs at least two points (got ${v.length})`);
  const { rebound: r, compression: c } = splitSides(v, F);
  const nR = r.a.length;
  const nC = c.a.length;
  if (nR + nC === 0) throw new ComputationError('every point has zero velocity: nothing to fit');
  let law: DamperLaw;
  let reb: DamperLaw | undefined;
  let comp: DamperLaw | undefined;
  let atLimit = false;
  if (kind === 'bilinear') {
    const sides = [r, c].filter((s) => s.a.length > 0);
    const b = fitBilinear(sides);
    const rs = nR > 0 ? b.slopes[0]! : undefined;
    const cs = nC > 0 ? b.slopes[nR > 0 ? 1 : 0]! : undefined;
    law = { kind, vknee: b.vknee, rebound: rs ?? cs!, compression: cs ?? rs! };
    reb = rs && law;
    comp = cs && law;
  } else {
    const all = { a: [...r.a, ...c.a], y: [...r.y, ...c.y] };
    const main = fitSymmetric(kind, all);
    law = main.law;
    atLimit = main.atLimit;
    const enough = (s: FitSide) => (kind === 'linear' ? s.a.length >= 1 : s.a.length >= 3 && new Set(s.a).size >= 2);
    reb = nR === 0 ? undefined : nC === 0 ? law : enough(r) ? fitSymmetric(kind, r).law : undefined;
    comp = nC === 0 ? undefined : nR === 0 ? law : enough(c) ? fitSymmetric(kind, c).law : undefined;
  }
  const residuals = v.map((vi, i) => F[i]! - damperForce(law, vi));
  const n = v.length;
  const mean = F.reduce((s, x) => s + x, 0) / n;
  const sst = F.reduce((s, x) => s + (x - mean) ** 2, 0);
  const sse = residuals.reduce((s, e) => s + e * e, 0);
  if (!Number.isFinite(sse)) throw new ComputationError('the fit overflowed: forces or velocities out of scale');
  const r2 = sst > 0 ? 1 - sse / sst : sse === 0 ? 1 : 0;
  return { law, rebound: reb, compression: comp, r2, rmsError: Math.sqrt(sse / n), residuals, nRebound: nR, nCompression: nC, alphaAtLimit: atLimit };
}
