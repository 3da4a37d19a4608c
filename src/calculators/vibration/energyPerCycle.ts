import { damperForce, equivalentDampingRatio, harmonicDuty, lawBreakpoints } from '../../core/dampers/index.ts';
import { defineCalculator, num, type ChartSpec, type Values } from '../types.ts';
import { lawInputs, lawFromValues, stiffness } from './damperLawInputs.ts';
import { q } from '../quantityText.ts';

function setup(values: Values) {
  const X = num(values, 'X');
  const omega = 2 * Math.PI * num(values, 'f');
  const k = stiffness(values);
  return { X, omega, k, law: lawFromValues(values, k) };
}

/** Energy a damper law dissipates per cycle of harmonic stroke, its mean power and equivalent viscous damping. */
export const energyPerCycle = defineCalculator({
  id: 'energy-per-cycle',
  title: 'Damper laws: energy per cycle',
  summary: 'Energy dissipated per cycle of harmonic stroke, mean power, equivalent viscous coefficient and damping ratio, and peak force for linear, power-law, Coulomb, bilinear and hysteretic dampers.',
  inputs: [
    ...lawInputs('linear'),
    { key: 'X', label: 'Stroke amplitude X', kind: 'length', default: 0.025, min: 0, max: 10, minExclusive: true, required: true, help: 'Displacement amplitude across the damper, x = X sin ωt.' },
    { key: 'f', label: 'Frequency f', kind: 'frequency', default: 1.5, min: 0, max: 1e5, minExclusive: true, required: true, help: 'Frequency of the harmonic stroke.' },
    { key: 'k', label: 'Spring rate k', kind: 'stiffness', default: 16000, min: 0, max: 1e12, minExclusive: true, optional: true, help: 'Optional: stiffness in parallel, for ζ_eq. The hysteretic law needs it (η acts on k).' },
  ],
  outputs: [
    { key: 'E', label: 'Energy per cycle E_D', kind: 'energy' },
    {
      key: 'P', label: 'Mean power P̄', kind: 'power', help: 'E_D·f: heat the damper must shed in steady cycling.',
      feeds: [{ page: 'steady-temperature', input: 'P', label: 'Steady damper temperature at this power' }],
    },
    { key: 'ceq', label: 'Equivalent viscous coefficient c_eq', kind: 'damping', help: 'Linear damper dissipating the same E_D at this X and f.' },
    { key: 'zetaEq', label: 'Equivalent damping ratio ζ_eq', kind: 'dimensionless', optional: true, help: 'E_D/(4π·½kX²); needs k.' },
    { key: 'Fmax', label: 'Peak force F_max', kind: 'force' },
    { key: 'vmax', label: 'Peak stroke velocity', kind: 'velocity' },
  ],
  compute(values) {
    const { X, omega, k, law } = setup(values);
    const d = harmonicDuty(law, X, omega);
    const warnings: string[] = [];
    if (law.kind === 'hysteretic') warnings.push(`Hysteretic law evaluated as the viscous damper c = ηk/ω = ${d.ceq.toPrecision(4)} N·s/m at this frequency.`);
    if (law.kind === 'bilinear' && d.vmax <= law.vknee) warnings.push('Peak velocity below the knee: only the low-speed slopes act.');
    return {
      outputs: { E: d.E, P: d.P, ceq: d.ceq, zetaEq: k === undefined ? undefined : equivalentDampingRatio(d.E, k, X), Fmax: d.Fmax, vmax: d.vmax },
      warnings,
    };
  },
  charts(values, result): ChartSpec[] {
    const { X, omega, law } = setup(values);
    const V = X * omega;
    const n = 241;
    const th = Array.from({ length: n }, (_, i) => (2 * Math.PI * i) / (n - 1));
    const loopX = th.map((t) => X * Math.sin(t));
    const loopF = th.map((t) => damperForce(law, V * Math.cos(t), omega));
    // velocity grid with the law's breakpoints inserted, so kinks and the Coulomb jump are drawn sharp
    const vs = Array.from({ length: 201 }, (_, i) => -V + (2 * V * i) / 200);
    for (const b of lawBreakpoints(law)) if (Math.abs(b) < V) vs.push(b, b);
    vs.sort((a, b) => a - b);
    const fv = vs.map((v, i) => (law.kind === 'coulomb' && v === 0 ? (vs[i - 1] === 0 ? law.Ff : -law.Ff) : damperForce(law, v, omega)));
    const E = result.outputs.E as number;
    const Fmax = result.outputs.Fmax as number;
    return [
      {
        id: 'loop', title: 'Force–displacement loop',
        x: { label: 'Stroke x', kind: 'length' }, y: { label: 'Damper force F', kind: 'force' },
        series: [{ label: 'F(x) over one cycle', x: loopX, y: loopF, tone: 0 }],
        summary: `One cycle of stroke ±${q(X, 'length', 3)} at ${q(omega / (2 * Math.PI), 'frequency', 3)}: the loop encloses E_D = ${q(E, 'energy')}; peak force ${q(Fmax, 'force')}.`,
      },
      {
        id: 'fv', title: 'Force–velocity curve',
        x: { label: 'Stroke velocity v (+ rebound)', kind: 'velocity' }, y: { label: 'Damper force F', kind: 'force' },
        series: [{ label: `${law.kind} law`, x: vs, y: fv, tone: 1 }],
        summary: `Force of the ${law.kind} law from −${q(V, 'velocity', 3)} to +${q(V, 'velocity', 3)} (positive = rebound); largest magnitude ${q(Fmax, 'force')}.`,
      },
    ];
  },
  verification: [
    {
      name: 'Linear damper c = 1500 N·s/m, X = 25 mm, f = 1.5 Hz: E = πcωX², P̄ = 41.637 W',
      inputs: { law: 'linear', c: 1500, X: 0.025, f: 1.5 },
      expected: { E: 27.7582, P: 41.637, ceq: 1500 },
      tolerance: 1e-4,
      why: 'published closed form; values to 5 s.f.',
      source: { key: 'chopra2017', locator: 'eq. 3.8.1' },
      provenance: 'published',
    },
    {
      name: 'Power-law damper C = 800 N·(s/m)^0.5, α = 0.5, same motion: P̄ = 50.911 W',
      inputs: { law: 'power', c: 800, alpha: 0.5, X: 0.025, f: 1.5 },
      expected: { P: 50.911 },
      tolerance: 1e-4,
      why: 'λ(α) formula from memory, value computed from it to 5 s.f. and confirmed by quadrature',
      source: { key: 'fema274', locator: '§9.3, energy of fluid viscous devices, λ(α) (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Coulomb F_f = 200 N, X = 10 mm, f = 2 Hz: E = 4F_fX = 8 J, c_eq = 2026.42 N·s/m',
      inputs: { law: 'coulomb', Ff: 200, X: 0.01, f: 2 },
      expected: { E: 8, ceq: 2026.42, Fmax: 200 },
      tolerance: 3e-6,
      why: 'closed form, value to 6 s.f.',
      source: { key: 'chopra2017', locator: '§3.10, Coulomb friction (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Hysteretic η = 0.1 on k = 100 kN/m, X = 10 mm, ω = 50 rad/s: E = πηkX² = π J, c_eq = ηk/ω = 200 N·s/m',
      inputs: { law: 'hysteretic', eta: 0.1, k: 1e5, X: 0.01, f: 50 / (2 * Math.PI) },
      expected: { E: Math.PI, ceq: 200 },
      tolerance: 1e-12,
      why: 'closed form, same arithmetic',
      source: { key: 'chopra2017', locator: '§3.10, rate-independent damping (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Linear damper on 10 kg / 4 kN/m with c = 40 N·s/m driven at ω_n: ζ_eq = ζ = 0.1',
      inputs: { law: 'linear', c: 40, k: 4000, X: 0.01, f: 20 / (2 * Math.PI) },
      expected: { zetaEq: 0.1 },
      tolerance: 1e-12,
      why: 'closed form: ζ_eq = E_D/(4π·½kX²) = cω/(2k)',
      source: { key: 'chopra2017', locator: '§3.9, equivalent viscous damping (from memory)' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'chopra2017', locator: 'eq. 3.8.1 (published); §3.9–3.10 (from memory)' },
    { key: 'fema274', locator: '§9.3, fluid viscous devices (from memory)' },
    { key: 'dixon2007', locator: 'damper characteristics, bilinear tuning (from memory)' },
  ],
});
