import { logDecrementFromPeaks, naturalFromDampedPeriod, zetaFromLogDecrement } from '../../core/vibration/index.ts';
import { defineCalculator, num, optNum } from '../types.ts';

/** Damping ratio from two peaks of a free decay n cycles apart. */
export const logDecrementCalculator = defineCalculator({
  id: 'log-decrement',
  title: 'Damping from the logarithmic decrement',
  summary: 'Logarithmic decrement and damping ratio (exact and small-damping forms) from two peaks of a free decay; with the damped period and the mass, also the natural frequency, stiffness and damping coefficient.',
  inputs: [
    { key: 'x1', label: 'First peak x₁', kind: 'length', default: 0.004, min: 0, max: 1e3, minExclusive: true, required: true, help: 'Amplitude of a peak, measured from the equilibrium (any unit: only the ratio x₁/xₙ matters).' },
    { key: 'xn', label: 'Peak n cycles later', kind: 'length', default: 0.0015, min: 0, max: 1e3, minExclusive: true, required: true, help: 'Amplitude of the peak of the same sign n whole cycles after x₁.' },
    { key: 'n', label: 'Cycles between the peaks n', kind: 'dimensionless', default: 5, min: 1, max: 1e6, required: true, help: 'Whole number of cycles from x₁ to xₙ.' },
    { key: 'Td', label: 'Damped period T_d (optional)', kind: 'time', default: 0.3, min: 0, max: 1e6, minExclusive: true, optional: true, help: 'Time between successive peaks of the same sign; gives the natural frequency.' },
    { key: 'm', label: 'Moving mass (optional)', kind: 'mass', default: 10, min: 0, max: 1e7, minExclusive: true, optional: true, help: 'With T_d, gives the stiffness and the damping coefficient.' },
  ],
  outputs: [
    { key: 'delta', label: 'Logarithmic decrement δ', kind: 'dimensionless', help: '(1/n)·ln(x₁/xₙ) per cycle.' },
    { key: 'zeta', label: 'Damping ratio ζ (exact)', kind: 'fraction', help: 'δ/√(4π² + δ²).' },
    { key: 'zetaSmall', label: 'Damping ratio δ/2π (small-damping form)', kind: 'fraction', help: 'Overestimates ζ by the factor 1/√(1−ζ²): 0.5 % at ζ = 0.1, 9 % at ζ = 0.4.' },
    { key: 'wn', label: 'Natural frequency ω_n', kind: 'angularFrequency', optional: true, help: 'Needs T_d.' },
    { key: 'fn', label: 'Natural frequency f_n', kind: 'frequency', optional: true, help: 'Needs T_d.' },
    { key: 'k', label: 'Stiffness k = mω_n²', kind: 'stiffness', optional: true, help: 'Needs T_d and m.' },
    { key: 'c', label: 'Damping coefficient c = 2ζmω_n', kind: 'damping', optional: true, help: 'Needs T_d and m.' },
  ],
  compute(values) {
    const delta = logDecrementFromPeaks(num(values, 'x1'), num(values, 'xn'), num(values, 'n'));
    const zeta = zetaFromLogDecrement(delta);
    const Td = optNum(values, 'Td');
    const m = optNum(values, 'm');
    const wn = Td === undefined ? undefined : naturalFromDampedPeriod(Td, zeta);
    const warnings: string[] = [];
    if (zeta > 0.05) warnings.push(`ζ = ${zeta.toPrecision(3)}: the small-damping form δ/2π is ${((delta / (2 * Math.PI) / zeta - 1) * 100).toPrecision(2)} % high; use the exact value.`);
    if (m !== undefined && Td === undefined) warnings.push('The mass alone does not give k or c: enter the damped period T_d as well.');
    return {
      outputs: {
        delta, zeta, zetaSmall: delta / (2 * Math.PI),
        wn, fn: wn === undefined ? undefined : wn / (2 * Math.PI),
        k: wn !== undefined && m !== undefined ? m * wn * wn : undefined,
        c: wn !== undefined && m !== undefined ? 2 * zeta * m * wn : undefined,
      },
      warnings,
    };
  },
  verification: [
    {
      name: 'Motorcycle shock absorber: amplitude to ¼ in half a cycle (1/16 per cycle), T_d = 2 s, m = 200 kg',
      inputs: { x1: 1, xn: 1 / 16, n: 1, Td: 2, m: 200 },
      expected: { delta: 2.7726, zeta: 0.4037, wn: 3.4339, k: 2358.3, c: 554.5 },
      tolerance: 5e-4,
      why: 'published statement; values carried to 4–5 s.f.',
      source: { key: 'rao2017', locator: 'ch. 2, motorcycle shock-absorber design example (example number from memory)' },
      provenance: 'published',
    },
    {
      name: 'Exact against small-damping form at ζ = 0.4: δ/2π is about 9 % high',
      inputs: { x1: 1, xn: Math.exp(-(2 * Math.PI * 0.4) / Math.sqrt(1 - 0.16)), n: 1 },
      expected: { zeta: 0.4, zetaSmall: 0.4 / Math.sqrt(1 - 0.16) },
      tolerance: 1e-12,
      why: 'closed form δ = 2πζ/√(1−ζ²) inverted; same arithmetic',
      source: { key: 'rao2017', locator: '§2.6 logarithmic decrement (section from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'TW-077 mount 10 kg, 4 kN/m, ζ = 0.05: peaks 10 cycles apart',
      inputs: { x1: 0.004, xn: 0.004 * Math.exp(-10 * (2 * Math.PI * 0.05) / Math.sqrt(1 - 0.0025)), n: 10, Td: (2 * Math.PI) / (20 * Math.sqrt(1 - 0.0025)), m: 10 },
      expected: { zeta: 0.05, wn: 20, k: 4000, c: 20 },
      tolerance: 1e-12,
      why: 'closed form: record built from ω_n = 20 rad/s, ζ = 0.05; same arithmetic',
      source: { key: 'inman2014', locator: '§1.6 measurement of damping (section from memory)' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'rao2017', locator: '§2.6.3 logarithmic decrement (section from memory)' },
    { key: 'inman2014', locator: '§1.6 (from memory)' },
  ],
});
