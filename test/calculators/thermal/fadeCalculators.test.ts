/**
 * The calibrated fade law travels: fade-fit's result opens damping-fade with the same law, fluid and
 * reference, so the two pages give the same cold-force ratio and fade rate (closed form: one law,
 * evaluated twice). Old damping-fade keys keep their meaning (CLI contract).
 */
import { describe, expect, it } from 'vitest';
import { defaults, evaluate } from '../../../src/calculators/evaluate.ts';
import { feedQuery } from '../../../src/calculators/feeds.ts';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const fit = getCalculator('fade-fit')!;
const fade = getCalculator('damping-fade')!;
const feed = fit.outputs.find((o) => o.key === 'share')!.feeds![0]!;
const BODY = { D: 0.05, L: 0.35, cRef: 980 };

describe('fade-fit → damping-fade carries the calibrated law', () => {
  const cases: Record<string, unknown>[] = [
    {},
    { fadeLaw: 'physical', beta: 8e-4 },
    { fluid: 'vg', grade: 'VG32', VI: 120 },
    { fluid: 'silicone', nu40: 70e-6, nu100: 28e-6 },
    { fluid: 'table' },
    { Tref: 293.15, Tcold: 243.15 },
  ];
  for (const raw of cases) {
    it(`gives the same cold ratio and fade rate on both pages (${JSON.stringify(raw)})`, () => {
      const src = evaluate(fit, { ...defaults(fit), ...raw });
      const q = feedQuery(feed, 'share', src);
      expect(q).toBeDefined();
      const params = Object.fromEntries(new URLSearchParams(q));
      const dst = evaluate(fade, { ...defaults(fade), ...BODY, ...params });
      expectClose({ label: 'coldRatio', computed: dst.outputs.coldRatio as number, expected: src.outputs.coldRatio as number, tol: 1e-8, why: 'same law; the link carries 10 significant digits' });
      expectClose({ label: 'dcdT', computed: dst.outputs.dcdT as number, expected: src.outputs.dcdT as number, tol: 1e-8, why: 'same law; 10 significant digits' });
    });
  }
});

describe('damping-fade keeps its contract and reports past the limit', () => {
  it('computes with only the keys it took before (share law, mineral oil by ν40/ν100)', () => {
    const r = evaluate(fade, { ...BODY, share: 0.3, nu40: 20e-6, nu100: 4.5e-6, duty: 'harmonic', X: 0.025, f: 2 });
    // the page's washboard example: 75.5 °C and 747 N·s/m (share 0.3, unchanged by the new laws)
    expectClose({ label: 'Teq', computed: (r.outputs.Teq as number) - 273.15, expected: 75.5, tol: 1e-3, why: 'page example, 3 s.f.' });
    expectClose({ label: 'cEq', computed: r.outputs.cEq as number, expected: 747, tol: 1e-3, why: 'page example, 3 s.f.' });
    // the figure: share 0.3 with this oil gives about 5.5 × c_ref at −20 °C
    expectClose({ label: 'coldRatio', computed: r.outputs.coldRatio as number, expected: 5.471, tol: 1e-3, why: 'independent D341 evaluation, 4 s.f.' });
  });
  it('reports the equilibrium above the limit when none lies below it', () => {
    const r = evaluate(fade, { ...BODY, share: 0.3, duty: 'random', P: 80.85 });
    expect(r.outputs.status).toBe('no equilibrium below the limit');
    expect(r.outputs.Tactual as number).toBeGreaterThan(373.15);
    expect(r.outputs.cActual as number).toBeLessThan(r.outputs.cLimit as number);
  });
});
