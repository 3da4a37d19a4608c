import { abs, complex, div } from '../../core/complex/index.ts';
import { naturalFrequency, tmdPeak, tmdResponse, tmdTuning, type TmdExcitation, type TmdSystem } from '../../core/vibration/index.ts';
import { choice, defineCalculator, num, type ChartSpec, type Values } from '../types.ts';
import { q } from '../quantityText.ts';

const TAU = 2 * Math.PI;

function setup(values: Values) {
  const excitation = choice<TmdExcitation>(values, 'excitation');
  const mu = num(values, 'mu');
  const m1 = num(values, 'm1');
  const k1 = num(values, 'k1');
  const w1 = naturalFrequency(m1, k1);
  const tune = tmdTuning(mu, excitation);
  const load: 'force' | 'base' = excitation === 'force' || excitation === 'white-force' ? 'force' : 'base';
  // static unit: F0/k1 for a force, m1·a/k1 = a/ω1² for a base acceleration
  const unit = load === 'force' ? num(values, 'F0') / k1 : num(values, 'ag') / (w1 * w1);
  const sys: TmdSystem = { mu, f: tune.f, zeta: tune.zeta, zeta1: num(values, 'zeta1') };
  return { excitation, mu, m1, k1, w1, tune, load, unit, sys };
}

/** Classical absorber tuning for an undamped primary, then the exact 2-DOF response with those values. */
export const tmdTuningCalculator = defineCalculator({
  id: 'tmd-tuning',
  title: 'Tuned mass damper: tuning and exact response',
  summary: 'Optimum absorber frequency and damping (Den Hartog for a harmonic force, Warburton for harmonic base acceleration and white noise), absorber mass, spring and damper, then the exact peak response, absorber stroke, damper force and damper power.',
  inputs: [
    { key: 'mu', label: 'Mass ratio μ = m_a/m₁', kind: 'fraction', default: 0.02, min: 0.001, max: 1, required: true, help: 'Absorber mass over the primary (modal) mass; 0.01–0.05 is usual for floors and footbridges.' },
    { key: 'm1', label: 'Primary (modal) mass m₁', kind: 'mass', default: 14_000, min: 0, max: 1e9, minExclusive: true, required: true, help: 'Mass of the primary system, or the modal mass of the mode to control.' },
    { key: 'k1', label: 'Primary (modal) stiffness k₁', kind: 'stiffness', default: 2.44e6, min: 0, max: 1e12, minExclusive: true, required: true, help: 'Stiffness of the primary, or modal stiffness m₁ω₁².' },
    {
      key: 'excitation', label: 'Excitation and criterion', kind: 'choice', default: 'force',
      options: [
        { value: 'force', label: 'Harmonic force, minimise peak response (Den Hartog)' },
        { value: 'base', label: 'Harmonic base acceleration, minimise peak relative response (Warburton)' },
        { value: 'white-force', label: 'White-noise force, minimise response variance (Warburton)' },
        { value: 'white-base', label: 'White-noise base acceleration, minimise relative response variance (Warburton)' },
      ],
      help: 'What drives the primary and which measure of its response the tuning minimises.',
    },
    { key: 'zeta1', label: 'Primary damping ratio ζ₁', kind: 'fraction', default: 0, min: 0, max: 0.2, help: 'Used only in the exact response; the tuning formulas assume an undamped primary.' },
    { key: 'F0', label: 'Force amplitude F₀', kind: 'force', default: 250, min: 0, max: 1e9, minExclusive: true, when: { key: 'excitation', is: ['force', 'white-force'] }, help: 'Amplitude of a harmonic force for the stroke, damper force and power at the worst frequency.' },
    { key: 'ag', label: 'Base acceleration amplitude', kind: 'acceleration', default: 0.1, min: 0, max: 1e3, minExclusive: true, when: { key: 'excitation', is: ['base', 'white-base'] }, help: 'Amplitude of a harmonic base acceleration for the stroke, damper force and power at the worst frequency.' },
  ],
  outputs: [
    { key: 'fopt', label: 'Frequency ratio ω_a/ω₁', kind: 'dimensionless', digits: 5 },
    { key: 'zeta', label: 'Absorber damping ratio ζ_a = c/(2m_aω_a)', kind: 'fraction', digits: 5, help: 'Referred to the absorber’s own natural frequency.' },
    { key: 'zetaDH', label: 'Same damping as c/(2m_aω₁) (Den Hartog’s c/c_c)', kind: 'fraction', digits: 5, help: 'Referred to the primary’s frequency: ζ_a·ω_a/ω₁.' },
    { key: 'md', label: 'Absorber mass m_a', kind: 'mass' },
    { key: 'kd', label: 'Absorber spring k_a', kind: 'stiffness' },
    { key: 'cd', label: 'Absorber damper c_a', kind: 'damping' },
    { key: 'fa', label: 'Absorber natural frequency', kind: 'frequency' },
    { key: 'peak', label: 'Peak primary amplification (exact)', kind: 'dimensionless', help: 'Maximum over frequency of X₁ over the static deflection (F₀/k₁, or m₁a/k₁ for base acceleration).' },
    { key: 'fpeak', label: 'Worst frequency', kind: 'frequency' },
    { key: 'x1', label: 'Primary amplitude at the worst frequency', kind: 'length' },
    { key: 'stroke', label: 'Absorber stroke amplitude at the worst frequency', kind: 'length', help: 'Relative motion of absorber and primary, |X_a − X₁|.' },
    { key: 'Fd', label: 'Absorber damper force amplitude', kind: 'force' },
    { key: 'Pd', label: 'Mean absorber damper power', kind: 'power', help: '½c_aω²·stroke² at the worst frequency, continuous.', feeds: [{ page: 'steady-temperature', input: 'P', label: 'Check damper body temperature' }] },
  ],
  compute(values) {
    const s = setup(values);
    const md = s.mu * s.m1;
    const wa = s.tune.f * s.w1;
    const cd = 2 * s.tune.zeta * md * wa;
    const pk = tmdPeak(s.sys, s.load);
    const w = pk.beta * s.w1;
    const stroke = pk.stroke * s.unit;
    const warnings: string[] = [];
    if (s.sys.zeta1 > 0) warnings.push('The tuning formulas assume an undamped primary; with ζ₁ > 0 they are near, not at, the optimum. The peak shown includes ζ₁.');
    if (s.excitation.startsWith('white')) warnings.push('White-noise tuning minimises the response variance; the peak shown is the harmonic peak with these values, a little above the least peak that harmonic tuning would give.');
    if (s.mu > 0.1) warnings.push('μ above 0.1 is unusual: check the added mass on the structure and the absorber stroke.');
    return {
      outputs: {
        fopt: s.tune.f, zeta: s.tune.zeta, zetaDH: s.tune.zetaPrimary, md, kd: md * wa * wa, cd, fa: wa / TAU,
        peak: pk.amplification, fpeak: w / TAU, x1: pk.amplification * s.unit, stroke, Fd: cd * w * stroke, Pd: 0.5 * cd * w * w * stroke * stroke,
      },
      warnings,
    };
  },
  charts(values, result): ChartSpec[] {
    const s = setup(values);
    const peak = result.outputs.peak as number;
    const cap = 10 * peak;
    const f1 = s.w1 / TAU;
    const span = Math.max(0.5, 4 * Math.sqrt(s.mu));
    const betas = Array.from({ length: 401 }, (_, i) => Math.max(0.05, 1 - span) + ((2 * span) * i) / 400);
    const bare = (b: number) => {
      const d = complex(1 - b * b, 2 * s.sys.zeta1 * b);
      return d.re === 0 && d.im === 0 ? cap : Math.min(cap, abs(div(complex(1), d)));
    };
    return [{
      id: 'primary',
      title: 'Primary response with and without the absorber',
      x: { label: 'Excitation frequency', kind: 'frequency' },
      y: { label: 'Primary amplification X₁/X_static', kind: 'dimensionless', scale: 'log', max: cap },
      series: [
        { label: 'with the tuned absorber', x: betas.map((b) => b * f1), y: betas.map((b) => abs(tmdResponse(s.sys, b, s.load).x1)), tone: 0 },
        { label: 'without absorber', x: betas.map((b) => b * f1), y: betas.map(bare), style: 'dash', tone: 2 },
        { label: 'worst frequency', x: [result.outputs.fpeak as number], y: [peak], style: 'points', tone: 3 },
      ],
      summary: `With μ = ${s.mu} tuned to ω_a/ω₁ = ${s.tune.f.toPrecision(4)} and ζ_a = ${s.tune.zeta.toPrecision(3)}, the primary peaks at ${peak.toPrecision(4)} × static at ${q(result.outputs.fpeak as number, 'frequency')}; without the absorber the response at ${q(f1, 'frequency', 3)} is ${s.sys.zeta1 > 0 ? `${(1 / (2 * s.sys.zeta1)).toPrecision(3)} × static` : 'unbounded'}.`,
    }];
  },
  verification: [
    {
      name: 'Den Hartog tuning, μ = 0.1: exact peak 4.59022 (fixed-point estimate √(1+2/μ) = 4.58258)',
      inputs: { mu: 0.1, m1: 1, k1: 1, excitation: 'force', F0: 1 },
      expected: { fopt: 1 / 1.1, zeta: Math.sqrt(0.3 / 8.8), zetaDH: Math.sqrt(0.3 / (8 * 1.1 ** 3)), peak: 4.59022 },
      tolerance: 5e-6,
      why: 'tuning is closed form; the peak is an independent frequency scan of the exact 2-DOF response, quoted to 6 s.f.',
      source: { key: 'denHartog1956', locator: 'ch. 3, the damped vibration absorber (from memory); brock1946 for the damping' },
      provenance: 'closed form',
    },
    {
      name: 'Warburton white-noise force, μ = 0.05: f = 0.964212, ζ = 0.109772',
      inputs: { mu: 0.05, m1: 1000, k1: 1e5, excitation: 'white-force', F0: 100 },
      expected: { fopt: 0.964212, zeta: 0.109772, md: 50, kd: 50 * 100 * 0.964212 ** 2 },
      tolerance: 6e-6,
      why: 'closed form evaluated independently, quoted to 6 s.f. (half a unit in the 6th figure is up to 5e-6 relative)',
      source: { key: 'warburton1982', locator: 'optimum-parameter table, white-noise force on the main mass (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Warburton white-noise force, μ = 0.2: f = 0.874007, ζ = 0.208712',
      inputs: { mu: 0.2, m1: 1, k1: 1, excitation: 'white-force', F0: 1 },
      expected: { fopt: 0.874007, zeta: 0.208712 },
      tolerance: 6e-6,
      why: 'closed form evaluated independently, quoted to 6 s.f. (half a unit in the 6th figure is up to 5e-6 relative)',
      source: { key: 'warburton1982', locator: 'optimum-parameter table, white-noise force (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Den Hartog damping forms agree (pitfall): c/(2m_aω_a) = √(3μ/8(1+μ)), c/(2m_aω₁) = √(3μ/8(1+μ)³), μ = 0.05',
      inputs: { mu: 0.05, m1: 2, k1: 8, excitation: 'force', F0: 1 },
      expected: { zeta: Math.sqrt(0.15 / 8.4), zetaDH: Math.sqrt(0.15 / (8 * 1.05 ** 3)), cd: 2 * Math.sqrt(0.15 / (8 * 1.05 ** 3)) * 0.1 * 2 },
      tolerance: 1e-12,
      why: 'closed form, same arithmetic',
      source: { key: 'denHartog1956', locator: 'ch. 3 (from memory)' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'denHartog1956', locator: 'ch. 3, the damped vibration absorber (from memory)' },
    { key: 'brock1946', locator: 'optimum damping' },
    { key: 'warburton1982', locator: 'optimum-parameter tables (from memory)' },
  ],
});
