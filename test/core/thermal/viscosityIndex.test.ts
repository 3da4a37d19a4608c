import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { d2270Reference, ISO_VG, nu100ForViscosityIndex, viscosityIndex } from '../../../src/core/thermal/index.ts';
import { ComputationError, InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// ASTM D2270, Standard Practice for Calculating Viscosity Index from Kinematic Viscosity at 40 and
// 100 °C: the standard's own worked examples (§5.1.4 procedure A, §6.1.4 procedure B), published.
describe('ASTM D2270 viscosity index', () => {
  it('procedure A example: ν40 = 73.30, ν100 = 8.86 mm²/s → L = 119.94, H = 69.48, VI = 92.43 (published, §5.1.4)', () => {
    const { L, H } = d2270Reference(8.86);
    expectClose({ label: 'L', computed: L, expected: 119.94, tol: 5e-5, why: 'the standard prints 2 decimals' });
    expectClose({ label: 'H', computed: H, expected: 69.48, tol: 1e-4, why: 'the standard prints 2 decimals' });
    expectClose({ label: 'VI', computed: viscosityIndex(73.3e-6, 8.86e-6), expected: 92.43, tol: 1e-4, why: 'printed to 2 decimals' });
  });
  it('procedure B example: ν40 = 22.83, ν100 = 5.05 mm²/s → H = 28.97, VI = 156 (published, §6.1.4)', () => {
    // the standard rounds H to 28.97 (28.975 by the table) before N; both round to VI 156
    expectClose({ label: 'H', computed: d2270Reference(5.05).H, expected: 28.97, tol: 2e-4, why: 'H printed to 2 decimals (28.975 interpolated)' });
    expect(Math.round(viscosityIndex(22.83e-6, 5.05e-6))).toBe(156);
  });
  it('is 100 exactly when ν40 is the table H at that ν100, and 0 when it is L (closed form of the definition)', () => {
    expectClose({ label: 'VI at H', computed: viscosityIndex(28.49e-6, 5e-6), expected: 100, tol: 1e-12 });
    expectClose({ label: 'VI at L', computed: viscosityIndex(40.23e-6, 5e-6), expected: 0, tol: 1e-9 });
  });
  it('gives ISO VG 32 at VI 100 a ν100 of 5.3619 mm²/s (Table 1: H = 31.40 at 5.3, 32.37 at 5.4; published)', () => {
    expectClose({ label: 'ν100', computed: nu100ForViscosityIndex(32e-6, 100) * 1e6, expected: 5.3 + 0.06 / 0.97, tol: 1e-9, why: 'the inversion is solved to 1e-9 mm²/s' });
  });
  it('inverts itself: VI(ν40, ν100(ν40, VI)) = VI for every preset grade and VI 0–160', () => {
    fc.assert(fc.property(fc.constantFrom(...ISO_VG.filter((g) => g >= 10 && g <= 100)), fc.double({ min: 0, max: 160, noNaN: true }), (g, vi) => {
      let nu100: number;
      try { nu100 = nu100ForViscosityIndex(g * 1e-6, vi); } catch (e) { return e instanceof ComputationError; } // outside the table: refused, typed
      return Math.abs(viscosityIndex(g * 1e-6, nu100) - vi) < 1e-6;
    }), { seed: 1, numRuns: 300 });
  });
  it('refuses a ν100 outside the kept table (2–12 mm²/s) naming the input, and a VI it cannot reach', () => {
    expect(() => viscosityIndex(20e-6, 1.5e-6)).toThrow(InputRangeError);
    expect(() => viscosityIndex(500e-6, 20e-6)).toThrow(/nu100/);
    expect(() => nu100ForViscosityIndex(2e-6, 100)).toThrow(ComputationError);
    expect(() => nu100ForViscosityIndex(32e-6, 250)).toThrow(InputRangeError);
  });
});
