/**
 * thermal-life: the check (L_ref = 1000 h at 100 °C, E_a = 82.4 kJ/mol, half the time at
 * 80 °C and half at 110 °C → 900 h; worked by hand: lives 4500 h and 500 h, Miner 1945 sum;
 * closed form), the contract, and the warm-up hand-off checked against the warm-up's own closed
 * form integrated independently (adaptive Simpson on the exact lumped curve, Incropera et al.,
 * Fundamentals of Heat and Mass Transfer, 6th ed., §5.3, from memory).
 */
import { describe, expect, it } from 'vitest';
import { defaults, evaluate } from '../../../src/calculators/evaluate.ts';
import { feedQuery } from '../../../src/calculators/feeds.ts';
import { getCalculator } from '../../../src/calculators/registry.ts';
import type { TextInput } from '../../../src/calculators/types.ts';
import { ageingLife } from '../../../src/core/ageing/index.ts';
import { adaptiveSimpson } from '../../../src/core/numeric/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const calc = getCalculator('thermal-life')!;
const warm = getCalculator('warm-up')!;
const H = 3600;
const SEAL = { Lref: 1000 * H, Tref: 373.15, Ea: 82.4e3 };

function fromWarmUp(raw: Record<string, unknown>) {
  const src = evaluate(warm, { ...defaults(warm), ...raw });
  const feed = warm.outputs.find((o) => o.key === 'Tpeak')!.feeds!.find((f) => f.page === 'thermal-life')!;
  const params = Object.fromEntries(new URLSearchParams(feedQuery(feed, 'Tpeak', src)));
  return { src, dst: evaluate(calc, { ...defaults(calc), ...SEAL, ...params }), params };
}

describe('thermal-life', () => {
  it('keeps the contract outputs: life (s), damage, Teq (K)', () => {
    const kinds = Object.fromEntries(calc.outputs.map((o) => [o.key, o.kind]));
    expect(kinds).toMatchObject({ life: 'time', damage: 'dimensionless', Teq: 'temperature' });
  });

  it('half the time at 80 °C and half at 110 °C gives 900 h', () => {
    const r = evaluate(calc, { ...SEAL, history: 't [h], T [°C]\n0, 80\n450, 80\n450, 110\n900, 110' });
    expectClose({ label: 'life', computed: (r.outputs.life as number) / H, expected: 900, tol: 0.5 / 900, why: 'the issue states whole hours' });
    expect(r.outputs.lifeText).toBe('900 h (37.5 days)');
  });

  it('remaining life is the life less the time in service, and never negative', () => {
    const base = { ...SEAL, mode: 'constant', T: 373.15, tConst: 10 * H };
    expectClose({ label: 'remaining', computed: evaluate(calc, { ...base, service: 400 * H }).outputs.remaining as number, expected: 600 * H, tol: 1e-12, why: 'closed form: L(T_ref) = L_ref' });
    const past = evaluate(calc, { ...base, service: 2000 * H });
    expect(past.outputs.remaining).toBe(0);
    expect(past.warnings.join(' ')).toMatch(/past the estimated life/);
  });

  it('ages the warm-up run as the warm-up computes it (constant power, cold start, then cool-down)', () => {
    const { src, dst } = fromWarmUp({ P: 50, Cth: 1395, UA: 0.745664, Tamb: 298.15, t: 3600 });
    const tau = 1395 / 0.745664;
    const rise = 50 / 0.745664;
    const T = (t: number) => (t <= 3600 ? 298.15 + rise * (1 - Math.exp(-t / tau)) : 298.15 + rise * (1 - Math.exp(-3600 / tau)) * Math.exp(-(t - 3600) / tau));
    const law = { kind: 'arrhenius', ...SEAL } as const;
    const tEnd = 3600 + 3 * tau;
    const damage = adaptiveSimpson((t) => 1 / ageingLife(law, T(t)), 0, 3600, 1e-14) + adaptiveSimpson((t) => 1 / ageingLife(law, T(t)), 3600, tEnd, 1e-14);
    expectClose({ label: 'peak', computed: dst.outputs.Tpeak as number, expected: src.outputs.T as number, tol: 1e-6, why: 'the run ends at the time of interest; 7 s.f. in the rows' });
    expectClose({ label: 'duration', computed: dst.outputs.duration as number, expected: tEnd, tol: 1e-8, why: 'run + 3τ of cool-down, 9 s.f. in the rows' });
    expectClose({ label: 'damage', computed: dst.outputs.damage as number, expected: damage, tol: 2e-4, why: 'straight lines between 320 rows of smooth exponentials (7e-5 found on 2026-12-02; the chords lie above the convex cool-down, so the error is on the safe side)' });
  });

  it('keeps every switching time of a cyclic warm-up profile, so the peaks of the run are in the history', () => {
    const { dst } = fromWarmUp({ power: 'profile', profile: '0, 120\n600, 0\n1200', after: 'repeat', Cth: 1395, UA: 0.745664, Tamb: 298.15, t: 3600 });
    // the highest point of the first three cycles is the end of the third on phase, t = 3000 s
    const warmAt = evaluate(warm, { ...defaults(warm), power: 'profile', profile: '0, 120\n600, 0\n1200', after: 'repeat', Cth: 1395, UA: 0.745664, Tamb: 298.15, t: 3000 });
    expectClose({ label: 'peak', computed: dst.outputs.Tpeak as number, expected: warmAt.outputs.T as number, tol: 1e-6, why: 'the switching time is a row; 7 s.f.' });
  });

  it('takes the whole hand-off: its field is longer than the hand-off may be', () => {
    const field = calc.inputs.find((i) => i.key === 'history') as TextInput;
    expect(field.fromUrl).toBe(true);
    expect(field.maxLength).toBeGreaterThanOrEqual(warm.handoffs!.find((h) => h.key === 'history')!.maxLength);
  });

  it('refuses a study temperature on a step that ages over a history', () => {
    expect(calc.study!.refuse!({ mode: 'history' }, new Set(['T']))).toMatch(/mode = constant/);
    expect(calc.study!.refuse!({ mode: 'constant' }, new Set(['T']))).toBeUndefined();
  });
});
