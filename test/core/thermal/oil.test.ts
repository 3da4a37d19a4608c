import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fadeCoefficient, isoViscosityGrade, waltherFit, waltherViscosity } from '../../../src/core/thermal/index.ts';
import { ComputationError, InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// ASTM D341 two-point line (log10, ν + 0.7 in mm²/s, T in K). Oil ν40 = 32.0, ν100 = 5.4 mm²/s:
// A = 9.530815, B = 3.746578; ν at 0/20/60/80/120 °C evaluated independently
// (reference library numpy, version not recorded; formula from ASTM D341, from memory).
const VIS_A = [
  [273.15, 336.0], [293.15, 86.278], [333.15, 15.186], [353.15, 8.5332], [393.15, 3.7239],
] as const;

describe('ASTM D341 viscosity line', () => {
  const fit = waltherFit(32e-6, 5.4e-6);
  it('has the published-form constants A and B', () => {
    expectClose({ label: 'A', computed: fit.A, expected: 9.530815, tol: 2e-7, why: '7 s.f.' });
    expectClose({ label: 'B', computed: fit.B, expected: 3.746578, tol: 2e-7, why: '7 s.f. (half a unit in the 7th digit)' });
  });
  for (const [T, nu] of VIS_A) {
    it(`gives ν(${(T - 273.15).toFixed(0)} °C) = ${nu} mm²/s`, () => expectClose({ label: `ν(${T})`, computed: waltherViscosity(fit, T) * 1e6, expected: nu, tol: 1e-4, why: '5 s.f.' }));
  }
  it('differs from an ln-based +0.8 variant by more than 1 % away from the data points (pitfall)', () => {
    // common practice, no source: the variant is a different fit; same two points, different curve
    const z = (v: number) => Math.log(Math.log(v + 0.8));
    const B = (z(32) - z(5.4)) / (Math.log(373.15) - Math.log(313.15));
    const A = z(32) + B * Math.log(313.15);
    const alt = Math.exp(Math.exp(A - B * Math.log(273.15))) - 0.8;
    expect(Math.abs(alt / 336.0 - 1)).toBeGreaterThan(0.01);
  });
  it('refuses a 100 °C viscosity above the 40 °C one, and non-positive inputs', () => {
    expect(() => waltherFit(5e-6, 10e-6)).toThrow(ComputationError);
    expect(() => waltherFit(0, 1e-6)).toThrow(InputRangeError);
  });
  it('passes through both of its data points and falls with temperature', () => {
    fc.assert(fc.property(fc.double({ min: 5, max: 1000, noNaN: true }), fc.double({ min: 0.05, max: 0.5, noNaN: true }), fc.double({ min: 253, max: 450, noNaN: true }), (n40, r, T) => {
      const f = waltherFit(n40 * 1e-6, Math.max(2.1, n40 * r) * 1e-6);
      if (Math.max(2.1, n40 * r) >= n40) return true;
      const ok40 = Math.abs(waltherViscosity(f, 313.15) / (n40 * 1e-6) - 1) < 1e-9;
      return ok40 && waltherViscosity(f, T + 1) < waltherViscosity(f, T);
    }), { seed: 1, numRuns: 100 });
  });
});

describe('ISO 3448 viscosity grade', () => {
  it('names the grade inside ±10 % of its mid-point (ISO 3448 Table 1, from memory)', () => {
    expect(isoViscosityGrade(32e-6)).toBe('ISO VG 32');
    expect(isoViscosityGrade(28.8e-6)).toBe('ISO VG 32');
    expect(isoViscosityGrade(35.2e-6)).toBe('ISO VG 32');
    expect(isoViscosityGrade(38e-6)).toBe('between ISO VG 32 and VG 46');
    expect(isoViscosityGrade(1e-6)).toBe('outside the ISO VG grades');
  });
});

describe('fade model (engineering approximation; common practice, no source)', () => {
  const oil = waltherFit(20e-6, 4.5e-6);
  it('keeps c at c_ref with no viscous share and follows ν(T)/ν(T_ref) with a full one', () => {
    expect(fadeCoefficient({ cRef: 980, Tref: 298.15, viscousShare: 0, oil }, 373.15)).toBe(980);
    expectClose({ label: 'c, s = 1', computed: fadeCoefficient({ cRef: 980, Tref: 298.15, viscousShare: 1, oil }, 373.15), expected: 980 * waltherViscosity(oil, 373.15) / waltherViscosity(oil, 298.15), tol: 1e-14, why: 'same arithmetic' });
  });
  it('never rises with temperature and never drops below the orifice share', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 250, max: 450, noNaN: true }), (s, T) => {
      const m = { cRef: 1000, Tref: 298.15, viscousShare: s, oil };
      return fadeCoefficient(m, T + 1) <= fadeCoefficient(m, T) + 1e-9 && fadeCoefficient(m, T) >= 1000 * (1 - s) - 1e-9;
    }), { seed: 1, numRuns: 100 });
  });
});
