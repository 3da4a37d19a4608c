/**
 * Numerical-audit findings on the thermal calculators, each reproduced with the audit's numbers.
 */
import { describe, expect, it } from 'vitest';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import type { CalculatorDefinition } from '../../../src/calculators/types.ts';
import { HOT_SURROUNDINGS_WARNING } from '../../../src/calculators/thermal/power-rating.ts';
import { expectClose } from '../../helpers/expectClose.ts';

function calc(id: string): CalculatorDefinition {
  const c = getCalculator(id);
  if (!c) throw new Error(`missing calculator ${id}`);
  return c;
}

describe('power-rating: surroundings hotter than the allowed temperature', () => {
  // Ø50 × 350 mm, ε = 0.9, 25 °C air, surroundings 200 K above the air, rated at 80 °C:
  // radiation brings more heat in than convection takes out (closed form Q(T_max) < 0).
  const inputs = { Tmax: 353.15, D: 0.05, L: 0.35, orientation: 'horizontal', Tamb: 298.15, dTsur: 200, V: 0, eps: 0.9 };
  it('warns and says the body cannot be rated when Q(T_max) ≤ 0', () => {
    const r = evaluate(calc('power-rating'), inputs);
    expect(r.outputs.Pmax).toBe(0);
    expect(r.outputs.rated).toBe('no');
    expect(r.warnings).toContain(HOT_SURROUNDINGS_WARNING);
  });
  it('rates normally in open air', () => {
    const r = evaluate(calc('power-rating'), { ...inputs, dTsur: 0 });
    expect(r.outputs.rated).toBe('yes');
    expect(r.warnings).not.toContain(HOT_SURROUNDINGS_WARNING);
    expectClose({ label: 'Pmax', computed: r.outputs.Pmax as number, expected: 41.01, tol: 1e-3, why: 'the page verification case (Incropera 6th ed. eqs. 9.34, 1.9; reference library numpy)' });
  });
});

describe('warm-up body model: integrated piecewise between switching times', () => {
  // Audit case: 100 W on for d = 0.512 of a 60 s period, defaults otherwise (C = 1395 J/K, Ø50 × 350 mm,
  // ε = 0.9, 25 °C still air), limit at 95 % of the body model's rise. The independent re-implementation
  // (scipy ODE integration between switching times) gives 4289 s; fixed-step RK4 across the switch gave 4167 s.
  it('reaches 95 % of the rise at ≈ 4289 s (was 4167 s)', () => {
    const base = { loss: 'body', duty: 0.512, period: 60, P: 100 };
    const Tss = evaluate(calc('warm-up'), base).outputs.TssBody as number;
    const r = evaluate(calc('warm-up'), { ...base, Tlimit: 298.15 + 0.95 * (Tss - 298.15) });
    expectClose({ label: 'tLimitBody', computed: r.outputs.tLimitBody as number, expected: 4289, tol: 3e-4, why: 'the audit gives 4 s.f.; provenance: reference library scipy (audit re-implementation, version not recorded)' });
  });
});

describe('warm-up: the shipped default power profile', () => {
  it('parses (a ";" inside a "#" comment split the comment into a bad entry: "line 2: not a number")', () => {
    const r = evaluate(calc('warm-up'), { power: 'profile' });
    // default: 120 W for 600 s, 0 W for 600 s → mean 60 W (closed form)
    expect(r.outputs.Pmean).toBe(60);
  });
});

describe('warm-up: typed UA far from the body model', () => {
  it('warns when T_ss is thousands of kelvin because the typed UA is far below the body model\'s', () => {
    // 50 W with UA = 0.0065 W/K: T_ss = 298.15 + 50/0.0065 ≈ 7990 K (closed form); the body model's UA is ≈ 0.75 W/K
    const r = evaluate(calc('warm-up'), { P: 50, UA: 0.0065, loss: 'body' });
    expect(r.outputs.Tss as number).toBeGreaterThan(7000);
    expect(r.warnings.join(' ')).toMatch(/typed UA .* body model/);
  });
  it('says nothing for a UA near the body model\'s', () => {
    const r = evaluate(calc('warm-up'), { P: 50, UA: 0.75, loss: 'body' });
    expect(r.warnings.join(' ')).not.toMatch(/typed UA/);
  });
});
