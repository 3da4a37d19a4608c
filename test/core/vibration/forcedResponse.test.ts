import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { InputRangeError } from '../../../src/core/errors.ts';
import {
  baseMotionPhaseLag, displacementPeak, forcedResponse, magnificationFactor, phaseLag, relativeMotionRatio, transmissibility, transmissibilityPeak,
} from '../../../src/core/vibration/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { FORCED_ROWS } from './forcedResponse.fixtures.ts';

const zetaArb = fc.double({ min: 1e-3, max: 2, noNaN: true });

describe('magnification, phase and transmissibility against reference values', () => {
  for (const row of FORCED_ROWS) {
    it(`ζ = ${row.zeta}, r = ${row.r.toFixed(4)} (Rao 6th ed. §3.4 and §9.10, from memory; closed form)`, () => {
      const why = 'reference rounded to 6 decimals: half a unit is ≤ 5e-6 relative for values ≥ 0.1';
      expectClose({ label: 'M', computed: magnificationFactor(row.r, row.zeta), expected: row.M, tol: 5e-6, why });
      expectClose({ label: 'TR', computed: transmissibility(row.r, row.zeta), expected: row.TR, tol: 5e-6, why });
      if ('phaseDeg' in row) expectClose({ label: 'phase', computed: (phaseLag(row.r, row.zeta) * 180) / Math.PI, expected: row.phaseDeg, tol: 1e-5, why: 'degrees to 4 decimals: ≤ 7e-6 relative' });
    });
  }
  it('peaks at r = √(1−2ζ²) with M = 1/(2ζ√(1−ζ²)): ζ = 0.05 gives 10.01252 at 0.997497 and ζ = 0.5 gives 1.154701 at 0.707107', () => {
    // Rao 6th ed. §3.4 resonant peak (section from memory); values closed form (calc)
    expectClose({ label: 'M_max(0.05)', computed: displacementPeak(0.05).M, expected: 10.01252, tol: 1e-6, why: '7 s.f.' });
    expectClose({ label: 'r_peak(0.05)', computed: displacementPeak(0.05).r, expected: 0.997497, tol: 1e-6, why: '6 s.f.' });
    expectClose({ label: 'M_max(0.5)', computed: displacementPeak(0.5).M, expected: 1.154701, tol: 1e-6, why: '7 s.f.' });
  });
  it('transmissibility peaks at r = 0.855600 with T_R = 1.467890 for ζ = 0.5', () => {
    // closed form dT_R/dr = 0 (Rao 6th ed. §9.10 plots the curve; from memory)
    const p = transmissibilityPeak(0.5);
    expectClose({ label: 'r', computed: p.r, expected: 0.8556, tol: 1e-6, why: '6 s.f.' });
    expectClose({ label: 'TR', computed: p.TR, expected: 1.46789, tol: 1e-6, why: '6 s.f.' });
  });
  it('sizes the exhaust-fan mounts: 40 kg at 1000 rpm, T_R = 0.1 needs ω_n = 31.574 rad/s, k = 9969 N/m per spring', () => {
    // Rao, Mechanical Vibrations 6th ed., ch. 9 exhaust-fan isolation example (example number from memory): undamped, four springs
    const o = forcedResponse({ m: 40, k: 4 * 9969, c: 0, f: 1000 / 60, excitation: 'force', amplitude: 1 });
    expectClose({ label: 'ωn', computed: o.wn, expected: 31.574, tol: 1e-4, why: 'book value to 5 s.f.' });
    expectClose({ label: 'TR', computed: o.TR, expected: 0.1, tol: 1e-3, why: 'k rounded to 4 s.f. in the book' });
  });
});

describe('forced response properties', () => {
  it('transmissibility is exactly 1 at r = √2 for any damping', () => {
    fc.assert(fc.property(zetaArb, (z) => Math.abs(transmissibility(Math.SQRT2, z) - 1) < 1e-12), { seed: 1, numRuns: 100 });
  });
  it('transmissibility is below 1 above r = √2 and above 1 below it, for any damping', () => {
    fc.assert(fc.property(zetaArb, fc.double({ min: 1.45, max: 100, noNaN: true }), fc.double({ min: 0.01, max: 1.38, noNaN: true }), (z, hi, lo) =>
      transmissibility(hi, z) < 1 && transmissibility(lo, z) > 1), { seed: 1, numRuns: 100 });
  });
  it('the displacement magnification is largest at r = √(1−2ζ²) for every ζ < 1/√2', () => {
    fc.assert(fc.property(fc.double({ min: 0.01, max: 0.7, noNaN: true }), fc.double({ min: -0.05, max: 0.05, noNaN: true }), (z, dr) => {
      const p = displacementPeak(z);
      return Math.abs(magnificationFactor(p.r, z) - p.M) < 1e-9 * p.M && magnificationFactor(Math.max(0, p.r + dr), z) <= p.M * (1 + 1e-12);
    }), { seed: 1, numRuns: 100 });
  });
  it('the magnification falls monotonically with frequency when ζ ≥ 1/√2', () => {
    fc.assert(fc.property(fc.double({ min: 0.7072, max: 3, noNaN: true }), fc.double({ min: 0, max: 10, noNaN: true }), (z, r) =>
      magnificationFactor(r + 0.01, z) < magnificationFactor(r, z)), { seed: 1, numRuns: 100 });
  });
  it('the phase lag is π/2 at resonance and rises from 0 towards π', () => {
    fc.assert(fc.property(zetaArb, (z) => Math.abs(phaseLag(1, z) - Math.PI / 2) < 1e-12 && phaseLag(0.1, z) < phaseLag(10, z)), { seed: 1, numRuns: 100 });
  });
  it('base excitation: |X/Y| equals T_R, the relative motion tends to Y far above resonance, the phase lies in [0, π]', () => {
    fc.assert(fc.property(zetaArb, fc.double({ min: 0.01, max: 50, noNaN: true }), (z, r) => {
      const ok = relativeMotionRatio(1e4, z) > 0.999 && baseMotionPhaseLag(r, z) >= 0 && baseMotionPhaseLag(r, z) <= Math.PI;
      const k = 4 * Math.PI ** 2;
      const o = forcedResponse({ m: 1, k, c: 2 * z * 2 * Math.PI, f: r, excitation: 'base', amplitude: 1 });
      return ok && Math.abs(o.X - transmissibility(r, z)) < 1e-12 * o.X + 1e-15;
    }), { seed: 1, numRuns: 100 });
  });
  it('mean damper power equals the energy per cycle πcωZ² times the frequency (Chopra 5th ed. Eq. 3.8.1)', () => {
    fc.assert(fc.property(fc.double({ min: 1, max: 1e4, noNaN: true }), fc.double({ min: 0.1, max: 100, noNaN: true }), (c, f) => {
      const o = forcedResponse({ m: 10, k: 4000, c, f, excitation: 'force', amplitude: 100 });
      const perCycle = Math.PI * c * o.omega * o.Z * o.Z;
      return Math.abs(o.P - perCycle * f) <= 1e-12 * o.P;
    }), { seed: 1, numRuns: 100 });
  });
  it('refuses an undamped system driven at resonance, naming r', () => {
    expect(() => forcedResponse({ m: 1, k: 4 * Math.PI ** 2, c: 0, f: 1, excitation: 'force', amplitude: 1 })).toThrow(InputRangeError);
    expect(() => forcedResponse({ m: 1, k: 4 * Math.PI ** 2, c: 0, f: 1, excitation: 'force', amplitude: 1 })).toThrow(/'r'/);
  });
  it('refuses a negative amplitude naming F0 or Y', () => {
    expect(() => forcedResponse({ m: 1, k: 1, c: 1, f: 1, excitation: 'force', amplitude: -1 })).toThrow(/'F0'/);
    expect(() => forcedResponse({ m: 1, k: 1, c: 1, f: 1, excitation: 'base', amplitude: -1 })).toThrow(/'Y'/);
  });
});
