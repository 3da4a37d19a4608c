import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  criticalDamping, dampedFrequency, dampingRatio, dampingRegime, logDecrementFromZeta, naturalFrequency, qualityFactor, zetaFromLogDecrement,
} from '../../../src/core/vibration/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

/** Reference values with their sources (see test/README in DEVELOPERS.md for the columns). */
const CASES = [
  // Rao, Mechanical Vibrations 6th ed., ch. 2 motorcycle shock absorber example (example number from memory):
  // m = 200 kg, damped period 2 s, amplitude to 1/4 in half a cycle → δ = ln 16, ζ = 0.4037, ωn = 3.4339 rad/s, c = 554.5, k = 2358.3.
  { label: 'Rao motorcycle δ→ζ', computed: () => zetaFromLogDecrement(Math.log(16)), expected: 0.4037, tol: 2e-4, why: 'published to 4 s.f.', provenance: 'published' },
  { label: 'Rao motorcycle ωn', computed: () => naturalFrequency(200, 2358.3), expected: 3.4339, tol: 5e-5, why: 'published to 5 s.f.', provenance: 'published' },
  { label: 'Rao motorcycle c', computed: () => zetaFromLogDecrement(Math.log(16)) * criticalDamping(200, 2358.3), expected: 554.5, tol: 5e-4, why: 'published to 4 s.f.', provenance: 'published' },
  // Inman, Engineering Vibration 4th ed., ch. 1 example (m = 49.2 g, k = 857.8 N/m, c = 0.11 kg/s); from memory.
  { label: 'Inman ωn', computed: () => naturalFrequency(0.0492, 857.8), expected: 132.0, tol: 5e-4, why: '4 s.f. in the book', provenance: 'from memory' },
  { label: 'Inman c_cr', computed: () => criticalDamping(0.0492, 857.8), expected: 12.99, tol: 5e-4, why: '4 s.f.', provenance: 'from memory' },
  { label: 'Inman ζ', computed: () => dampingRatio(0.0492, 857.8, 0.11), expected: 0.00847, tol: 1e-3, why: '3 s.f.', provenance: 'from memory' },
  // Rao §2.6 gun-recoil example (critically damped, m = 500 kg, k = 10 kN/m); values computed from the stated data (calc).
  { label: 'Rao recoil ωn', computed: () => naturalFrequency(500, 10_000), expected: 4.4721, tol: 2e-5, why: 'closed form, 5 s.f.', provenance: 'closed form' },
  { label: 'Rao recoil c_c', computed: () => criticalDamping(500, 10_000), expected: 4472.1, tol: 2e-5, why: 'closed form, 5 s.f.', provenance: 'closed form' },
] as const;

describe('SDOF parameters against published values', () => {
  for (const c of CASES) it(`${c.label} (${c.provenance})`, () => expectClose({ label: c.label, computed: c.computed(), expected: c.expected, tol: c.tol, why: c.why }));
});

describe('SDOF parameter invariants', () => {
  it('log decrement and damping ratio are exact inverses', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 0.999, noNaN: true }), (z) => Math.abs(zetaFromLogDecrement(logDecrementFromZeta(z)) - z) < 1e-12), { seed: 1, numRuns: 100 });
  });
  it('the small-damping form δ/2π is 10 % off near ζ = 0.4 (pitfall worth knowing)', () => {
    // common practice, no source: exact vs small-damping relation of the log decrement
    const delta = logDecrementFromZeta(0.4);
    expect(delta / (2 * Math.PI) / 0.4 - 1).toBeGreaterThan(0.09);
  });
  it('Q = 1/(2ζ) and the damped frequency is below the natural one', () => {
    fc.assert(fc.property(fc.double({ min: 1e-4, max: 0.999, noNaN: true }), fc.double({ min: 0.1, max: 1e4, noNaN: true }), (z, wn) =>
      qualityFactor(z) * 2 * z === 1 || Math.abs(qualityFactor(z) * 2 * z - 1) < 1e-14 ? dampedFrequency(wn, z) < wn : false), { seed: 1, numRuns: 100 });
  });
  it('classifies the three regimes', () => {
    expect(dampingRegime(0.5)).toBe('underdamped');
    expect(dampingRegime(1)).toBe('critically damped');
    expect(dampingRegime(2)).toBe('overdamped');
  });
});
