import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  andradeCurve, fadeCoefficient, fadeLogSlope, fadeRatio, mineralOilCurve, oilDensity, parseViscosityTable, viscosityTableCurve, waltherFit,
} from '../../../src/core/thermal/index.ts';
import { ComputationError, InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const oil = mineralOilCurve(20e-6, 4.5e-6);
const T15 = 288.15;

describe('physical fade law: laminar part ∝ μ = ρν, orifice part ∝ ρ (closed forms)', () => {
  const beta = 7e-4;
  it('all orifice flow (s = 0) follows the density ratio ρ(T)/ρ(T_ref) alone', () => {
    for (const T of [233.15, 253.15, 353.15, 393.15]) {
      const rho = oilDensity(870, beta, T) / oilDensity(870, beta, 298.15);
      expectClose({ label: `ratio ${T}`, computed: fadeRatio({ cRef: 980, Tref: 298.15, viscousShare: 0, oil, beta }, T), expected: rho, tol: 1e-14, why: 'same closed form' });
      expectClose({ label: `closed ${T}`, computed: rho, expected: (1 + beta * 10) / (1 + beta * (T - T15)), tol: 1e-14 });
    }
  });
  it('all laminar flow (s = 1) follows the ratio of dynamic viscosities μ = ρν', () => {
    for (const T of [253.15, 313.15, 373.15]) {
      const mu = (T: number) => oilDensity(870, beta, T) * oil.nu(T);
      expectClose({ label: `ratio ${T}`, computed: fadeRatio({ cRef: 980, Tref: 298.15, viscousShare: 1, oil, beta }, T), expected: mu(T) / mu(298.15), tol: 1e-14, why: 'same closed form' });
    }
  });
  it('is the share law when β = 0, and keeps the original D341-fit form of the model working', () => {
    const fit = waltherFit(20e-6, 4.5e-6);
    fc.assert(fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 233.15, max: 423.15, noNaN: true }), (s, T) => {
      const a = fadeCoefficient({ cRef: 980, Tref: 298.15, viscousShare: s, oil: fit }, T);
      const b = fadeCoefficient({ cRef: 980, Tref: 298.15, viscousShare: s, oil, beta: 0 }, T);
      return Math.abs(a / b - 1) < 1e-13;
    }), { seed: 1, numRuns: 200 });
  });
  it('has the fade rate of its closed form: d ln c/dT matches a central difference for any s and β', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1e-3, noNaN: true }), fc.double({ min: 243.15, max: 413.15, noNaN: true }), (s, b, T) => {
      const m = { cRef: 980, Tref: 298.15, viscousShare: s, oil, beta: b };
      const h = 1e-3;
      const fd = (Math.log(fadeRatio(m, T + h)) - Math.log(fadeRatio(m, T - h))) / (2 * h);
      return Math.abs(fadeLogSlope(m, T) - fd) <= 1e-7 * Math.max(1e-3, Math.abs(fd));
    }), { seed: 1, numRuns: 200 });
  });
  it('refuses an expansion coefficient outside [0, 0.01) 1/K', () => {
    expect(() => fadeRatio({ cRef: 980, Tref: 298.15, viscousShare: 0.3, oil, beta: -1e-4 }, 300)).toThrow(InputRangeError);
    expect(() => oilDensity(870, 0.02, 300)).toThrow(/beta/);
  });
});

describe('silicone fluid: two-point Andrade line ln ν = a + b/T (closed form)', () => {
  const c = andradeCurve(313.15, 70e-6, 373.15, 28e-6);
  it('passes through both points and is straight in ln ν against 1/T', () => {
    expectClose({ label: 'ν40', computed: c.nu(313.15), expected: 70e-6, tol: 1e-14 });
    expectClose({ label: 'ν100', computed: c.nu(373.15), expected: 28e-6, tol: 1e-14 });
    const b = Math.log(70 / 28) / (1 / 313.15 - 1 / 373.15);
    expectClose({ label: 'ν(−20 °C)', computed: c.nu(253.15), expected: 70e-6 * Math.exp(b * (1 / 253.15 - 1 / 313.15)), tol: 1e-13 });
    expectClose({ label: 'slope', computed: c.dlnNu(298.15), expected: -b / 298.15 ** 2, tol: 1e-14 });
  });
  it('refuses points where the warmer fluid is thicker', () => {
    expect(() => andradeCurve(313.15, 20e-6, 373.15, 30e-6)).toThrow(ComputationError);
  });
});

describe('measured viscosity table: ln ν piecewise linear in 1/T', () => {
  it('passes through every row and, on D341 rows 10 K apart, stays within 1 % of the D341 line between them', () => {
    // common practice, no source: the Andrade pieces bend less than the D341 double logarithm
    const Ts = Array.from({ length: 13 }, (_, i) => 253.15 + 10 * i);
    const { curve } = viscosityTableCurve(Ts.map((T) => [T, oil.nu(T)]));
    for (const T of Ts) expectClose({ label: `row ${T}`, computed: curve.nu(T), expected: oil.nu(T), tol: 1e-12 });
    for (let T = 253.65; T < 373.15; T += 0.5) expectClose({ label: `between ${T}`, computed: curve.nu(T), expected: oil.nu(T), tol: 0.01, why: 'interpolation error of 10 K pieces, largest (0.95 %) at the cold end' });
  });
  it('falls monotonically with temperature, inside and beyond the table', () => {
    const { curve } = parseViscosityTable('T [°C], nu [mm²/s]\n0, 187\n40, 22\n100, 4.29');
    fc.assert(fc.property(fc.double({ min: 230, max: 450, noNaN: true }), (T) => curve.nu(T + 0.5) < curve.nu(T)), { seed: 1, numRuns: 200 });
  });
  it('refuses one row, a repeated temperature and a viscosity that rises with temperature, naming the input', () => {
    expect(() => parseViscosityTable('T [°C], nu [mm²/s]\n40, 22')).toThrow(/nuTable/);
    expect(() => parseViscosityTable('T [°C], nu [mm²/s]\n40, 22\n40, 21')).toThrow(/appears twice/);
    expect(() => parseViscosityTable('T [°C], nu [mm²/s]\n40, 22\n100, 30')).toThrow(/thins as it warms/);
    expect(() => parseViscosityTable('T [°C], nu [furlongs]\n40, 22\n100, 4')).toThrow(/not a unit/);
  });
});

describe('measured viscosity table: slope at a row', () => {
  it('takes the mean of the two pieces at a row, the same a rounding step either side of it', () => {
    const { curve } = parseViscosityTable('T [°C], nu [mm²/s]\n0, 187\n25, 42.2\n40, 22.0');
    const piece = (T1: number, n1: number, T2: number, n2: number) => Math.log(n2 / n1) / (1 / T2 - 1 / T1);
    const mean = 0.5 * (piece(273.15, 187, 298.15, 42.2) + piece(298.15, 42.2, 313.15, 22.0));
    for (const T of [298.15, 298.15 + 3e-13, 298.15 - 3e-13]) {
      expectClose({ label: `slope at ${T}`, computed: curve.dlnNu(T), expected: -mean / T ** 2, tol: 1e-9, why: 'closed form of the pieces' });
    }
  });
});
