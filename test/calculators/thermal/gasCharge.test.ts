/**
 * gas-charge: the check (rod 14 mm, 2.5 MPa abs at 20 °C, 50 cm³ gas, 300 cm³ oil,
 * β = 0.7e-3 1/K → 4.03 MPa and 604 N at 80 °C, 1.85 MPa and 269 N at −20 °C; worked by hand with
 * the ideal-gas law p = p₀(T/T₀)V_g0/(V_g0 − ΔV_oil), Çengel & Boles, Thermodynamics, 8th ed.,
 * §3-8, from memory; closed form), the key contract, and the temperature it takes from the
 * warm-up and damping-fade pages.
 */
import { describe, expect, it } from 'vitest';
import { defaults, evaluate } from '../../../src/calculators/evaluate.ts';
import { feedQuery } from '../../../src/calculators/feeds.ts';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { ComputationError } from '../../../src/core/errors.ts';
import { readFileSync } from 'node:fs';
import { parseStudy } from '../../../src/studies/schema.ts';
import { runStudy } from '../../../src/studies/run.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const calc = getCalculator('gas-charge')!;
const TW210 = { p0: 2.5e6, T0: 293.15, Vg0: 50e-6, Voil: 300e-6, beta: 0.7e-3, dRod: 0.014, dPiston: 0.046 };

describe('gas-charge', () => {
  it('keeps the contract keys (SI, pressures absolute)', () => {
    expect(calc.inputs.map((i) => i.key)).toEqual(['p0', 'T0', 'Vg0', 'Voil', 'beta', 'dRod', 'dPiston', 'T', 'x', 'n']);
    const kinds = Object.fromEntries(calc.outputs.map((o) => [o.key, o.kind]));
    expect(kinds).toMatchObject({ p: 'pressure', Fext: 'force', kg: 'stiffness', FcMax: 'force', dVoil: 'volume' });
  });

  it.each([
    [353.15, 4.03e6, 604],
    [253.15, 1.85e6, 269],
  ])('at %f K gives the issue\'s %f Pa and %f N (3 s.f.)', (T, p, F) => {
    const r = evaluate(calc, { ...TW210, T });
    expectClose({ label: 'p', computed: r.outputs.p as number, expected: p, tol: 0.005 / 4.03, why: 'the issue states 3 s.f.' });
    expectClose({ label: 'Fext', computed: r.outputs.Fext as number, expected: F, tol: 0.5 / 269, why: 'the issue states whole newtons' });
  });

  it('x and n may be left out (CLI): rod fully out, slow stroke', () => {
    const r = evaluate(calc, { ...TW210, T: 353.15 }, { fillDefaults: true });
    expect(r.values.x).toBe(0);
    expect(r.values.n).toBe(1);
  });

  it('refuses a damper whose hot oil fills the gas space, with a typed error', () => {
    expect(() => evaluate(calc, { ...TW210, Voil: 1e-3, T: 473.15 })).toThrow(ComputationError);
  });

  it('takes its temperature from the warm-up peak and the damping-fade equilibrium', () => {
    for (const [id, out] of [['warm-up', 'Tpeak'], ['damping-fade', 'Teq']] as const) {
      const src = getCalculator(id)!;
      const feed = src.outputs.find((o) => o.key === out)!.feeds!.find((f) => f.page === 'gas-charge')!;
      const raw = id === 'damping-fade' ? { ...defaults(src), D: 0.05, L: 0.35 } : defaults(src);
      const res = evaluate(src, raw);
      const query = feedQuery(feed, out, res);
      expect(query, `${id}.${out}`).toBeDefined();
      const T = Number(new URLSearchParams(query).get('T'));
      expectClose({ label: `${id} T`, computed: T, expected: res.outputs[out] as number, tol: 1e-9, why: 'SI, 10 significant digits in the link' });
      const r = evaluate(calc, { ...TW210, T });
      expect(r.outputs.p as number).toBeGreaterThan(2.5e6);
    }
  });

  it('binds the steady temperature of a study to T and the oil expansion to β', () => {
    expect(calc.study?.inputs).toMatchObject({ T: 'steadyTemperature', beta: 'oilExpansion' });
  });

  it('in the TW-210 monotube study, takes the steady step\'s body temperature for the gas and the seals', () => {
    const parsed = parseStudy(readFileSync('content/studies/tw-210-monotube-gas-charge.json', 'utf8'));
    if (!parsed.ok) throw new Error(parsed.message);
    const run = runStudy(parsed.study, getCalculator);
    const step = (id: string) => run.steps.find((s) => s.id === id)!;
    expect(step('gas').from).toMatchObject({ T: 'steady.Ts' });
    expect(step('seals').from).toMatchObject({ T: 'steady.Ts' });
    expect(step('gas').inputs.T).toBe(step('steady').outputs.Ts);
    // same arithmetic as the page's closed form, evaluated at the study's temperature
    expectClose({ label: 'p', computed: step('gas').outputs.p as number, expected: evaluate(calc, { ...TW210, T: step('steady').outputs.Ts }).outputs.p as number, tol: 1e-12, why: 'the study adds no arithmetic' });
  });
});
