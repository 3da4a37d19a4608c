import type { SimulationResult } from '../../core/simulation/index.ts';
import type { ChartSpec } from '../types.ts';
import { q } from '../quantityText.ts';


/** Time-history, loop and energy-audit charts of one simulation run (SI data). */
export function simulationCharts(r: SimulationResult): ChartSpec[] {
  const h = r.history;
  const tEnd = h.t[h.t.length - 1] ?? 0;
  const balance = h.t.map((_, i) => h.stored[i]! + h.dissipated[i]! - h.input[i]!);
  return [
    {
      id: 'displacement', title: 'Displacement across the damper',
      x: { label: 'Time', kind: 'time' }, y: { label: 'Displacement z', kind: 'length' },
      series: [{ label: 'z(t)', x: h.t, y: h.x, tone: 0 }],
      summary: `Over ${q(tEnd, 'time')} the stroke peaks at ${q(r.xMax, 'length')} and settles to ±${q(r.xLastPeriod, 'length')} in the last period.`,
    },
    {
      id: 'force', title: 'Damper force',
      x: { label: 'Time', kind: 'time' }, y: { label: 'Damper force', kind: 'force' },
      series: [{ label: 'F_d(t)', x: h.t, y: h.force, tone: 1 }],
      summary: `Peak damper force ${q(r.forceMax, 'force')} at peak stroke velocity up to ${q(r.vMax, 'velocity')}.`,
    },
    {
      id: 'loop', title: 'Force–displacement loops',
      x: { label: 'Displacement z', kind: 'length' }, y: { label: 'Damper force', kind: 'force' },
      series: [{ label: 'F_d against z', x: h.x, y: h.force, style: 'thin', tone: 2 }],
      summary: `Each loop encloses the energy of one cycle; ${q(r.dissipated, 'energy')} dissipated in all.`,
    },
    {
      id: 'energy', title: 'Energy audit',
      x: { label: 'Time', kind: 'time' }, y: { label: 'Energy', kind: 'energy' },
      series: [
        { label: 'kinetic + spring', x: h.t, y: h.stored, tone: 0 },
        { label: 'dissipated E_D', x: h.t, y: h.dissipated, tone: 3 },
        { label: 'input work W', x: h.t, y: h.input, tone: 4 },
        { label: 'E_k + E_s + E_D − W (equals E₀)', x: h.t, y: balance, style: 'dash', tone: 5 },
      ],
      summary: `Initial energy ${q(r.E0, 'energy')}, input work ${q(r.input, 'energy')}, dissipated ${q(r.dissipated, 'energy')}; the balance holds to ${r.closure.toExponential(1)} of the energy scale ${q(r.energyScale, 'energy')}.`,
    },
  ];
}
