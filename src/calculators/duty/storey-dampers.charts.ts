/**
 * Charts of storey-dampers: the mode shape over the height, and per storey the damper force and the
 * energy per cycle. Their summaries are the per-storey table in words, with every quantity in the
 * reader's units (q tokens).
 */
import { q } from '../quantityText.ts';
import type { ChartSpec } from '../types.ts';
import type { StoreyAnalysis } from './storey-dampers.analysis.ts';

/** @param cycles cycles per event, for the heat per event of each storey's damper */
export function storeyCharts(a: StoreyAnalysis, cycles: number): ChartSpec[] {
  const heights = [0];
  for (const r of a.rows) heights.push(heights[heights.length - 1]! + r.h);
  const storeyNo = a.rows.map((_, j) => j + 1);
  const withDampers = a.rows.map((r, j) => ({ r, s: a.duty.storeys[j]!, j })).filter((x) => x.r.n > 0);
  const modeList = a.phi.map((p, j) => `floor ${j + 1} ${p.toFixed(3)}`).join(', ');
  const forceList = withDampers.map(({ r, s, j }) => `storey ${j + 1}: ${r.n} × ${q(s.Fpeak, 'force', 3)} at a stroke of ${q(s.stroke, 'length', 3)} (drift ${q(s.drift, 'length', 3)})`).join('; ');
  const energyList = withDampers.map(({ s, j }) => `storey ${j + 1}: ${q(s.W, 'energy', 3)} per cycle, ${q(s.W / a.T, 'power', 3)} mean, ${q(s.W * cycles, 'energy', 3)} per event`).join('; ');
  return [
    {
      id: 'mode-shape', title: 'Fundamental mode shape over the height',
      x: { label: 'Mode shape φ (roof = 1)', kind: 'dimensionless' }, y: { label: 'Height above ground', kind: 'length', min: 0 },
      series: [
        { label: 'mode 1', x: [0, ...a.phi], y: heights, tone: 0 },
        { label: 'floors', x: a.phi, y: heights.slice(1), style: 'points', tone: 0, legend: false },
      ],
      summary: `Mode shape at the floors: ${modeList}; period ${q(a.T, 'time', 4)}, Γ₁ = ${a.modal.gamma.toPrecision(4)}.`,
    },
    {
      id: 'storey-force', title: 'Peak force of one damper in each storey',
      x: { label: 'Storey (1 = ground storey)', kind: 'dimensionless' }, y: { label: 'Peak damper force', kind: 'force', min: 0 },
      series: [{ label: 'peak force', x: storeyNo, y: a.duty.storeys.map((s, j) => (a.rows[j]!.n > 0 ? s.Fpeak : 0)), style: 'points', tone: 1 }],
      summary: `Per damper at a roof amplitude of ${q(a.roof, 'length', 3)}: ${forceList}.`,
    },
    {
      id: 'storey-energy', title: 'Energy per cycle of one damper in each storey',
      x: { label: 'Storey (1 = ground storey)', kind: 'dimensionless' }, y: { label: 'Energy per cycle', kind: 'energy', min: 0 },
      series: [{ label: 'energy per cycle', x: storeyNo, y: a.duty.storeys.map((s, j) => (a.rows[j]!.n > 0 ? s.W : 0)), style: 'points', tone: 2 }],
      summary: `${energyList}. The hottest damper is in storey ${a.hot + 1}.`,
    },
  ];
}
