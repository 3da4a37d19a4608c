/**
 * Charts of the fv-fit calculator: the measured points with the fitted law and its tolerance
 * band (force against velocity), and the residuals against velocity with the band's half-width.
 */
import { damperForce } from '../../core/dampers/index.ts';
import { maxAbsOf, maxOf, minOf } from '../../core/numeric/extent.ts';
import { q } from '../quantityText.ts';
import { num, type ChartSpec, type Result, type Values } from '../types.ts';
import { analyseSheet, bandHalfWidth } from './fv-fit.analysis.ts';

/** Velocities for drawing the law: an even grid over the data plus the kinks (0 and ± knee). */
function curveSpeeds(vmin: number, vmax: number, knee: number | undefined): number[] {
  const n = 160;
  const v = Array.from({ length: n + 1 }, (_, i) => vmin + ((vmax - vmin) * i) / n);
  for (const k of [0, ...(knee ? [knee, -knee] : [])]) if (k > vmin && k < vmax) v.push(k);
  return v.sort((a, b) => a - b);
}

export function fvFitCharts(values: Values, result: Result): ChartSpec[] {
  const { data, fit, kind } = analyseSheet(values);
  const band = num(values, 'band');
  const floor = num(values, 'bandFloor');
  const knee = fit.law.kind === 'bilinear' ? fit.law.vknee : undefined;
  const vmin = Math.min(0, minOf(data.v));
  const vmax = Math.max(0, maxOf(data.v));
  const vs = curveSpeeds(vmin, vmax, knee);
  const Ffit = vs.map((v) => damperForce(fit.law, v));
  const hw = vs.map((v) => bandHalfWidth(fit.law, v, band, floor));
  const out = new Set(band > 0 ? fit.residuals.flatMap((e, i) => (Math.abs(e) > bandHalfWidth(fit.law, data.v[i]!, band, floor) ? [i] : [])) : []);
  const inside = data.v.map((_, i) => i).filter((i) => !out.has(i));
  const outsideIdx = [...out];
  const bandSeries = band > 0 || floor > 0 ? [
    { label: `band ±${(band * 100).toPrecision(3)} %`, x: vs, y: Ffit.map((f, i) => f + hw[i]!), style: 'dash' as const, tone: 2 },
    { label: 'band (lower)', legend: false as const, x: vs, y: Ffit.map((f, i) => f - hw[i]!), style: 'dash' as const, tone: 2 },
  ] : [];
  const r2 = (result.outputs.r2 as number).toFixed(5);
  return [
    {
      id: 'force-velocity',
      title: 'Measured points and the fitted law',
      x: { label: 'Velocity (+ rebound, − compression)', kind: 'velocity' },
      y: { label: 'Damper force', kind: 'force' },
      series: [
        { label: `fitted ${kind} law`, x: vs, y: Ffit, style: 'line', tone: 1 },
        ...bandSeries,
        { label: 'measured points', x: inside.map((i) => data.v[i]!), y: inside.map((i) => data.F[i]!), style: 'points', tone: 0 },
        ...(outsideIdx.length ? [{ label: 'outside the band', x: outsideIdx.map((i) => data.v[i]!), y: outsideIdx.map((i) => data.F[i]!), style: 'points' as const, tone: 3 }] : []),
      ],
      ...(knee ? { markers: [{ x: knee, label: 'knee' }, { x: -knee, label: 'knee' }] } : {}),
      summary: `${data.v.length} points (${fit.nRebound} rebound, ${fit.nCompression} compression) from ${q(vmin, 'velocity', 3)} to ${q(vmax, 'velocity', 3)}; the fitted ${kind} law has R² = ${r2}${band > 0 ? ` and ${out.size} point(s) lie outside the ±${(band * 100).toPrecision(3)} % band` : ''}.`,
    },
    {
      id: 'residuals',
      title: 'Residuals: measured minus fitted force',
      x: { label: 'Velocity', kind: 'velocity' },
      y: { label: 'Force residual', kind: 'force' },
      series: [
        { label: 'residual', x: data.v, y: fit.residuals, style: 'points', tone: 0 },
        { label: 'zero', legend: false, x: [vmin, vmax], y: [0, 0], style: 'thin', tone: 4 },
        ...(band > 0 || floor > 0 ? [
          { label: 'band half-width', x: vs, y: hw, style: 'dash' as const, tone: 2 },
          { label: 'band (lower)', legend: false as const, x: vs, y: hw.map((h) => -h), style: 'dash' as const, tone: 2 },
        ] : []),
      ],
      summary: `RMS force error ${q(fit.rmsError, 'force', 3)}; the largest residual is ${q(maxAbsOf(fit.residuals), 'force', 3)}. A pattern in the residuals (not scatter) means the law does not suit the damper.`,
    },
  ];
}
