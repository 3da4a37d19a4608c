import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { QUANTITY_KINDS, UNITS, findUnit, fromSI, parseQuantity, toSI, unitsOf } from '../../../src/core/units/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Source: NIST Special Publication 811 (2008 ed.), Appendix B.8 (factors for units listed alphabetically)
// and B.9 (by kind). Provenance: published. Tolerance: NIST prints 7 significant figures.
const NIST_B8: readonly (readonly [kind: Parameters<typeof findUnit>[0], id: string, factor: number])[] = [
  ['length', 'in', 2.54e-2],
  ['length', 'ft', 3.048e-1],
  ['mass', 'lb', 4.535924e-1],
  ['mass', 'slug', 1.459390e1],
  ['force', 'lbf', 4.448222],
  ['energy', 'ft.lbf', 1.355818],
  ['energy', 'Btu', 1.055056e3],
  ['power', 'hp', 7.456999e2],
  ['power', 'Btu/h', 2.930711e-1],
  ['velocity', 'mph', 4.4704e-1],
  ['heatTransferCoefficient', 'Btu/hft2F', 5.678263],
  ['heatFlux', 'Btu/hft2', 3.154591],
  ['kinematicViscosity', 'ft2/s', 9.290304e-2],
  ['pressure', 'psi', 6.894757e3],
  ['specificHeat', 'Btu/lbF', 4.1868e3],
  ['thermalConductivity', 'Btu/hftF', 1.730735],
  ['volume', 'in3', 1.638706e-5],
  ['molarEnergy', 'kcal/mol', 4.184e3],
];

describe('unit table', () => {
  it('has an SI unit for every kind', () => {
    for (const k of QUANTITY_KINDS) expect(unitsOf(k).some((u) => u.factor === 1 && !u.offset)).toBe(true);
  });
  for (const [kind, id, factor] of NIST_B8) {
    it(`${id} matches NIST SP 811 Appendix B.8 (published)`, () => expectClose({ label: id, computed: findUnit(kind, id).factor, expected: factor, tol: 6e-7, why: 'NIST prints 7 s.f.' }));
  }
  it('converts absolute temperatures with their offset (NIST SP 811 B.9, published)', () => {
    expect(toSI(0, findUnit('temperature', 'degC'))).toBeCloseTo(273.15, 12);
    expect(toSI(32, findUnit('temperature', 'degF'))).toBeCloseTo(273.15, 10);
    expect(toSI(212, findUnit('temperature', 'degF'))).toBeCloseTo(373.15, 10);
  });
  it('converts temperature differences without an offset', () => {
    expect(toSI(9, findUnit('temperatureDifference', 'ddegF'))).toBeCloseTo(5, 12);
    expect(toSI(10, findUnit('temperatureDifference', 'ddegC'))).toBe(10);
  });
  it('round-trips every unit (common practice, no source)', () => {
    fc.assert(fc.property(fc.constantFrom(...UNITS), fc.double({ min: -1e6, max: 1e6, noNaN: true }), (u, x) =>
      Math.abs(fromSI(toSI(x, u), u) - x) <= 1e-9 * (1 + Math.abs(x))), { seed: 1, numRuns: 100 });
  });
  it('parses unit-suffixed values', () => {
    expect(parseQuantity('25 lb', 'mass')).toBeCloseTo(11.33980925, 10);
    expect(parseQuantity('3', 'mass')).toBe(3);
    expect(parseQuantity('10 mm', 'length')).toBeCloseTo(0.01, 15);
    expect(() => parseQuantity('25 furlongs', 'length')).toThrow(/not a unit of length/);
    expect(() => parseQuantity('abc', 'length')).toThrow(/not a number/);
  });
});
