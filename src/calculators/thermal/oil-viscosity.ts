import { isoViscosityGrade, waltherFit, waltherViscosity } from '../../core/thermal/index.ts';
import { defineCalculator, num, type ChartSpec, type Values } from '../types.ts';
import { q } from '../quantityText.ts';
import { ZERO_CELSIUS } from '../../core/constants.ts';

const VIS_A = { nu40: 32e-6, nu100: 5.4e-6 } as const;

function fit(values: Values) {
  return waltherFit(num(values, 'nu40'), num(values, 'nu100'));
}

/** Oil viscosity at any temperature from the 40 °C and 100 °C values (ASTM D341). */
export const oilViscosityCalculator = defineCalculator({
  id: 'oil-viscosity',
  title: 'Oil viscosity against temperature',
  summary: 'Kinematic viscosity of a damper oil at any temperature from its 40 °C and 100 °C values by the ASTM D341 (Walther) line, with the ISO 3448 grade.',
  inputs: [
    { key: 'nu40', label: 'Viscosity at 40 °C ν40', kind: 'kinematicViscosity', default: 20e-6, min: 2e-6, max: 5e-3, required: true, help: 'From the oil data sheet, mm²/s (cSt).' },
    { key: 'nu100', label: 'Viscosity at 100 °C ν100', kind: 'kinematicViscosity', default: 4.5e-6, min: 1e-6, max: 1e-3, required: true, help: 'From the oil data sheet; must be below ν40.' },
    { key: 'T', label: 'Oil temperature T', kind: 'temperature', default: 353.15, min: 233.15, max: 473.15, help: 'Where the viscosity is wanted (−40 °C to 200 °C).' },
  ],
  outputs: [
    { key: 'nu', label: 'Viscosity at T', kind: 'kinematicViscosity' },
    { key: 'A', label: 'D341 constant A', kind: 'dimensionless', digits: 7 },
    { key: 'B', label: 'D341 constant B', kind: 'dimensionless', digits: 7 },
    { key: 'ratio40', label: 'ν(T)/ν40', kind: 'dimensionless', help: 'The factor the viscous part of the damping follows.' },
    { key: 'grade', label: 'ISO 3448 grade', kind: 'text' },
  ],
  compute(values) {
    const f = fit(values);
    const T = num(values, 'T');
    const nu = waltherViscosity(f, T);
    const warnings: string[] = [];
    if (nu < 2e-6) warnings.push('Below 2 mm²/s the simple D341 form (ν + 0.7) loses accuracy; the standard adds correction terms there.');
    if (T < ZERO_CELSIUS || T > ZERO_CELSIUS + 150) warnings.push('Outside 0–150 °C the line is an extrapolation of two points: check against measured data.');
    return { outputs: { nu, A: f.A, B: f.B, ratio40: nu / num(values, 'nu40'), grade: isoViscosityGrade(num(values, 'nu40')) }, warnings };
  },
  charts(values, result): ChartSpec[] {
    const f = fit(values);
    const T = Array.from({ length: 51 }, (_, i) => 253.15 + 4 * i); // −20 °C to 180 °C
    const nu = T.map((t) => waltherViscosity(f, t));
    return [{
      id: 'viscosity',
      title: 'Kinematic viscosity against temperature',
      x: { label: 'Oil temperature', kind: 'temperature', input: 'T' },
      y: { label: 'Kinematic viscosity', kind: 'kinematicViscosity', scale: 'log' },
      series: [
        { label: 'ASTM D341 line', x: T, y: nu, tone: 0 },
        { label: 'data points', x: [313.15, 373.15], y: [num(values, 'nu40'), num(values, 'nu100')], style: 'points', tone: 3 },
      ],
      markers: [{ x: num(values, 'T'), label: 'T' }],
      summary: `Viscosity falls from ${q(nu[0]!, 'kinematicViscosity', 3)} at ${q(T[0]!, 'temperature', 3)} to ${q(nu.at(-1)!, 'kinematicViscosity', 3)} at ${q(T.at(-1)!, 'temperature', 3)}; ${q(result.outputs.nu as number, 'kinematicViscosity')} at the chosen temperature.`,
    }];
  },
  verification: [
    {
      name: 'ν40 = 32.0, ν100 = 5.4 mm²/s: constants and ν at 0 °C',
      inputs: { ...VIS_A, T: 273.15 },
      expected: { A: 9.530815, B: 3.746578, nu: 336.00e-6 },
      tolerance: 1e-4,
      why: 'independent evaluation of the two-point D341 line, 5–7 s.f.',
      source: { key: 'astmD341', locator: 'two-point viscosity–temperature equation (from memory)' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'Same oil at 20 °C and 120 °C',
      inputs: { ...VIS_A, T: 393.15 },
      expected: { nu: 3.7239e-6 },
      tolerance: 1e-4,
      why: 'independent evaluation, 5 s.f.',
      source: { key: 'astmD341', locator: 'two-point viscosity–temperature equation (from memory)' },
      provenance: 'reference library numpy (independent evaluation, version not recorded)',
    },
    {
      name: 'The line passes through its own 40 °C point; ISO grade of a 32 mm²/s oil',
      inputs: { ...VIS_A, T: 313.15 },
      expected: { nu: 32e-6, grade: 'ISO VG 32' },
      tolerance: 1e-9,
      why: 'closed form: the fit reproduces its data to rounding',
      source: { key: 'iso3448', locator: 'Table 1 (from memory)' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'astmD341', locator: 'viscosity–temperature equation (from memory)' },
    { key: 'iso3448', locator: 'Table 1 (from memory)' },
  ],
  study: {
    inputs: { nu40: 'oilViscosity40', nu100: 'oilViscosity100' },
  },
});
