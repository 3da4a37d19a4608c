/** The verification runner: what a failing case reports (page, case, expected, computed). */
import { describe, expect, it } from 'vitest';
import { describeRow, difference, failureReport, runCase, verifyPage } from '../../src/content/verify.ts';
import type { PageVerificationCase } from '../../src/content/schema.ts';
import { getCalculator } from '../../src/calculators/registry.ts';

// closed form: ζ = c / (2√(km)) = 40 / 400 = 0.1 (Rao, Mechanical Vibrations, 6th ed., §2.6; closed form)
const good: PageVerificationCase = {
  name: 'ten kilogram mount', calculator: 'sdof', inputs: { m: 10, k: 4000, c: 40 }, expected: { zeta: 0.1, regime: 'underdamped' },
  tolerance: 1e-12, source: { key: 'rao2017', locator: '§2.6' }, provenance: 'closed form',
};

describe('verification runner', () => {
  it('passes a case the core reproduces', () => {
    const rows = runCase(good);
    expect(rows.map((r) => r.pass)).toEqual([true, true]);
    expect(rows[0]!.difference).toBeLessThan(1e-15);
  });

  it('reports page, case, output, expected and computed for a wrong expected value', () => {
    const v = verifyPage({ calculators: ['sdof'], verification: [{ ...good, expected: { zeta: 0.15 } }] });
    expect(v.failures).toHaveLength(1);
    const report = failureReport('content/x.mdx', v);
    expect(report).toContain('content/x.mdx');
    expect(report).toContain("case 'ten kilogram mount'");
    expect(report).toContain('zeta expected 0.15, computed 0.1');
  });

  it('names unknown calculators, unknown outputs and invalid inputs', () => {
    expect(verifyPage({ calculators: ['nope'], verification: [] }).problems[0]).toMatch(/nope/);
    expect(describeRow(runCase({ ...good, calculator: 'nope' })[0]!)).toMatch(/no calculator has the id 'nope'/);
    expect(describeRow(runCase({ ...good, expected: { zz: 1 } })[0]!)).toMatch(/no output 'zz'/);
    expect(describeRow(runCase({ ...good, inputs: { m: -1, k: 4000, c: 40 } })[0]!)).toMatch(/'m'/);
  });

  it("runs the cases of every calculator the page lists, from the calculator's definition", () => {
    const v = verifyPage({ calculators: ['sdof'], verification: [] });
    expect(new Set(v.rows.map((r) => r.case))).toEqual(new Set(getCalculator('sdof')!.verification.map((c) => c.name)));
    expect(v.failures).toEqual([]);
  });

  it('refuses a frontmatter case that repeats a definition case (same inputs, however written)', () => {
    const twin = getCalculator('sdof')!.verification[0]!;
    // the same inputs written with units: still the same case
    const copy: PageVerificationCase = { ...good, name: 'copied', inputs: { m: '10 kg', k: '4 kN/m', c: 40 } };
    expect(twin.inputs).toMatchObject({ m: 10, k: 4000, c: 40 });
    const v = verifyPage({ calculators: ['sdof'], verification: [copy] });
    expect(v.problems).toEqual([`frontmatter case 'copied' repeats the case '${twin.name}' of calculator sdof (same inputs); keep it once, in the definition`]);
    expect(verifyPage({ calculators: ['sdof'], verification: [{ ...copy, inputs: { m: 12, k: 4000, c: 40 } }] }).problems).toEqual([]);
  });

  it('uses a relative difference, absolute at an expected zero', () => {
    expect(difference(1.01, 1)).toBeCloseTo(0.01, 12);
    expect(difference(1e-9, 0)).toBe(1e-9);
  });
});
