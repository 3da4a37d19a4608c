import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { AIR_TABLE, airProperties } from '../../../src/core/thermal/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, 6th ed., Table A.4
// (air at 1 atm). Values entered from memory (provenance: from memory); the consistency checks
// below would catch a mistyped digit, because the table's own columns are linked by definitions.
const TABLE_POINTS = [
  { T: 250, nu: 11.44e-6, k: 22.3e-3, alpha: 15.9e-6, Pr: 0.72 },
  { T: 300, nu: 15.89e-6, k: 26.3e-3, alpha: 22.5e-6, Pr: 0.707 },
  { T: 350, nu: 20.92e-6, k: 30.0e-3, alpha: 29.9e-6, Pr: 0.7 },
  { T: 400, nu: 26.41e-6, k: 33.8e-3, alpha: 38.3e-6, Pr: 0.69 },
  { T: 450, nu: 32.39e-6, k: 37.3e-3, alpha: 47.2e-6, Pr: 0.686 },
  { T: 500, nu: 38.79e-6, k: 40.7e-3, alpha: 56.7e-6, Pr: 0.684 },
  { T: 550, nu: 45.57e-6, k: 43.9e-3, alpha: 66.7e-6, Pr: 0.683 },
  { T: 600, nu: 52.69e-6, k: 46.9e-3, alpha: 76.9e-6, Pr: 0.685 },
] as const;

describe('airProperties (Incropera 6th ed. Table A.4, from memory)', () => {
  it('refuses temperatures outside the table', () => {
    expect(() => airProperties(150)).toThrow(InputRangeError);
    expect(() => airProperties(750)).toThrow(InputRangeError);
    expect(() => airProperties(Number.NaN)).toThrow(InputRangeError);
  });
  for (const p of TABLE_POINTS) {
    it(`returns the table row at ${p.T} K`, () => {
      const a = airProperties(p.T);
      for (const key of ['nu', 'k', 'alpha', 'Pr'] as const) expectClose({ label: `${key}(${p.T})`, computed: a[key], expected: p[key], tol: 1e-12, why: 'table point, no interpolation' });
    });
  }
  it('interpolates linearly between rows (325 K is the mean of 300 K and 350 K)', () => {
    expectClose({ label: 'nu(325)', computed: airProperties(325).nu, expected: (15.89e-6 + 20.92e-6) / 2, tol: 1e-12, why: 'linear interpolation, same arithmetic' });
  });
  it('has rows consistent with ν = μ/ρ, Pr = μc_p/k and α = k/(ρc_p) (closed form)', () => {
    for (const r of AIR_TABLE) {
      expectClose({ label: `ν=μ/ρ at ${r.T}`, computed: r.mu / r.rho, expected: r.nu, tol: 2e-3, why: 'printed to 4 s.f.' });
      expectClose({ label: `Pr at ${r.T}`, computed: (r.mu * r.cp) / r.k, expected: r.Pr, tol: 5e-3, why: 'k to 3 s.f., Pr to 3 s.f.' });
      expectClose({ label: `α at ${r.T}`, computed: r.k / (r.rho * r.cp), expected: r.alpha, tol: 6e-3, why: 'k and α to 3 s.f.' });
    }
  });
  it('gives viscosity and conductivity that rise with temperature', () => {
    fc.assert(fc.property(fc.double({ min: 200, max: 699, noNaN: true }), fc.double({ min: 0.01, max: 1, noNaN: true }), (T, dT) =>
      airProperties(T + dT).nu > airProperties(T).nu && airProperties(T + dT).k > airProperties(T).k), { seed: 1, numRuns: 100 });
  });
});
