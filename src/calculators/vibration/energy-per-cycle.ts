import { damperForce, equivalentDampingRatio, harmonicDuty, seriesHarmonic } from '../../core/dampers/index.ts';
import { InputRangeError } from '../../core/errors.ts';
import { defineCalculator, num, optNum, type ChartSpec, type Values } from '../types.ts';
import { lawChart } from '../shared/damperLawChart.ts';
import { lawFromValues, lawInputs, lawStudy, seriesStiffness } from '../shared/damperLawInputs.ts';
import { q } from '../quantityText.ts';

const LAW = lawInputs({ defaults: { law: 'linear', c: 1500, Fref: 1500, c1: 2000, c2: 600, c1c: 800, c2c: 240, kh: 16000 } });

function setup(values: Values) {
  const X = num(values, 'X');
  const omega = 2 * Math.PI * num(values, 'f');
  return { X, omega, k: optNum(values, 'k'), ks: seriesStiffness(values), law: lawFromValues(values) };
}

/** Energy a damper law dissipates per cycle of harmonic stroke, its mean power and equivalent viscous damping. */
export const energyPerCycleCalculator = defineCalculator({
  id: 'energy-per-cycle',
  title: 'Damper laws: energy per cycle',
  summary: 'Energy dissipated per cycle of harmonic stroke, mean power, equivalent viscous coefficient and damping ratio, and peak force for linear, power-law, Coulomb, bilinear and hysteretic dampers.',
  inputs: [
    ...LAW,
    { key: 'X', label: 'Stroke amplitude X', kind: 'length', default: 0.025, min: 0, max: 10, minExclusive: true, required: true, help: 'Displacement amplitude across the damper, x = X sin ωt.' },
    { key: 'f', label: 'Frequency f', kind: 'frequency', default: 1.5, min: 0, max: 1e5, minExclusive: true, required: true, help: 'Frequency of the harmonic stroke.' },
    { key: 'k', label: 'Spring rate k', kind: 'stiffness', default: 16000, min: 0, max: 1e12, minExclusive: true, optional: true, help: 'Optional: stiffness in parallel, for ζ_eq.' },
  ],
  outputs: [
    { key: 'E', label: 'Energy per cycle E_D', kind: 'energy' },
    {
      key: 'P', label: 'Mean power P̄', kind: 'power', help: 'E_D·f: heat the damper must shed in steady cycling.',
      feeds: [{ page: 'steady-temperature', input: 'P', label: 'Steady damper temperature at this power' }],
    },
    { key: 'ceq', label: 'Equivalent viscous coefficient c_eq', kind: 'damping', help: 'Linear damper dissipating the same E_D at this X and f.' },
    { key: 'zetaEq', label: 'Equivalent damping ratio ζ_eq', kind: 'fraction', optional: true, help: 'E_D/(4π·½kX²); needs k.' },
    { key: 'Fmax', label: 'Peak force F_max', kind: 'force' },
    { key: 'vmax', label: 'Peak stroke velocity', kind: 'velocity', help: 'Of the damper itself (with a series stiffness its own stroke is smaller).' },
    { key: 'Kstorage', label: 'Storage stiffness K′', kind: 'stiffness', optional: true, help: 'With a series stiffness k_s: the part of the force in phase with the stroke (Maxwell model).' },
    { key: 'Kloss', label: 'Loss stiffness K″', kind: 'stiffness', optional: true, help: 'With k_s: the part in phase with the stroke velocity; E_D = π·K″·X².' },
    { key: 'strokeShare', label: 'Share of the stroke taken by the damper', kind: 'fraction', optional: true, help: 'With k_s: |x_d|/|x| (the spring takes the rest).' },
  ],
  compute(values) {
    const { X, omega, k, ks, law } = setup(values);
    const warnings: string[] = [];
    if (law.kind === 'hysteretic') {
      const cH = (law.eta * law.k) / omega;
      if (!Number.isFinite(cH)) throw new InputRangeError('f', omega / (2 * Math.PI), undefined, 'Hz', 'too low for the hysteretic law: its viscous equivalent ηk_h/ω has no finite value');
      warnings.push(`Hysteretic law evaluated as the viscous damper c = ηk_h/ω = ${cH.toPrecision(4)} N·s/m at this frequency.`);
    }
    if (ks === undefined) {
      const d = harmonicDuty(law, X, omega);
      if (law.kind === 'bilinear' && d.vmax <= law.vknee) warnings.push('Peak velocity below the knee: only the low-speed slopes act.');
      return { outputs: { E: d.E, P: d.P, ceq: d.ceq, zetaEq: k === undefined ? undefined : equivalentDampingRatio(d.E, k, X), Fmax: d.Fmax, vmax: d.vmax }, warnings };
    }
    const s = seriesHarmonic(law, ks, X, omega);
    if (law.kind !== 'linear' && law.kind !== 'hysteretic') warnings.push(`Series stiffness with a ${law.kind} law: evaluated by equivalent linearisation (first harmonic of the damper's own stroke, ${(s.Xd * 1000).toPrecision(3)} mm); exact for the linear law only. The damper simulation page integrates the nonlinear element in time.`);
    if (s.stuck) warnings.push(`The friction damper never slips: 4F_f/π exceeds k_s·X, so the spring takes the whole stroke and nothing is dissipated.`);
    if (law.kind === 'bilinear' && (law.rebound.c1 !== law.compression.c1 || law.rebound.c2 !== law.compression.c2)) warnings.push('Unequal rebound and compression with a series spring make the damper drift to an offset; the first harmonic ignores it.');
    return {
      outputs: {
        E: s.E, P: s.P, ceq: s.ceq, zetaEq: k === undefined ? undefined : equivalentDampingRatio(s.E, k, X), Fmax: s.Fmax, vmax: s.vmax,
        Kstorage: s.Kstorage, Kloss: s.Kloss, strokeShare: s.strokeShare,
      },
      warnings,
    };
  },
  charts(values, result): ChartSpec[] {
    const { X, omega, ks, law } = setup(values);
    const n = 241;
    const th = Array.from({ length: n }, (_, i) => (2 * Math.PI * i) / (n - 1));
    const E = result.outputs.E as number;
    const Fmax = result.outputs.Fmax as number;
    const vd = result.outputs.vmax as number;
    // with k_s the loop is the first-harmonic ellipse F = K′x + (K″/ω)ẋ of the whole element
    const Ks = result.outputs.Kstorage as number | undefined;
    const Kl = result.outputs.Kloss as number | undefined;
    const loopX = th.map((t) => X * Math.sin(t));
    const loopF = ks === undefined || Ks === undefined || Kl === undefined
      ? th.map((t) => damperForce(law, X * omega * Math.cos(t), omega))
      : th.map((t) => Ks * X * Math.sin(t) + Kl * X * Math.cos(t));
    return [
      {
        id: 'loop', title: 'Force–displacement loop',
        x: { label: 'Stroke x', kind: 'length' }, y: { label: 'Damper force F', kind: 'force' },
        series: [{ label: ks === undefined ? 'F(x) over one cycle' : 'F(x) of damper and series spring (first harmonic)', x: loopX, y: loopF, tone: 0 }],
        summary: `One cycle of stroke ±${q(X, 'length', 3)} at ${q(omega / (2 * Math.PI), 'frequency', 3)}: the loop encloses E_D = ${q(E, 'energy')}; peak force ${q(Fmax, 'force')}.`,
      },
      lawChart(law, vd > 0 ? vd : X * omega, omega),
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
      inputs: { law: 'power', Fref: 800, vref: 1, alpha: 0.5, X: 0.025, f: 1.5 },
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
      inputs: { law: 'hysteretic', eta: 0.1, kh: 1e5, X: 0.01, f: 50 / (2 * Math.PI) },
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
    {
      name: 'Linear c = 1 MN·s/m in series with k_s = 10 MN/m at 1 Hz (ωτ = 0.6283): K′ = 2.830 MN/m, K″ = 4.505 MN/m, c_eq = 0.717 MN·s/m',
      inputs: { law: 'linear', c: 1e6, ks: 1e7, X: 0.01, f: 1 },
      expected: { Kstorage: 2.8304e6, Kloss: 4.5048e6, ceq: 7.1696e5, E: Math.PI * 4.5048e6 * 1e-4 },
      tolerance: 1e-4,
      why: 'Maxwell closed form K′ = k_s(ωτ)²/(1+(ωτ)²), K″ = k_s·ωτ/(1+(ωτ)²), c_eq = K″/ω, worked by hand to 5 s.f.',
      source: { key: 'christopoulos2006', locator: 'ch. on fluid viscous dampers, Maxwell model (from memory)' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'christopoulos2006', locator: 'Maxwell model of a viscous damper on a flexible brace (from memory)' },
    { key: 'chopra2017', locator: 'eq. 3.8.1 (published); §3.9–3.10 (from memory)' },
    { key: 'fema274', locator: '§9.3, fluid viscous devices (from memory)' },
    { key: 'dixon2007', locator: 'damper characteristics, bilinear tuning (from memory)' },
  ],
  study: {
    inputs: { X: 'strokeAmplitude', f: 'strokeFrequency', ...lawStudy(LAW) },
    publishes: { P: 'meanPower' },
  },
});
