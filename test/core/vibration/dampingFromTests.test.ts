import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { InputRangeError } from '../../../src/core/errors.ts';
import { dampedFrequency, halfPowerDamping, halfPowerPeakFrequency, logDecrementFromPeaks, logDecrementFromZeta, naturalFromDampedPeriod, zetaFromLogDecrement } from '../../../src/core/vibration/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('logDecrementFromPeaks', () => {
  it('gives δ = ln 16 for amplitude falling to ¼ in half a cycle (Rao 6th ed., ch. 2 motorcycle shock absorber; published, example number from memory)', () => {
    expectClose({ label: 'δ', computed: logDecrementFromPeaks(1, 1 / 16, 1), expected: 2.7726, tol: 2e-5, why: 'book value to 5 s.f.' });
    expectClose({ label: 'ζ', computed: zetaFromLogDecrement(logDecrementFromPeaks(1, 1 / 16, 1)), expected: 0.4037, tol: 1e-4, why: 'book value to 4 s.f.' });
  });
  it('averages over n cycles: δ = (1/n) ln(x₁/xₙ) (Rao 6th ed. §2.6, from memory; closed form)', () => {
    expectClose({ label: 'δ', computed: logDecrementFromPeaks(10, 10 * Math.exp(-2.5), 5), expected: 0.5, tol: 1e-14, why: 'same arithmetic' });
  });
  it('refuses a later peak that is not smaller, and a fractional cycle count', () => {
    expect(() => logDecrementFromPeaks(1, 1, 3)).toThrow(/'xn'/);
    expect(() => logDecrementFromPeaks(1, 0.5, 2.5)).toThrow(/'n'/);
    expect(() => logDecrementFromPeaks(0, 0.5, 1)).toThrow(InputRangeError);
  });
  it('inverts the free decay: peaks generated from any ζ give back ζ', () => {
    fc.assert(fc.property(fc.double({ min: 1e-3, max: 0.95, noNaN: true }), fc.integer({ min: 1, max: 20 }), (z, n) => {
      const xn = Math.exp(-n * logDecrementFromZeta(z));
      fc.pre(xn > 1e-300);
      return Math.abs(zetaFromLogDecrement(logDecrementFromPeaks(1, xn, n)) - z) < 1e-10;
    }), { seed: 1, numRuns: 100 });
  });
  it('the small-damping form δ/2π always overestimates ζ', () => {
    fc.assert(fc.property(fc.double({ min: 1e-3, max: 0.95, noNaN: true }), (z) => logDecrementFromZeta(z) / (2 * Math.PI) > z), { seed: 1, numRuns: 100 });
  });
});

describe('halfPowerDamping', () => {
  it('recovers ζ = 0.05 from the half-power points 0.946111 and 1.046363 around the peak at 0.997497 (closed form, calc)', () => {
    // Rao 6th ed. §3.4 magnification factor (from memory) solved for M = M_max/√2 (points at M_max/√2, pitfall 4); 6-decimal inputs
    const r = halfPowerDamping(0.946111, 1.046363, 0.997497);
    expectClose({ label: 'ζ', computed: r.zeta, expected: 0.05, tol: 5e-6, why: 'inputs rounded to 6 decimals' });
    expectClose({ label: 'fn', computed: r.fn, expected: 1, tol: 5e-6, why: 'inputs rounded to 6 decimals' });
    expectClose({ label: 'Q', computed: r.Q, expected: 10, tol: 5e-6, why: 'inputs rounded to 6 decimals' });
  });
  it('exceeds the small-damping form by a little: (f₂ − f₁)/(2f_p) = 0.050252 for the same points', () => {
    expectClose({ label: 'ζ small', computed: halfPowerDamping(0.946111, 1.046363, 0.997497).zetaSmall, expected: 0.0502518, tol: 1e-5, why: 'same arithmetic, 6 s.f.' });
  });
  it('is exact for the mobility (velocity) response: f = f_n(√(1+ζ²) ∓ ζ)', () => {
    // Ewins, Modal Testing 2nd ed. §2.6 (from memory): velocity FRF half-power bandwidth is exactly 2ζω_n
    const z = 0.3;
    const r = halfPowerDamping(Math.sqrt(1 + z * z) - z, Math.sqrt(1 + z * z) + z, 1, 'velocity');
    expectClose({ label: 'ζ', computed: r.zeta, expected: z, tol: 1e-14, why: 'closed form' });
  });
  it('inverts the displacement half-power points for any ζ that has both (ζ < 0.3827)', () => {
    // the lower point r² = 1 − 2ζ² − 2ζ√(1−ζ²) exists only while it is positive: ζ < sin(π/8) = 0.38268
    fc.assert(fc.property(fc.double({ min: 1e-3, max: 0.38, noNaN: true }), fc.double({ min: 0.1, max: 1e3, noNaN: true }), (z, fn) => {
      const s = 2 * z * Math.sqrt(1 - z * z);
      const r = halfPowerDamping(fn * Math.sqrt(1 - 2 * z * z - s), fn * Math.sqrt(1 - 2 * z * z + s), fn * Math.sqrt(1 - 2 * z * z));
      return Math.abs(r.zeta - z) < 1e-8 && Math.abs(r.fn / fn - 1) < 1e-8;
    }), { seed: 1, numRuns: 100 });
  });
  it('inverts the accelerance half-power points for any ζ that has both', () => {
    // accelerance r²M has the receptance form in 1/r² (closed form): 1/r² = 1 − 2ζ² ± 2ζ√(1−ζ²)
    fc.assert(fc.property(fc.double({ min: 1e-3, max: 0.38, noNaN: true }), fc.double({ min: 0.1, max: 1e3, noNaN: true }), (z, fn) => {
      const s = 2 * z * Math.sqrt(1 - z * z);
      const r = halfPowerDamping(fn / Math.sqrt(1 - 2 * z * z + s), fn / Math.sqrt(1 - 2 * z * z - s), fn / Math.sqrt(1 - 2 * z * z), 'acceleration');
      return Math.abs(r.zeta - z) < 1e-8 && Math.abs(r.fn / fn - 1) < 1e-8;
    }), { seed: 1, numRuns: 100 });
  });
  it('refuses half-power points that do not bracket the peak', () => {
    expect(() => halfPowerDamping(1.1, 1.2, 1)).toThrow(/'f1'/);
    expect(() => halfPowerDamping(0.9, 0.95, 1)).toThrow(/'f2'/);
  });
});

describe('halfPowerPeakFrequency', () => {
  it('gives the peak of the ζ = 0.05 resonance, 0.997497, from its half-power points (closed form from the magnification factor, Rao 6th ed. §3.4, from memory)', () => {
    expectClose({ label: 'f_p', computed: halfPowerPeakFrequency(0.946111, 1.046363), expected: 0.997497, tol: 2e-6, why: 'points given to 6 decimals' });
  });
  it('is the peak of every SDOF response type the points came from (closed form: r² roots of M = M_max/√2)', () => {
    fc.assert(fc.property(fc.double({ min: 1e-3, max: 0.38, noNaN: true }), fc.double({ min: 0.1, max: 1e3, noNaN: true }), (z, fn) => {
      const s = 2 * z * Math.sqrt(1 - z * z);
      const rp2 = 1 - 2 * z * z;
      const disp = halfPowerPeakFrequency(fn * Math.sqrt(rp2 - s), fn * Math.sqrt(rp2 + s));
      const acc = halfPowerPeakFrequency(fn / Math.sqrt(rp2 + s), fn / Math.sqrt(rp2 - s), 'acceleration');
      const vel = halfPowerPeakFrequency(fn * (Math.sqrt(1 + z * z) - z), fn * (Math.sqrt(1 + z * z) + z), 'velocity');
      return Math.abs(disp / (fn * Math.sqrt(rp2)) - 1) < 1e-10 && Math.abs(acc / (fn / Math.sqrt(rp2)) - 1) < 1e-10 && Math.abs(vel / fn - 1) < 1e-10;
    }), { seed: 1, numRuns: 100 });
  });
});

describe('naturalFromDampedPeriod', () => {
  it('inverts ω_d = ω_n√(1−ζ²) (Rao 6th ed. §2.6.2, from memory): T_d of ω_n = 20 rad/s at ζ = 0.1 gives 20 rad/s', () => {
    expectClose({ label: 'ω_n', computed: naturalFromDampedPeriod((2 * Math.PI) / dampedFrequency(20, 0.1), 0.1), expected: 20, tol: 1e-14, why: 'closed form, same arithmetic' });
  });
  it('round-trips any ω_n and ζ < 1 through the damped period', () => {
    fc.assert(fc.property(fc.double({ min: 1e-3, max: 1e4, noNaN: true }), fc.double({ min: 0, max: 0.99, noNaN: true }), (wn, z) =>
      Math.abs(naturalFromDampedPeriod((2 * Math.PI) / dampedFrequency(wn, z), z) / wn - 1) < 1e-12), { seed: 1, numRuns: 100 });
  });
  it('refuses a damping ratio of 1 or more (no period) and a non-positive period', () => {
    expect(() => naturalFromDampedPeriod(1, 1)).toThrow(/'zeta'/);
    expect(() => naturalFromDampedPeriod(0, 0.1)).toThrow(/'Td'/);
  });
});
