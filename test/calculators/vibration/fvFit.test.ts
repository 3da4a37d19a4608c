/**
 * fv-fit: the CLI contract of issue 13 (keys), the hand-offs (the law arriving on the duty pages is
 * the fitted law: closed forms E = πcωX² for linear, Chopra, Dynamics of Structures, 5th ed., 2017,
 * eq. 3.8.1, published; peak force C·(ωX)^α for the power law, closed form), and refusals that
 * name the input and the line.
 */
import { describe, expect, it } from 'vitest';
import { defaults, evaluate } from '../../../src/calculators/evaluate.ts';
import { feedQuery } from '../../../src/calculators/feeds.ts';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { bothWays, sheetOf, speeds } from '../../../src/calculators/vibration/fv-fit.records.ts';
import { damperForce, energyPerCycle } from '../../../src/core/dampers/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const calc = getCalculator('fv-fit')!;
const keys = (side: 'inputs' | 'outputs') => calc[side].map((d) => d.key);

/** Opens the feed of `out` to `page` from a result, as the target page reads its address. */
function follow(raw: Record<string, unknown>, out: string, page: string, extra: Record<string, unknown>) {
  const src = evaluate(calc, { ...defaults(calc), ...raw });
  const feed = calc.outputs.find((o) => o.key === out)!.feeds!.find((f) => f.page === page)!;
  const query = feedQuery(feed, out, src);
  expect(query, `${out} → ${page}`).toBeDefined();
  const target = getCalculator(page)!;
  return { src, dst: evaluate(target, { ...defaults(target), ...Object.fromEntries(new URLSearchParams(query)), ...extra }) };
}

describe('fv-fit contract', () => {
  it('keeps points, law (linear|power|bilinear), vRated → c, C, alpha, c1, c2, c1c, c2c, vknee, r2, rmsError and the ratio', () => {
    expect(keys('inputs')).toEqual(expect.arrayContaining(['points', 'law', 'vRated', 'F0', 'band']));
    expect(keys('outputs')).toEqual(expect.arrayContaining(['c', 'C', 'alpha', 'Fref', 'vref', 'c1', 'c2', 'c1c', 'c2c', 'vknee', 'r2', 'rmsError', 'Frated', 'FratedComp', 'ratio', 'outside']));
    const law = calc.inputs.find((d) => d.key === 'law')!;
    expect(law.kind === 'choice' && law.options.map((o) => o.value)).toEqual(['linear', 'power', 'bilinear']);
  });

  it('gives C in SI whatever the unit system (a dimensionless number) and the same law as a force F_ref', () => {
    expect(calc.outputs.find((o) => o.key === 'C')!.kind).toBe('dimensionless');
    expect(calc.outputs.find((o) => o.key === 'Fref')!.kind).toBe('force');
  });

  it('refuses a malformed row naming the input and the line, and Celsius in the kelvin column', () => {
    expect(() => evaluate(calc, { law: 'linear', points: 'v,F\n0.1,98\n0.2,196\n0.3,abc\n0.4,392' })).toThrow(InputRangeError);
    expect(() => evaluate(calc, { law: 'linear', points: 'v,F\n0.1,98\n0.2,196\n0.3,abc\n0.4,392' })).toThrow(/'points'.*line 4/);
    expect(() => evaluate(calc, { law: 'linear', points: 'v,F,T\n0.1,98,20\n0.2,196,20\n0.3,294,21' })).toThrow(/kelvin/);
    expect(() => evaluate(calc, { law: 'bilinear', points: '0.1,98\n0.2,196\n0.3,294' })).toThrow(/'points'.*four points/);
  });

  it('removes the gas force before fitting: an offset sheet with F0 gives the clean law', () => {
    const v = bothWays(speeds(0.05, 1, 10));
    const sheet = v.map((x) => `${x}, ${980 * x - 150}`).join('\n');
    const r = evaluate(calc, { law: 'linear', points: sheet, F0: -150 });
    expectClose({ label: 'c', computed: r.outputs.c as number, expected: 980, tol: 1e-12 });
    expect(evaluate(calc, { law: 'linear', points: sheet }).warnings.join(' ')).toMatch(/about -150 N.*gas-spring/);
  });
});

describe('the fitted law arrives on the duty pages unchanged', () => {
  const X = 0.025;
  const f = 1.5;
  const omega = 2 * Math.PI * f;

  it('linear → harmonic-duty: E = πcωX² with the fitted c (Chopra eq. 3.8.1)', () => {
    const points = sheetOf({ kind: 'linear', c: 1234 }, bothWays(speeds(0.05, 1, 8)));
    const { dst } = follow({ law: 'linear', points }, 'c', 'harmonic-duty', { X, f });
    expectClose({ label: 'E', computed: dst.outputs.E as number, expected: Math.PI * 1234 * omega * X * X, tol: 1e-8, why: '10 significant digits in the link' });
  });

  it('power → harmonic-duty and road-power: F_ref at v_ref carries C and α (peak force C·(ωX)^α)', () => {
    const points = sheetOf({ kind: 'power', C: 3000, alpha: 0.6 }, bothWays(speeds(0.05, 0.8, 10)));
    const { dst } = follow({ law: 'power', points, vRated: 0.52 }, 'Fref', 'harmonic-duty', { X, f });
    expectClose({ label: 'Fpeak', computed: dst.outputs.Fpeak as number, expected: 3000 * (omega * X) ** 0.6, tol: 1e-8 });
    const road = follow({ law: 'power', points, vRated: 0.52 }, 'Fref', 'road-power', {});
    expect(road.dst.outputs.P).toBeGreaterThan(0);
  });

  it('bilinear → harmonic-duty: every slope and the knee arrive (energy equals the quadrature of the fitted law)', () => {
    const law = { kind: 'bilinear' as const, vknee: 0.1, rebound: { c1: 3200, c2: 1300 }, compression: { c1: 1280, c2: 520 } };
    const points = sheetOf(law, bothWays(speeds(0.0237, 0.8037, 15)));
    const { dst } = follow({ law: 'bilinear', points }, 'c1', 'harmonic-duty', { X, f });
    expectClose({ label: 'E', computed: dst.outputs.E as number, expected: energyPerCycle(law, X, omega), tol: 1e-6, why: 'fit exact to 1e-9; link 10 s.f.' });
    expectClose({ label: 'Fpeak', computed: dst.outputs.Fpeak as number, expected: damperForce(law, omega * X), tol: 1e-6 });
  });
});
