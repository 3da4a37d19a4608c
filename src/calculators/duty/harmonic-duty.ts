import { damperForce, harmonicDuty, seriesHarmonic, type DamperLaw } from '../../core/dampers/index.ts';
import { defineCalculator, num, type ChartSpec, type Values } from '../types.ts';
import { lawChart } from '../shared/damperLawChart.ts';
import { describeLaw, lawFromValues, lawInputs, lawStudy, seriesStiffness } from '../shared/damperLawInputs.ts';
import { q } from '../quantityText.ts';

const LAW = lawInputs({ defaults: { law: 'linear', c: 1500, Fref: 800, vref: 1, alpha: 0.5 } });

function setup(values: Values) {
  return { law: lawFromValues(values), ks: seriesStiffness(values), X: num(values, 'X'), omega: 2 * Math.PI * num(values, 'f') };
}

/** The duty at stroke X and ω, with the series spring when given (equivalent linearisation; exact for the linear law). */
function duty(law: DamperLaw, ks: number | undefined, X: number, omega: number) {
  if (ks === undefined) return harmonicDuty(law, X, omega);
  const s = seriesHarmonic(law, ks, X, omega);
  return { E: s.E, P: s.P, ceq: s.ceq, Fmax: s.Fmax, vmax: s.vmax, vrms: s.vmax / Math.SQRT2, strokeShare: s.strokeShare };
}

/** Harmonic stroke → energy per cycle, mean power, RMS velocity and peak force for any damper law. */
export const harmonicDutyCalculator = defineCalculator({
  id: 'harmonic-duty',
  offMainThread: true, // was over a frame with charts before 0.5.1's bilinear closed form (p99 now 3.3 ms); kept: a spring-mounted law sweeps 61 bisections
  title: 'Damper power under harmonic stroke',
  summary: 'Mean power, energy per cycle, RMS velocity and peak force of a damper driven through a sinusoidal stroke, for linear, power-law, friction, bilinear and hysteretic damper laws.',
  inputs: [
    { key: 'X', label: 'Stroke amplitude (half of peak-to-peak)', kind: 'length', default: 0.025, min: 0, max: 10, minExclusive: true, required: true, help: 'Displacement amplitude across the damper: x = X·sin ωt.' },
    { key: 'f', label: 'Frequency', kind: 'frequency', default: 1.5, min: 1e-6, max: 1e4, required: true, help: 'Cycles per second of the stroke (from 10⁻⁶ Hz: slower motion makes no heat worth checking).' },
    ...LAW,
  ],
  outputs: [
    { key: 'P', label: 'Mean power', kind: 'power', help: 'Heat generated in the damper, averaged over a cycle.',
      feeds: [{ page: 'steady-temperature', input: 'P', label: 'Check damper body temperature' }, { page: 'warm-up', input: 'P', label: 'Warm-up under this stroke' }] },
    { key: 'E', label: 'Energy per cycle', kind: 'energy' },
    { key: 'vRms', label: 'RMS velocity', kind: 'velocity' },
    { key: 'vPeak', label: 'Peak velocity', kind: 'velocity' },
    { key: 'Fpeak', label: 'Peak force', kind: 'force' },
    { key: 'ceq', label: 'Equivalent viscous coefficient', kind: 'damping', help: 'The linear damper that dissipates the same energy per cycle at this amplitude and frequency.' },
  ],
  compute(values) {
    const { law, ks, X, omega } = setup(values);
    const d = duty(law, ks, X, omega);
    const warnings = law.kind === 'hysteretic' ? ['A loss-factor law describes harmonic motion only: its energy per cycle πηkX² does not depend on frequency, so at a fixed stroke its power P = πηkX²·f rises linearly with frequency.'] : [];
    if (ks !== undefined) warnings.push(law.kind === 'linear'
      ? `Series stiffness k_s: the damper takes ${(100 * ('strokeShare' in d ? d.strokeShare : 1)).toPrecision(3)} % of the stroke (Maxwell model, closed form); peak and RMS velocity are the damper's own.`
      : `Series stiffness with a ${law.kind} law: evaluated by equivalent linearisation (first harmonic of the damper's own stroke); peak and RMS velocity are the damper's own.`);
    return { outputs: { P: d.P, E: d.E, vRms: d.vrms, vPeak: d.vmax, Fpeak: d.Fmax, ceq: d.ceq }, warnings };
  },
  charts(values, result): ChartSpec[] {
    const { law, ks, X, omega } = setup(values);
    const th = Array.from({ length: 181 }, (_, i) => (2 * Math.PI * i) / 180);
    const x = th.map((t) => X * Math.sin(t));
    const F = ks === undefined ? th.map((t) => damperForce(law, X * omega * Math.cos(t), omega)) : undefined;
    const f0 = omega / (2 * Math.PI);
    // a decade either side; frequencies so small that ω underflows to 0 are left out
    const fs = Array.from({ length: 61 }, (_, i) => f0 * 10 ** (-1 + i / 30)).filter((f) => 2 * Math.PI * f > 0);
    const Pf = fs.map((f) => duty(law, ks, X, 2 * Math.PI * f).P);
    return [
      ...(F ? [{
        id: 'loop', title: 'Force against stroke over one cycle',
        x: { label: 'Stroke', kind: 'length' as const }, y: { label: 'Force', kind: 'force' as const },
        series: [{ label: describeLaw(law), x, y: F, tone: 0 }],
        summary: `The loop encloses ${q(result.outputs.E as number, 'energy')} per cycle; peak force ${q(result.outputs.Fpeak as number, 'force')}.`,
      }] : []),
      lawChart(law, result.outputs.vPeak as number, omega),
      {
        id: 'power-frequency', title: 'Mean power against frequency at this stroke',
        x: { label: 'Frequency', kind: 'frequency', scale: 'log', input: 'f' }, y: { label: 'Mean power', kind: 'power', scale: 'log' },
        series: [{ label: describeLaw(law), x: fs, y: Pf, tone: 0 }],
        summary: `Mean power from ${q(Pf[0]!, 'power', 3)} at ${q(fs[0]!, 'frequency', 3)} to ${q(Pf[Pf.length - 1]!, 'power', 3)} at ${q(fs[fs.length - 1]!, 'frequency', 3)}; ${q(result.outputs.P as number, 'power')} at ${f0.toPrecision(3)} Hz.`,
      },
    ];
  },
  verification: [
    {
      name: 'Linear viscous: E = π·c·ω·X², c = 1500 N·s/m, X = 25 mm, 1.5 Hz',
      inputs: { X: 0.025, f: 1.5, law: 'linear', c: 1500 },
      expected: { P: 41.637, E: Math.PI * 1500 * 3 * Math.PI * 0.025 ** 2, Fpeak: 1500 * 0.025 * 3 * Math.PI },
      tolerance: 1e-4, why: 'published equation; values to 5 s.f.',
      source: { key: 'chopra2017', locator: 'eq. 3.8.1, energy dissipated per cycle by viscous damping' },
      provenance: 'published',
    },
    {
      name: 'Power law C = 800 N·(s/m)^0.5, α = 0.5, same stroke: E = λ(α)·C·ω^α·X^(1+α)',
      inputs: { X: 0.025, f: 1.5, law: 'power', Fref: 800, vref: 1, alpha: 0.5 },
      expected: { P: 50.911 },
      tolerance: 1e-4, why: 'λ(0.5) = 3.49608 (closed form = quadrature); 5 s.f.',
      source: { key: 'fema274', locator: '§9.3 fluid viscous devices, λ(α) (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Dry friction F_f = 200 N, X = 10 mm, 2 Hz: E = 4·F_f·X, c_eq = 4F_f/(πωX)',
      inputs: { X: 0.01, f: 2, law: 'coulomb', Ff: 200 },
      expected: { E: 8, ceq: 2026.42, P: 16 },
      tolerance: 1e-5, why: 'closed form; c_eq to 6 s.f.',
      source: { key: 'chopra2017', locator: '§3.10 Coulomb friction, equivalent viscous damping (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Hysteretic η = 0.1 on k = 10⁵ N/m, X = 10 mm, ω = 50 rad/s: E = π·η·k·X², c_eq = ηk/ω',
      inputs: { X: 0.01, f: 50 / (2 * Math.PI), law: 'hysteretic', eta: 0.1, kh: 1e5 },
      expected: { E: Math.PI, ceq: 200 },
      tolerance: 1e-9, why: 'closed form, same arithmetic',
      source: { key: 'chopra2017', locator: '§3.10 rate-independent damping (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Linear c = 1 MN·s/m on a k_s = 10 MN/m brace, X = 10 mm at 1 Hz: E = π·K″·X² with K″ = 4.505 MN/m',
      inputs: { X: 0.01, f: 1, law: 'linear', c: 1e6, ks: 1e7 },
      expected: { E: Math.PI * 4.5048e6 * 1e-4, ceq: 7.1696e5 },
      tolerance: 1e-4, why: 'Maxwell closed form, K″ = k_s·ωτ/(1+(ωτ)²) with ωτ = 0.6283, worked by hand to 5 s.f.',
      source: { key: 'christopoulos2006', locator: 'Maxwell model of a viscous damper (from memory)' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'chopra2017', locator: 'eq. 3.8.1; §3.9–3.10 (from memory)' },
    { key: 'christopoulos2006', locator: 'Maxwell model (from memory)' },
    { key: 'fema274', locator: '§9.3 (from memory)' },
  ],
  study: {
    inputs: { X: 'strokeAmplitude', f: 'strokeFrequency', ...lawStudy(LAW) },
    publishes: { P: 'meanPower' },
  },
});
