/** Warnings of the fv-fit calculator: what the fit cannot vouch for, said where the reader looks. */
import { linearFit } from '../../core/records/index.ts';
import { maxAbsOf, maxOf, minOf } from '../../core/numeric/extent.ts';
import { num, type Values } from '../types.ts';
import type { analyseSheet } from './fv-fit.analysis.ts';

/**
 * The force the sheet shows at rest, when both directions say so: a straight line through the three
 * slowest points of each direction, run back to v = 0. A damper's own force vanishes at rest, so two
 * intercepts of one sign, each above 3 % of the largest force, mean a constant force is in the data.
 */
function restingForce(v: readonly number[], F: readonly number[]): number | undefined {
  const side = (sign: number) => {
    const idx = v.map((_, i) => i).filter((i) => Math.sign(v[i]!) === sign).sort((a, b) => Math.abs(v[a]!) - Math.abs(v[b]!)).slice(0, 3);
    if (idx.length < 3 || new Set(idx.map((i) => v[i])).size < 2) return undefined;
    return linearFit(idx.map((i) => v[i]!), idx.map((i) => F[i]!)).intercept;
  };
  const r = side(1);
  const c = side(-1);
  const big = 0.03 * maxAbsOf(F);
  if (r === undefined || c === undefined || Math.sign(r) !== Math.sign(c) || Math.abs(r) < big || Math.abs(c) < big) return undefined;
  return (r + c) / 2;
}

export function warningsFor(values: Values, a: ReturnType<typeof analyseSheet>, outside: number[], ratio: number | undefined): string[] {
  const { data, fit, kind } = a;
  const w: string[] = [];
  const vRated = num(values, 'vRated');
  const vmax = maxAbsOf(data.v);
  if (fit.r2 < 0.98) w.push(`R² = ${fit.r2.toFixed(4)}: the ${kind} law describes these points poorly; compare the residual chart with another law.`);
  if (fit.nRebound === 0 || fit.nCompression === 0) {
    const has = fit.nRebound ? 'rebound' : 'compression';
    w.push(kind === 'bilinear'
      ? `Only ${has} points: the other direction's slopes are not given and the fitted law cannot be handed on as a bilinear law.`
      : `Only ${has} points: the symmetric ${kind} law assumes the other direction is the same.`);
  }
  if (kind !== 'bilinear' && ratio !== undefined && (ratio > 1.25 || ratio < 0.8)) {
    w.push(`Rebound/compression ratio ${ratio.toFixed(2)}: one ${kind} law for both directions averages them (same energy per harmonic cycle for equal velocity sets); the bilinear law keeps the two directions apart.`);
  }
  if (fit.alphaAtLimit) w.push('The best exponent lies at an end of the searched range 0.05–2: the points do not follow a power law.');
  if (fit.law.kind === 'bilinear' && [fit.law.rebound.c1, fit.law.rebound.c2, fit.law.compression.c1, fit.law.compression.c2].some((c) => c < 0)) {
    w.push('A fitted slope is negative: the points do not look like a passive damper (check the signs and the force offset).');
  }
  const offset = restingForce(data.v, data.F);
  if (offset !== undefined) {
    w.push(`The slowest points of both directions run back to about ${offset.toPrecision(3)} N at zero velocity: a constant (gas-spring) force is probably still in the data; enter it as the force offset.`);
  }
  if (vRated > vmax) w.push(`The rated velocity lies beyond the fastest point (${vmax.toPrecision(3)} m/s): the forces there are extrapolated.`);
  if (data.T) {
    const spread = maxOf(data.T) - minOf(data.T);
    if (spread > 10) w.push(`The temperature column spans ${spread.toFixed(1)} K: damper force changes with oil temperature, so fit one temperature at a time.`);
  }
  if (outside.length) {
    const lines = outside.slice(0, 12).map((i) => data.lines[i]).join(', ');
    w.push(`${outside.length} point(s) outside the ±${(num(values, 'band') * 100).toPrecision(3)} % band around the fitted law: line ${lines}${outside.length > 12 ? ', …' : ''}.`);
  }
  return w;
}

