import { halfPowerDamping, halfPowerPeakFrequency, type HalfPowerResponse } from '../../core/vibration/index.ts';
import { choice, defineCalculator, num } from '../types.ts';

/** Damping ratio from the half-power bandwidth of a measured resonance. */
export const halfPowerCalculator = defineCalculator({
  id: 'half-power',
  title: 'Damping from the half-power bandwidth',
  summary: 'Damping ratio and quality factor from the two frequencies where a measured resonance falls to its peak over √2, exact for an SDOF response and with the small-damping estimate beside it.',
  inputs: [
    { key: 'f1', label: 'Lower half-power frequency f₁', kind: 'frequency', default: 2.02, min: 0, max: 1e6, minExclusive: true, required: true, help: 'Below the peak, where the response is the peak value over √2 (−3 dB).' },
    { key: 'f2', label: 'Upper half-power frequency f₂', kind: 'frequency', default: 2.23, min: 0, max: 1e6, minExclusive: true, required: true, help: 'Above the peak, where the response is the peak value over √2 (−3 dB).' },
    { key: 'fp', label: 'Peak frequency f_p', kind: 'frequency', default: 2.125, min: 0, max: 1e6, minExclusive: true, required: true, help: 'Frequency of the highest response.' },
    { key: 'response', label: 'Measured response', kind: 'choice', default: 'displacement', options: [{ value: 'displacement', label: 'Displacement over force (receptance)' }, { value: 'velocity', label: 'Velocity over force (mobility)' }, { value: 'acceleration', label: 'Acceleration over force (accelerance)' }], help: 'Which frequency response the points were read from; the exact relation differs.' },
  ],
  outputs: [
    { key: 'zeta', label: 'Damping ratio ζ (exact, points at M_max/√2)', kind: 'fraction' },
    { key: 'zetaSmall', label: 'Small-damping estimate (f₂ − f₁)/(2f_p)', kind: 'fraction' },
    { key: 'Q', label: 'Quality factor Q = 1/(2ζ)', kind: 'dimensionless' },
    { key: 'fn', label: 'Undamped natural frequency f_n', kind: 'frequency' },
  ],
  compute(values) {
    const f1 = num(values, 'f1');
    const f2 = num(values, 'f2');
    const fp = num(values, 'fp');
    const response = choice<HalfPowerResponse>(values, 'response');
    const r = halfPowerDamping(f1, f2, fp, response);
    const warnings: string[] = [];
    const centre = halfPowerPeakFrequency(f1, f2, response);
    if (Math.abs(fp - centre) > 0.1 * (f2 - f1)) {
      warnings.push(`An SDOF resonance would peak at ${centre.toPrecision(4)} Hz for these half-power points, not ${fp.toPrecision(4)} Hz: check the readings, the response type, or a neighbouring mode.`);
    }
    if (r.zeta > 0.2) warnings.push('ζ above 0.2: the peak is broad and the half-power points are hard to read; a curve fit or ring-down test is more reliable.');
    return { outputs: { zeta: r.zeta, zetaSmall: r.zetaSmall, Q: r.Q, fn: r.fn }, warnings };
  },
  verification: [
    {
      name: 'ζ = 0.05 resonance: M_max = 10.01252 at r = 0.997497, half-power at r = 0.946111 and 1.046363',
      inputs: { f1: 0.946111, f2: 1.046363, fp: 0.997497, response: 'displacement' },
      expected: { zeta: 0.05, fn: 1 },
      tolerance: 5e-6,
      why: 'frequencies given to 6 decimals (about 1e-6 relative), which moves ζ by under 5e-6 relative',
      source: { key: 'rao2017', locator: '§3.4 magnification factor solved for M = M_max/√2 (closed form; section from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'ζ = 0.2: small-damping form differs from the exact one',
      inputs: { f1: Math.sqrt(1 - 0.08 - 0.4 * Math.sqrt(0.96)), f2: Math.sqrt(1 - 0.08 + 0.4 * Math.sqrt(0.96)), fp: Math.sqrt(1 - 0.08), response: 'displacement' },
      expected: { zeta: 0.2, Q: 2.5, fn: 1 },
      tolerance: 1e-12,
      why: 'half-power points r² = 1 − 2ζ² ∓ 2ζ√(1−ζ²) built in closed form; same arithmetic',
      source: { key: 'ewins2000', locator: '§2.6 half-power points (section from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Mobility (velocity) response: bandwidth 2ζf_n exactly, f_p = √(f₁f₂)',
      inputs: { f1: Math.sqrt(1.01) - 0.1, f2: Math.sqrt(1.01) + 0.1, fp: 1, response: 'velocity' },
      expected: { zeta: 0.1, fn: 1 },
      tolerance: 1e-12,
      why: 'velocity FRF half-power points f = f_n(√(1+ζ²) ∓ ζ); same arithmetic',
      source: { key: 'ewins2000', locator: '§2.6 (from memory)' },
      provenance: 'closed form',
    },
    {
      name: 'Accelerance at ζ = 0.1: peak at f_n/√(1−2ζ²), half-power points from the receptance form in 1/f²',
      inputs: { f1: 1 / Math.sqrt(0.98 + 0.2 * Math.sqrt(0.99)), f2: 1 / Math.sqrt(0.98 - 0.2 * Math.sqrt(0.99)), fp: 1 / Math.sqrt(0.98), response: 'acceleration' },
      expected: { zeta: 0.1, fn: 1 },
      tolerance: 1e-12,
      why: '|r²M|² = 1/((1/r² − 1)² + 4ζ²/r²), the receptance form in 1/r²; same arithmetic',
      source: { key: 'ewins2000', locator: '§2.6 and the FRF forms of §2.2 (sections from memory)' },
      provenance: 'closed form',
    },
  ],
  sources: [
    { key: 'ewins2000', locator: '§2.6 half-power bandwidth (from memory)' },
    { key: 'rao2017', locator: '§3.4 magnification factor and quality factor (section from memory)' },
  ],
});
