import { gaussianMeanPower, type DamperLaw } from '../../core/dampers/index.ts';
import { narrowBandStroke, spectralStroke } from '../../core/duty/index.ts';
import { InputRangeError } from '../../core/errors.ts';
import { readUnitRows } from '../../core/thermal/index.ts';
import { choice, defineCalculator, num, text, type ChartSpec, type Values } from '../types.ts';
import { lawChart } from '../shared/damperLawChart.ts';
import { describeLaw, lawFromValues, lawInputs, lawStudy } from '../shared/damperLawInputs.ts';
import { q } from '../quantityText.ts';

/** TW-402 Hall C: a storm's stroke spectrum, a narrow band about the 2 Hz sway mode (invented demo data, σ_x ≈ 0.5 mm). */
const DEMO_PSD = 'f [Hz], S [m²/Hz]\n1.6, 0\n1.8, 1.5e-7\n1.9, 5.0e-7\n2.0, 1.1e-6\n2.1, 5.0e-7\n2.2, 1.5e-7\n2.4, 0';
const MAX_PSD_ROWS = 2000;

// the hysteretic law is defined for harmonic motion only; no series spring in a Gaussian power model
const LAW = lawInputs({ kinds: ['power', 'linear', 'coulomb', 'bilinear'], defaults: { law: 'power', Fref: 200e3, vref: 1, alpha: 0.4, c: 1e6, Ff: 10e3 }, series: false });

function setup(values: Values) {
  const n = num(values, 'n');
  if (!Number.isInteger(n)) throw new InputRangeError('n', n, { min: 1, max: 1000 }, '', 'a whole number of dampers');
  let stroke;
  if (choice(values, 'spectrum') === 'psd') {
    const rows = readUnitRows(text(values, 'psd'), 'psd', [{ name: 'frequency', kind: 'frequency' }, { name: 'PSD', kind: 'displacementPsd' }], MAX_PSD_ROWS).rows;
    stroke = spectralStroke(rows.map((r) => r[0]!), rows.map((r) => r[1]!));
  } else {
    stroke = narrowBandStroke(num(values, 'sx'), num(values, 'fn'));
  }
  return { n, stroke, law: lawFromValues(values) as DamperLaw, t: num(values, 'duration') };
}

/** Long random duty of a damper: RMS velocity, mean power, cycles, seal travel and energy from a Gaussian stroke. */
export const randomDutyCalculator = defineCalculator({
  id: 'random-duty',
  title: 'Long random duty of a damper: power, cycles and seal travel',
  summary: 'Mean power, zero up-crossings (cycles), accumulated seal travel and energy of a damper whose stroke is a stationary Gaussian process — a narrow band at one frequency (wind sway, tuned mass damper strokes) or a stroke PSD — for linear, power-law, friction and bilinear laws.',
  inputs: [
    { key: 'spectrum', label: 'Stroke described by', kind: 'choice', default: 'narrow', options: [
      { value: 'narrow', label: 'RMS stroke at one frequency (narrow band)' },
      { value: 'psd', label: 'stroke PSD table (f, S)' },
    ], help: 'A lightly damped mode moves in a narrow band at its own frequency; a measured or computed spectrum can be pasted instead.' },
    { key: 'sx', label: 'RMS stroke σ_x', kind: 'length', default: 0.0005, min: 0, max: 1, minExclusive: true, required: true, help: 'Root-mean-square damper stroke (the stroke amplitude of a sine is √2 times its RMS).', when: { key: 'spectrum', is: ['narrow'] } },
    { key: 'fn', label: 'Frequency of the band f_n', kind: 'frequency', default: 2, min: 1e-4, max: 1000, required: true, help: 'The mode that carries the motion.', when: { key: 'spectrum', is: ['narrow'] } },
    { key: 'psd', label: 'Stroke PSD (f, S)', kind: 'text', default: DEMO_PSD, maxLength: 60000, rows: 8, help: 'One-sided displacement PSD of the damper stroke, one row per frequency: f, S. Units in a header line ("f [Hz], S [m²/Hz]"); without a header f is in Hz and S in m²/Hz. Frequencies rising; trapezoids between rows, zero outside. # starts a comment.', when: { key: 'spectrum', is: ['psd'] } },
    ...LAW,
    { key: 'duration', label: 'Duration of the duty', kind: 'time', default: 3 * 3600, min: 0, max: 1e9, minExclusive: true, required: true, help: 'How long the motion lasts at this level: a storm lasts hours, the service life of a tuned mass damper decades.' },
    { key: 'n', label: 'Dampers (identical, same stroke)', kind: 'dimensionless', default: 4, min: 1, max: 1000, help: 'For the total power and energy.' },
  ],
  outputs: [
    { key: 'vRms', label: 'RMS stroke velocity σ_v', kind: 'velocity' },
    { key: 'P', label: 'Mean power per damper', kind: 'power', help: 'E[F(v)·v] over the Gaussian velocity: the heat the damper body must shed.',
      feeds: [
        { page: 'steady-temperature', input: 'P', label: 'Steady temperature under this duty' },
        { page: 'warm-up', input: 'P', label: 'Warm-up under this duty' },
        { page: 'damping-fade', input: 'P', label: 'Fade at this power', set: { duty: 'random' } },
      ] },
    { key: 'cycles', label: 'Cycles in the duration (zero up-crossings)', kind: 'dimensionless', digits: 4 },
    { key: 'travel', label: 'Accumulated seal travel', kind: 'length', help: '√(2/π)·σ_v·t: the mean distance the rod slides through its seals.' },
    { key: 'E', label: 'Energy per damper over the duration', kind: 'energy' },
    { key: 'Ptotal', label: 'Mean power, all dampers', kind: 'power' },
    { key: 'Etotal', label: 'Energy, all dampers', kind: 'energy' },
    { key: 'sxUsed', label: 'RMS stroke σ_x', kind: 'length' },
    { key: 'nu0', label: 'Zero up-crossing rate ν₀', kind: 'frequency', help: 'σ_v/(2π·σ_x): the mean frequency of the cycles.' },
  ],
  compute(values) {
    const { n, stroke, law, t } = setup(values);
    const P = gaussianMeanPower(law, stroke.sigmaV);
    const warnings: string[] = [];
    if (choice(values, 'spectrum') === 'psd') warnings.push('Cycles are counted as zero up-crossings (Rice); for a broad spectrum a rainflow count gives fewer, larger cycles.');
    return {
      outputs: {
        vRms: stroke.sigmaV, P, cycles: stroke.nu0 * t, travel: stroke.travelRate * t, E: P * t,
        Ptotal: n * P, Etotal: n * P * t, sxUsed: stroke.sigmaX, nu0: stroke.nu0,
      },
      warnings,
    };
  },
  charts(values, result): ChartSpec[] {
    const { stroke, law } = setup(values);
    const s = Array.from({ length: 61 }, (_, i) => stroke.sigmaV * 10 ** (-1 + i / 30)); // log-spaced: straight on log axes
    const P = s.map((v) => gaussianMeanPower(law, v));
    return [
      lawChart(law, 3 * stroke.sigmaV, 2 * Math.PI * stroke.nu0),
      {
        id: 'power-rms', title: 'Mean power against RMS velocity',
        x: { label: 'RMS velocity', kind: 'velocity', scale: 'log' }, y: { label: 'Mean power', kind: 'power', scale: 'log' },
        series: [{ label: describeLaw(law), x: s, y: P, tone: 0 }],
        markers: [{ x: stroke.sigmaV, label: 'this duty', operating: true }], // σ_v is a result, not an input: marked here
        summary: `Mean power ${q(result.outputs.P as number, 'power')} at σ_v = ${q(stroke.sigmaV, 'velocity')}; from ${q(P[0]!, 'power', 3)} at a tenth of it to ${q(P.at(-1)!, 'power', 3)} at ten times.`,
      },
    ];
  },
  verification: [
    {
      name: 'Narrow band σ_x = 2 mm at 0.2 Hz, linear 1 MN·s/m, 1 h: σ_v = 2.513 mm/s, P = 6.32 W, 720 cycles, 7.22 m',
      inputs: { spectrum: 'narrow', sx: 0.002, fn: 0.2, law: 'linear', c: 1e6, duration: 3600, n: 1 },
      expected: { vRms: 2.51327e-3, P: 6.31655, cycles: 720, travel: 7.21910 },
      tolerance: 2e-5, why: 'closed forms worked to 6 s.f.',
      source: { key: 'newland1993', locator: 'ch. 8, level crossings ν₀⁺ = σ_v/(2πσ_x) (chapter from memory); rice1944 §3.3 (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Power law α = 0.5, C = 10⁵ N·(s/m)^0.5, same stroke: P = C·κ(0.5)·σ_v^1.5, κ(0.5) = 2^0.75·Γ(1.25)/√π = 0.860040',
      inputs: { spectrum: 'narrow', sx: 0.002, fn: 0.2, law: 'power', Fref: 1e5, vref: 1, alpha: 0.5, duration: 3600, n: 1 },
      expected: { P: 1e5 * 0.860040 * 2.513274e-3 ** 1.5 },
      tolerance: 1e-5, why: 'κ(0.5) to 6 s.f. from Γ(1.25) = 0.906402',
      source: { key: 'abramowitz1964', locator: 'eq. 26.2 absolute moments of the normal distribution; Table 6.1 Γ(1.25) (from memory)' },
      provenance: 'from memory',
    },
    {
      name: 'Dry friction F_f = 10 kN: the energy is F_f times the seal travel, P = F_f·√(2/π)·σ_v',
      inputs: { spectrum: 'narrow', sx: 0.002, fn: 0.2, law: 'coulomb', Ff: 1e4, duration: 3600, n: 1 },
      expected: { E: 1e4 * 7.21910, P: 1e4 * 2.00530e-3 },
      tolerance: 2e-5, why: 'closed form: friction work = force × sliding distance',
      source: { key: 'newland1993', locator: 'ch. 8, E|v| = √(2/π)·σ_v of a Gaussian variable (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'PSD table, a triangle at 0.2 Hz enclosing 4·10⁻⁶ m²: σ_x = 2 mm, σ_v = 2.513 mm/s, 720 cycles per hour',
      inputs: { spectrum: 'psd', psd: '0.19, 0\n0.2, 4e-4\n0.21, 0', law: 'linear', c: 1e6, duration: 3600, n: 1 },
      expected: { sxUsed: 0.002, vRms: 2.51327e-3, cycles: 720 },
      tolerance: 2e-5, why: 'closed form: trapezoids on a triangle with zero ends are exact',
      source: { key: 'rice1944', locator: '§3.3, ν₀ = (1/2π)·√(∫ω²S/∫S) (from memory)' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'rice1944', locator: '§3.3 zeros of a random noise current (from memory)' },
    { key: 'newland1993', locator: 'ch. 8 level crossings, peaks and fatigue (from memory)' },
    { key: 'abramowitz1964', locator: 'eq. 26.2 (from memory)' },
  ],
  study: {
    inputs: { duration: 'dutyLength', ...lawStudy(LAW) },
    publishes: { P: 'meanPower' },
  },
});
