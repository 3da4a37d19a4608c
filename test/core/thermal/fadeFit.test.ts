import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fadeCoefficient, fadeFit, mineralOilCurve, readUnitRows, type FadeModel } from '../../../src/core/thermal/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Closed form: rows made from the law itself must give the law back; the least-squares problem
// is linear in c_ref(1 − s) and c_ref·s, so exact data give them to rounding.
const oil = mineralOilCurve(20e-6, 4.5e-6);
const TEMPS = [253.15, 293.15, 353.15];
const VELS = [0.05, 0.1, 0.2, 0.4, 0.8];

function rowsOf(m: FadeModel, noise: (i: number) => number = () => 0): number[][] {
  const out: number[][] = [];
  let i = 0;
  for (const T of TEMPS) for (const v of VELS) out.push([T, v, fadeCoefficient(m, T) * v * (1 + noise(i++))]);
  return out;
}

describe('fade-law fit (closed form: synthetic rows from the law)', () => {
  it('recovers s = 0.3 and c_ref = 980 N·s/m to 1e-9 from exact rows (share law)', () => {
    const f = fadeFit(rowsOf({ cRef: 980, Tref: 298.15, viscousShare: 0.3, oil }), { oil, Tref: 298.15 });
    expectClose({ label: 'cRef', computed: f.cRef, expected: 980, tol: 1e-9, why: 'exact data; rounding only' });
    expectClose({ label: 'share', computed: f.share, expected: 0.3, tol: 1e-9, why: 'exact data; rounding only' });
    expectClose({ label: 'r2', computed: f.r2, expected: 1, tol: 1e-12 });
    expect(f.temperatures.map((g) => g.n)).toEqual([5, 5, 5]);
  });
  it('recovers any share and c_ref to 1e-9 from exact rows, share law and physical law alike', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 100, max: 1e6, noNaN: true }), fc.double({ min: 273.15, max: 323.15, noNaN: true }), fc.constantFrom(0, 7e-4, 9.5e-4), (s, cRef, Tref, beta) => {
      const f = fadeFit(rowsOf({ cRef, Tref, viscousShare: s, oil, beta }), { oil, Tref, beta });
      return Math.abs(f.cRef / cRef - 1) < 1e-9 && Math.abs(f.share - s) < 1e-9;
    }), { seed: 1, numRuns: 200 });
  });
  it('stays within 1.1ε of c_ref (relative) and of s when every force carries a relative error up to ε = 1 %', () => {
    // bound (closed form): the fit is linear in the forces, δx = A⁺δF, so |δx_k| ≤ ε·Σ_j|A⁺_kj F_j|,
    // reached when each row's error takes the sign of A⁺_kj F_j; A⁺_kj has one sign within a test
    // temperature, so the worst case is one of the 27 per-temperature sign patterns. Evaluated for
    // s = 0…0.6 on these rows: 1.000ε in c_ref and 1.075ε in s, hence 1.1ε
    const eps = 0.01;
    fc.assert(fc.property(fc.double({ min: 0, max: 0.6, noNaN: true }), fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 15, maxLength: 15 }), (s, z) => {
      const f = fadeFit(rowsOf({ cRef: 980, Tref: 298.15, viscousShare: s, oil }, (i) => eps * z[i]!), { oil, Tref: 298.15 });
      return Math.abs(f.cRef / 980 - 1) <= 1.1 * eps && Math.abs(f.share - s) <= 1.1 * eps;
    }), { seed: 1, numRuns: 300 });
  });
  it('gives the fade rate of the oil itself when s = 1 (d ln ν/dT of the D341 line, central difference)', () => {
    const f = fadeFit(rowsOf({ cRef: 980, Tref: 298.15, viscousShare: 1, oil }), { oil, Tref: 298.15 });
    const h = 1e-3;
    const fd = (Math.log(oil.nu(298.15 + h)) - Math.log(oil.nu(298.15 - h))) / (2 * h);
    expectClose({ label: 'dcdT', computed: f.dcdT, expected: fd, tol: 1e-7, why: 'central difference error O(h²)' });
  });
  it('reads dyno rows in °C, m/s and kN from the header the same as SI rows', () => {
    const si = readUnitRows('253.15, 0.1, 500\n293.15, 0.1, 120', 'rows', [{ name: 'T', kind: 'temperature' }, { name: 'v', kind: 'velocity' }, { name: 'F', kind: 'force' }]).rows;
    const mixed = readUnitRows('T [°C]; v [mm/s]; F [kN]\n-20; 100; 0,5\n20; 100; 0,12', 'rows', [{ name: 'T', kind: 'temperature' }, { name: 'v', kind: 'velocity' }, { name: 'F', kind: 'force' }]).rows;
    mixed.forEach((r, i) => r.forEach((x, k) => expectClose({ label: `row ${i} col ${k}`, computed: x, expected: si[i]![k]!, tol: 1e-12 })));
  });
  it('refuses rows at one temperature (rows within 1 K count as one) with a typed error naming the rows', () => {
    expect(() => fadeFit([[293.15, 0.1, 100], [293.9, 0.2, 200]], { oil, Tref: 298.15 })).toThrow(InputRangeError);
    expect(() => fadeFit([[293.15, 0.1, 100]], { oil, Tref: 298.15 })).toThrow(/rows/);
    expect(() => fadeFit([[253.15, 0, 0], [293.15, 0, 0]], { oil, Tref: 298.15 })).toThrow(/two or more temperatures/);
    expect(() => fadeFit([[253.15, 0.1, -100], [293.15, 0.1, -50]], { oil, Tref: 298.15 })).toThrow(/not positive/);
  });
});
