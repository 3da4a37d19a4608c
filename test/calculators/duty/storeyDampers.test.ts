/**
 * storey-dampers against the single-storey page, against itself across its two frame layouts and
 * unit headers, and its messages for bad rows.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { parsePowerProfile } from '../../../src/core/thermal/index.ts';
import { runStudy } from '../../../src/studies/run.ts';
import { validateStudy } from '../../../src/studies/schema.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const storey = getCalculator('storey-dampers')!;
const single = getCalculator('structural-dampers')!;
const run = (raw: Record<string, unknown>) => evaluate(storey, raw, { fillDefaults: true });
const SI_ROWS = '140000, 120000000, 4.5, 4, 0.6108652382\n140000, 100000000, 3.8, 4, 0.6981317008\n100000, 70000000, 3.8, 2, 0.6981317008';

describe('storey-dampers', () => {
  it('one storey gives the structural-dampers result for any power-law damper, count, angle, drift and period [FEMA 356 §9.3 energy method (from memory); same method, independent code path]', () => {
    fc.assert(fc.property(
      fc.double({ min: 0.2, max: 1.5, noNaN: true }), fc.integer({ min: 1, max: 12 }), fc.double({ min: 0, max: 1.4, noNaN: true }),
      fc.double({ min: 0.002, max: 0.2, noNaN: true }), fc.double({ min: 0.2, max: 4, noNaN: true }),
      (alpha, n, theta, drift, T) => {
        const k = 6e7;
        const m = k * (T / (2 * Math.PI)) ** 2;
        const a = run({ storeys: `${m}, ${k}, 4, ${n}, ${theta}`, law: 'power', Fref: 2e5, vref: 1, alpha, demand: 'amplitude', roofAmp: drift, cycles: 20 / T });
        const b = evaluate(single, { Fref: 2e5, vref: 1, alpha, n, theta, drift, T, k, duration: 20 }, { fillDefaults: true });
        const pairs: [string, string][] = [['xiD', 'betaSup'], ['hotW', 'Wj'], ['hotForce', 'Fpeak'], ['hotStroke', 'stroke'], ['hotVelocity', 'vPeak'], ['hotP', 'P'], ['hotE', 'Eevent'], ['T1', 'T']];
        for (const [x, y] of pairs) {
          const want = (b.outputs[y] ?? b.values[y]) as number;
          expectClose({ label: `${x} vs ${y}`, computed: a.outputs[x] as number, expected: want, tol: 1e-9, why: 'T₁ from the eigen-solution agrees with T to round-off' });
        }
      }), { seed: 1, numRuns: 60 });
  });

  it('pasting the solved mode shape and period gives the same results as the shear building', () => {
    const a = run({ storeys: SI_ROWS });
    const modeText = `m [kg], phi, h [m], n, theta [rad]\n140000, 0.382325938028, 4.5, 4, 0.6108652382\n140000, 0.74591762812, 3.8, 4, 0.6981317008\n100000, 1, 3.8, 2, 0.6981317008`;
    const b = run({ frame: 'mode', modeRows: modeText, T: a.outputs.T1 });
    for (const key of ['gamma', 'xiD', 'roof', 'hotForce', 'hotW', 'Wtotal']) {
      expectClose({ label: key, computed: b.outputs[key] as number, expected: a.outputs[key] as number, tol: 1e-10, why: 'mode shape pasted to 12 s.f. (scipy fixture)' });
    }
  });

  it('rows with units in the header equal the same rows in SI', () => {
    const a = run({ storeys: SI_ROWS });
    const b = run({});
    for (const key of ['T1', 'xiD', 'roof', 'hotW']) expectClose({ label: key, computed: b.outputs[key] as number, expected: a.outputs[key] as number, tol: 1e-9, why: 'angles typed to 10 s.f.' });
  });

  it('the spectral demand reaches the roof as Γ₁·S_d, and the hottest damper is the one with most energy per cycle', () => {
    const r = run({ Sd: 0.05 });
    expectClose({ label: 'u5', computed: r.outputs.u5 as number, expected: (r.outputs.gamma as number) * 0.05, tol: 1e-15 });
    // dampers only under the roof: the hottest is in storey 3
    const top = run({ storeys: SI_ROWS.replace(/, 4, 0\.61\d+/, ', 0, 0.6').replace(/, 4, 0\.698\d+/, ', 0, 0.6') });
    expect(top.outputs.hotStorey).toBe('3 of 3');
    expect(run({}).outputs.hotStorey).toBe('1 of 3');
  });

  it('hands the hottest damper’s event to the warm-up page as a power profile of cycles × T₁', () => {
    const r = run({});
    const p = parsePowerProfile(r.handoff!.profile!);
    expectClose({ label: 'P', computed: p.P[0]!, expected: r.outputs.hotP as number, tol: 1e-7, why: 'profile written to 8 s.f.' });
    expectClose({ label: 'end', computed: p.t[p.t.length - 1]!, expected: r.outputs.duration as number, tol: 1e-7, why: '8 s.f.' });
  });

  it('names the line and column of a bad row', () => {
    expect(() => run({ storeys: 'm [t], k [kN/m], h [m], n, theta [deg]\n140, 120000, 4.5, 4, 35\n140, -5, 3.8, 4, 40' })).toThrow(/line 3: storey stiffness/);
    expect(() => run({ storeys: 'm [t], k [kN/m], h [m], n, theta [deg]\n140, 120000, 4.5, 2.5, 35' })).toThrow(/whole number/);
    expect(() => run({ storeys: 'm [t], k [kN/m], h [m], n, theta [deg]\n140, 120000, 4.5, 4, 95' })).toThrow(/line 2: brace angle/);
    expect(() => run({ storeys: 'm [t], k [kN/m], h [m], n\n140, 120000, 4.5, 4' })).toThrow(/columns/);
    expect(() => run({ storeys: 'm [t], k [kN/m], h [m], n, theta [deg]\n140, 120000, 4.5, 0, 35' })).toThrow(/no storey has a damper/);
    expect(() => run({ frame: 'mode', modeRows: 'm [t], phi, h [m], n, theta [deg]\n140, 0.5, 4.5, 4, 35\n100, 0, 3.8, 2, 40' })).toThrow(/roof/);
  });

  it('in a study the hottest damper’s stroke and frequency drive harmonic-duty to the same energy per cycle and mean power (an independent code path for E = ∮F dx)', () => {
    const parsed = validateStudy({
      format: 'dampbook-study', version: 1, title: 'TW-402 Hall C office wing, ground-storey damper',
      project: { number: 'TW-402', name: 'Hall C office wing', damper: 'fluid viscous, C = 200 kN·(s/m)^0.4', calculationNo: 'TW-402-C-011', preparedBy: 'Wen Hallberg', checkedBy: 'Tobias Quell', date: '2026-12-02' },
      quantities: { damperLaw: 'power', powerLawForce: '200 kN', powerLawVelocity: '1 m/s', powerLawExponent: 0.4 },
      limits: {},
      steps: [
        { id: 'storeys', page: 'storey-dampers', calculator: 'storey-dampers', inputs: { storeys: storey.inputs.find((i) => i.key === 'storeys')!.default as string, Sd: '30 mm' } },
        { id: 'harmonic', page: 'harmonic-duty', calculator: 'harmonic-duty', inputs: {} },
      ],
    });
    if (!parsed.ok) throw new Error(parsed.message);
    const [a, b] = runStudy(parsed.study, getCalculator).steps;
    expectClose({ label: 'E per cycle', computed: b!.outputs.E as number, expected: a!.outputs.hotW as number, tol: 1e-9, why: 'closed form λ(α) against the harmonic-duty path' });
    expectClose({ label: 'mean power', computed: b!.outputs.P as number, expected: a!.outputs.hotP as number, tol: 1e-9 });
    expect(b!.origins.X).toMatchObject({ kind: 'step' });
  });
});

describe('storey-dampers warnings', () => {
  it('warns when a pasted mode shape changes sign (not a fundamental mode)', () => {
    const r = evaluate(storey, { frame: 'mode', modeRows: 'm [t], phi, h [m], n, theta [deg]\n140, -0.2, 4.5, 4, 35\n140, 0.6, 3.8, 4, 40\n100, 1, 3.8, 2, 40' }, { fillDefaults: true });
    expect(r.warnings.join(' ')).toMatch(/changes sign/);
    expect(evaluate(storey, {}, { fillDefaults: true }).warnings).toEqual([]);
  });
});
