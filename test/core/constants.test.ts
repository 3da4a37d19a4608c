/**
 * The physical and standard constants against their definitions, and a guard that none of them is
 * typed again elsewhere in the core or the calculators (a second copy is how 9.80665 became 9.81).
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { AIR_TABLE_RANGE, ISO_8608_N0, ISO_8608_N0_SQUARED, MOLAR_GAS_CONSTANT, STANDARD_ATMOSPHERE, STANDARD_GRAVITY, STEFAN_BOLTZMANN, ZERO_CELSIUS } from '../../src/core/constants.ts';
import { AIR_TABLE } from '../../src/core/thermal/airTable.ts';
import { findUnit, toSI } from '../../src/core/units/convert.ts';
import { expectClose } from '../helpers/expectClose.ts';

// value, definition, source, provenance
const DEFINED: readonly (readonly [string, number, number, string, string])[] = [
  ['standard gravity g_n, m/s²', STANDARD_GRAVITY, 9.80665, 'BIPM/NIST SP 330 (2019), SI Brochure 9th ed., Appendix 1, 3rd CGPM (1901) declaration: 980.665 cm/s²', 'published'],
  ['0 °C in kelvin', ZERO_CELSIUS, 273.15, 'NIST SP 330 (2019), SI Brochure 9th ed. §2.3.1: t/°C = T/K − 273.15', 'published'],
  ['ISO 8608 reference spatial frequency n₀, cycle/m', ISO_8608_N0, 0.1, 'ISO 8608:2016, definition of G_d(n₀) at n₀ = 0.1 cycle/m', 'from memory'],
  ['ISO 8608 n₀², cycle²/m²', ISO_8608_N0_SQUARED, 0.01, '(0.1 cycle/m)², exact decimal', 'closed form'],
  ['standard atmosphere, Pa', STANDARD_ATMOSPHERE, 101325, 'NIST SP 811 (2008) Appendix B.8: atmosphere, standard (atm) = 1.01325 × 10⁵ Pa (exact)', 'published'],
];

describe('constants', () => {
  it.each(DEFINED)('%s is its defined value', (_label, value, defined) => {
    expect(value).toBe(defined);
  });

  it('σ equals 2π⁵k⁴/(15h³c²) from the exact SI constants to the ten digits CODATA 2018 lists', () => {
    // h, c, k exact since the 2019 SI (CODATA 2018, Tiesinga et al., Rev. Mod. Phys. 93, 025010, Table XXXI); closed form
    const h = 6.62607015e-34, c = 299792458, k = 1.380649e-23;
    const sigma = (2 * Math.PI ** 5 * k ** 4) / (15 * h ** 3 * c ** 2);
    expectClose({ label: 'σ', computed: STEFAN_BOLTZMANN, expected: sigma, tol: 1e-9, why: 'CODATA lists σ to 10 significant digits' });
  });

  it('R equals N_A·k from the exact SI constants (CODATA 2018 lists R = 8.314 462 618… J/(mol·K))', () => {
    // N_A and k exact since the 2019 SI (CODATA 2018, Tiesinga et al., Rev. Mod. Phys. 93, 025010, Table XXXI); closed form
    const NA = 6.02214076e23, k = 1.380649e-23;
    expectClose({ label: 'R', computed: MOLAR_GAS_CONSTANT, expected: NA * k, tol: 1e-15, why: 'the product of two exact constants, to double precision' });
    expectClose({ label: 'R (CODATA digits)', computed: MOLAR_GAS_CONSTANT, expected: 8.314462618, tol: 1e-10, why: 'CODATA 2018 prints 10 significant digits' });
  });

  it('the air table rows span exactly the stated air-table range', () => {
    // incropera2007 Table A.4 rows 200–700 K (from memory); the range must be the rows' own ends
    expect([AIR_TABLE[0]!.T, AIR_TABLE[AIR_TABLE.length - 1]!.T]).toEqual([AIR_TABLE_RANGE.min, AIR_TABLE_RANGE.max]);
  });

  it('the units "g" and "°C" are built on the same constants', () => {
    expect(toSI(1, findUnit('acceleration', 'gn'))).toBe(STANDARD_GRAVITY);
    expect(toSI(0, findUnit('temperature', 'degC'))).toBe(ZERO_CELSIUS);
  });
});

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((n) => {
    const p = join(dir, n);
    return statSync(p).isDirectory() ? files(p) : n.endsWith('.ts') ? [p] : [];
  });
}

// Literals that must appear in src/core/constants.ts only (doc comments and @example lines aside).
const GUARDED: readonly (readonly [string, RegExp])[] = [
  ['standard gravity', /9\.8066?5?\b|\b9\.81\b/],
  ['Stefan–Boltzmann constant', /5\.67\d*e-8/],
  ['Celsius offset in a conversion', /[-+]\s*273\.15\b/],
  ['molar gas constant', /\b8\.314\d*/],
  ['standard atmosphere', /\b101325\b|\b101\.325\b|\b1\.01325e5\b/],
];

describe('no constant is written twice', () => {
  const code = [...files('src/core'), ...files('src/calculators')].filter((f) => !f.endsWith('constants.ts'));
  it.each(GUARDED)('%s is imported from src/core/constants.ts, not typed again', (_what, re) => {
    const hits: string[] = [];
    for (const f of code) {
      readFileSync(f, 'utf8').split('\n').forEach((line, i) => {
        if (/^\s*(\*|\/\/|\/\*)/.test(line)) return; // prose and examples may quote the value
        // a verification case's reference value is typed on purpose, independent of the constant it checks
        if (/\b(expected|why):/.test(line)) return;
        if (re.test(line)) hits.push(`${f}:${i + 1}: ${line.trim().slice(0, 100)}`);
      });
    }
    expect(hits).toEqual([]);
  });
});
