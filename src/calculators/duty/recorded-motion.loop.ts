/**
 * The loop part of recorded-motion: when the record has a measured force, the loop metrics of
 * each cycle (src/core/duty/loopMetrics.ts) as outputs and warnings, and the work-loop and
 * force–velocity charts. Kept apart from the damper-law part of the calculator.
 */
import { BETA_MIN_END_FORCE, loopDisplacement, loopMetrics, type LoopMetrics, type ParsedRecord, type RecordedMotionResult } from '../../core/duty/index.ts';
import { damperForce, type DamperLaw } from '../../core/dampers/index.ts';
import { lawCurve } from '../shared/damperLawChart.ts';
import type { ChartSeries, ChartSpec, InputDef, OutputDef, Outputs } from '../types.ts';
import { q } from '../quantityText.ts';

/** Layouts whose force column is measured for certain; under 'auto' it depends on the header. */
export const FORCE_LAYOUTS = ['autoF', 'txF', 'tvF'] as const;
/** Layouts under which the damper law may supply the force (its inputs are shown only then). */
export const LAW_LAYOUTS = ['auto', 'tx', 'tv'] as const;

export const loopInputs: InputDef[] = [
  { key: 'loopTol', label: 'Tolerance on energy per loop (cycle to cycle)', kind: 'fraction', default: 0.15, min: 0.001, max: 1, when: { key: 'layout', is: [...FORCE_LAYOUTS, 'auto'] },
    help: 'Largest accepted deviation of one cycle’s loop energy from the mean of all cycles (0.15 = 15 %, the usual prototype-test figure); a larger spread is warned about.' },
];

export const loopOutputs: OutputDef[] = [
  { key: 'Eloop', label: 'Loop energy ∮F dx (mean per cycle)', kind: 'energy', optional: true, help: 'Area of the measured force–displacement loop, mean over the complete cycles.' },
  { key: 'keff', label: 'Effective stiffness k_eff', kind: 'stiffness', optional: true, help: '(|F⁺| + |F⁻|)/(|Δ⁺| + |Δ⁻|): forces at the displacement extremes over the peak-to-peak stroke, mean over the cycles.' },
  { key: 'betaEff', label: 'Effective damping β_eff', kind: 'fraction', optional: true, help: 'E_loop/(2π·k_eff·Δ²), Δ the mean stroke amplitude. Absent for a loop with almost no force at the stroke ends (a velocity-only damper), where it has no meaning.' },
  { key: 'F0', label: 'Force at zero displacement F₀', kind: 'force', optional: true, help: 'Mean of |F| where the displacement passes its mid-stroke, both directions.' },
  { key: 'F0up', label: 'F₀ moving +x (extending)', kind: 'force', optional: true },
  { key: 'F0down', label: 'F₀ moving −x (compressing)', kind: 'force', optional: true },
  { key: 'loopFullness', label: 'Loop fullness E_loop/(4·F_max·Δ)', kind: 'fraction', optional: true, help: '1 for a rectangle (friction), π/4 for an ellipse (linear viscous).' },
  { key: 'EloopDevMax', label: 'Largest cycle deviation of loop energy', kind: 'fraction', optional: true, help: 'Largest |E_i − Ē|/Ē over the complete cycles (0.05 = 5 %).' },
];

/** Loop metrics of a record with measured force and at least one complete cycle, else undefined. */
export function loopOf(rec: ParsedRecord, r: RecordedMotionResult): LoopMetrics | undefined {
  if (!rec.F || r.cycleRanges.length === 0) return undefined;
  const x = rec.x ? Float64Array.from(rec.x) : loopDisplacement(r.t, r.v, r.segments.ranges);
  return loopMetrics(r.t, x, r.F, r.cycleRanges);
}

export function loopResults(m: LoopMetrics | undefined, hasForce: boolean, tol: number | undefined): { outputs: Outputs; warnings: string[] } {
  if (!m) return { outputs: {}, warnings: hasForce ? ['No complete cycle in the record: no loop metrics.'] : [] };
  const warnings: string[] = [];
  const tolerance = tol ?? 0.15;
  if (m.EloopDevMax > tolerance) {
    warnings.push(`The loop energy of one cycle differs from the mean of all ${m.cycles.length} cycles by ${(100 * m.EloopDevMax).toPrecision(3)} %, more than the ${(100 * tolerance).toPrecision(3)} % tolerance: the damper heated, faded or the test was not steady.`);
  }
  if (m.betaEff === undefined) warnings.push(`Effective damping β_eff is not given: the force at the stroke ends is below ${100 * BETA_MIN_END_FORCE} % of the peak force (a velocity-dependent damper has k_eff ≈ 0); use the loop energy and F₀.`);
  return {
    outputs: { Eloop: m.Eloop, keff: m.keff, betaEff: m.betaEff, F0: m.F0, F0up: m.F0up, F0down: m.F0down, loopFullness: m.fullness, EloopDevMax: m.EloopDevMax },
    warnings,
  };
}

function strided(a: ArrayLike<number>, b: ArrayLike<number>, max = 1500): { x: number[]; y: number[] } {
  const step = Math.max(1, Math.ceil(a.length / max));
  const x: number[] = [], y: number[] = [];
  for (let i = 0; i < a.length; i += step) { x.push(a[i]!); y.push(b[i]!); }
  return { x, y };
}

/** Work loop (F against x) and F against v of the measured data, with the law over them when one is chosen. */
export function loopCharts(rec: ParsedRecord, r: RecordedMotionResult, m: LoopMetrics | undefined, law: DamperLaw | undefined): ChartSpec[] {
  if (!rec.F) return [];
  const x = rec.x ? rec.x : loopDisplacement(r.t, r.v, r.segments.ranges);
  const loop: ChartSeries[] = [{ label: 'measured', ...strided(x, r.F), style: 'thin', tone: 1 }];
  const fv: ChartSeries[] = [{ label: 'measured', ...strided(r.v, r.F), style: 'points', tone: 1 }];
  if (law && law.kind !== 'hysteretic') {
    // the chosen law along the measured motion, and its force–velocity curve drawn as on every law page
    const Fl = Float64Array.from(r.v, (v) => damperForce(law, v));
    loop.push({ label: 'chosen law', ...strided(x, Fl), style: 'dash', tone: 3 });
    const curve = lawCurve(law, r.vPeak);
    fv.push({ label: 'chosen law', x: curve.v, y: curve.F, style: 'line', tone: 3 });
  }
  const sum = m
    ? `${m.cycles.length} complete cycle${m.cycles.length > 1 ? 's' : ''}: loop energy ${q(m.Eloop, 'energy')} per cycle, k_eff ${q(m.keff, 'stiffness')}, F₀ ${q(m.F0, 'force')}.`
    : 'No complete cycle in the record.';
  return [
    { id: 'loop', title: 'Work loop: force against displacement', x: { label: 'Displacement', kind: 'length' }, y: { label: 'Force', kind: 'force' }, series: loop, summary: `Measured force against displacement. ${sum}` },
    { id: 'force-velocity', title: 'Force against velocity', x: { label: 'Velocity', kind: 'velocity' }, y: { label: 'Force', kind: 'force' }, series: fv,
      summary: `Measured force against velocity; peak ${q(r.Fpeak, 'force')} at up to ${q(r.vPeak, 'velocity')}${law ? ', with the chosen law' : ''}.` },
  ];
}
