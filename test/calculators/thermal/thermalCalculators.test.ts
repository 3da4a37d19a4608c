import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { DampbookError } from '../../../src/core/errors.ts';
import { bodyCooling, fadeCoefficient, waltherFit } from '../../../src/core/thermal/index.ts';
import type { CalculatorDefinition } from '../../../src/calculators/types.ts';
import { expectClose } from '../../helpers/expectClose.ts';

function calc(id: string): CalculatorDefinition {
  const c = getCalculator(id);
  if (!c) throw new Error(`missing calculator ${id}`);
  return c;
}

/** The CLI contracts of the thermal issue: ids, input keys and output keys other tools rely on. */
const CONTRACTS = {
  'body-cooling': { inputs: ['D', 'L', 'orientation', 'Ts', 'Tamb', 'V', 'eps', 'ends'], outputs: ['hConv', 'hRad', 'Q', 'UA'] },
  'steady-temperature': { inputs: ['P', 'D', 'L', 'orientation', 'Tamb', 'V', 'eps'], outputs: ['Ts', 'hConv', 'hRad'] },
  'power-rating': { inputs: ['Tmax', 'D', 'L', 'orientation', 'Tamb', 'V', 'eps'], outputs: ['Pmax'] },
  'oil-viscosity': { inputs: ['nu40', 'nu100', 'T'], outputs: ['nu', 'A', 'B'] },
  'warm-up': { inputs: ['P', 'Cth', 'UA', 'Tamb', 'Tlimit', 't'], outputs: ['tau', 'Tss', 'tLimit', 'reached', 'T'] },
} as const;

describe('thermal CLI contracts', () => {
  for (const [id, c] of Object.entries(CONTRACTS)) {
    it(`${id} keeps its input and output keys`, () => {
      const def = calc(id);
      for (const k of c.inputs) expect(def.inputs.map((i) => i.key)).toContain(k);
      for (const k of c.outputs) expect(def.outputs.map((o) => o.key)).toContain(k);
    });
  }
  it('warm-up marks tLimit optional and reports reached as yes/no text', () => {
    const def = calc('warm-up');
    expect(def.outputs.find((o) => o.key === 'tLimit')?.optional).toBe(true);
    expect(def.outputs.find((o) => o.key === 'reached')?.kind).toBe('text');
    const r = evaluate(def, { P: 50, Cth: 1395, UA: 0.745664, Tamb: 298.15, Tlimit: 373.15 }, { fillDefaults: false });
    expect(r.outputs.reached).toBe('no');
    expect(r.outputs.tLimit).toBeUndefined();
  });
  it('body-cooling takes ends as a number 0/1 and the CLI values in SI', () => {
    const a = evaluate(calc('body-cooling'), { D: 0.05, L: 0.35, orientation: 'horizontal', Ts: 353.15, Tamb: 298.15, V: 0, eps: 0.9, ends: 1 });
    const b = evaluate(calc('body-cooling'), { D: 0.05, L: 0.35, orientation: 'horizontal', Ts: 353.15, Tamb: 298.15, V: 0, eps: 0.9 });
    expectClose({ label: 'Q ratio with ends', computed: (a.outputs.Q as number) / (b.outputs.Q as number), expected: 1 + 0.05 / (2 * 0.35), tol: 1e-12, why: 'ends at lateral h: area ratio 1 + D/2L' });
  });
  it('radiates nothing when the surroundings are as hot as the body (h_r·(T_s − T_sur) = 0, closed form)', () => {
    const r = evaluate(calc('body-cooling'), { D: 0.05, L: 0.35, orientation: 'horizontal', Ts: 353.15, Tamb: 298.15, dTsur: 55, V: 0, eps: 0.9 });
    expectClose({ label: 'Q = h_conv·A·ΔT', computed: r.outputs.Q as number, expected: (r.outputs.hConv as number) * Math.PI * 0.05 * 0.35 * 55, tol: 1e-12, why: 'same arithmetic' });
  });
  it('shows the slenderness warning for a vertical body in its result', () => {
    const r = evaluate(calc('body-cooling'), { D: 0.05, L: 0.35, orientation: 'vertical', Ts: 353.15, Tamb: 298.15, V: 0, eps: 0.9 });
    expect(r.warnings.join(' ')).toMatch(/35·L\/Gr_L/);
  });
});

describe('warm-up with the body model (ODE) against the constant-UA closed form', () => {
  it('the RK4 body model and the quadrature give the same time to the limit on an on/off duty of fraction 1', () => {
    const base = { P: 120, Cth: 1395, UA: 1, Tamb: 298.15, Tlimit: 353.15, loss: 'body', D: 0.05, L: 0.35, orientation: 'horizontal', V: 0, eps: 0.9 };
    const full = evaluate(calc('warm-up'), { ...base, duty: 1 });
    const nearlyFull = evaluate(calc('warm-up'), { ...base, duty: 0.999999, period: 1e6 });
    expectClose({ label: 't_lim body', computed: nearlyFull.outputs.tLimitBody as number, expected: full.outputs.tLimitBody as number, tol: 1e-4, why: 'RK4 (≥400 steps) vs adaptive Simpson on dt/dT' });
  });
  it('the body model and constant UA agree when UA is the body UA at the equilibrium', () => {
    const body = { D: 0.05, L: 0.35, orientation: 'horizontal' as const, ends: false, eps: 0.9, Tamb: 298.15, V: 0 };
    const UA = bodyCooling(body, 353.15).UA; // the conductance that sheds 41.01 W at 80 °C
    const r = evaluate(calc('warm-up'), { P: bodyCooling(body, 353.15).Q, Cth: 1395, UA, Tamb: 298.15, Tlimit: 373.15, loss: 'body', D: 0.05, L: 0.35, orientation: 'horizontal', V: 0, eps: 0.9 });
    expectClose({ label: 'T_ss body vs UA', computed: r.outputs.TssBody as number, expected: r.outputs.Tss as number, tol: 1e-6, why: 'same equilibrium by construction (closed form)' });
  });
});

describe('warm-up heat capacity from parts', () => {
  it('adds m·c of each listed part to the direct capacity (Incropera 6th ed. Tables A.1, A.5 at 300 K, from memory)', () => {
    const r = evaluate(calc('warm-up'), { P: 50, Cth: 100, UA: 1, mSteel: 2, mOil: 0.25 });
    expectClose({ label: 'C total', computed: r.outputs.CthTotal as number, expected: 100 + 2 * 434 + 0.25 * 1909, tol: 1e-14, why: 'same arithmetic' });
  });
});

describe('damping-fade coupled equilibrium', () => {
  it('on a random road with no equilibrium, its time to the limit equals the warm-up body model', () => {
    const common = { D: 0.05, L: 0.35, orientation: 'horizontal', Tamb: 298.15, V: 0, eps: 0.9, Tlimit: 373.15 };
    const fade = evaluate(calc('damping-fade'), { ...common, duty: 'random', P: 80.85, Cth: 1345.25 });
    const warm = evaluate(calc('warm-up'), { ...common, P: 80.85, Cth: 1345.25, UA: 1, loss: 'body' });
    expect(fade.outputs.status).toBe('no equilibrium below the limit');
    expectClose({ label: 't_lim fade vs warm-up', computed: fade.outputs.tLimit as number, expected: warm.outputs.tLimitBody as number, tol: 1e-7, why: 'same integral by two calculators, quadrature at 1e-9' });
  });

  const def = calc('damping-fade');
  it('balances heat out against damper power at the equilibrium it reports', () => {
    const r = evaluate(def, {});
    const T = r.outputs.Teq as number;
    const body = { D: 0.05, L: 0.35, orientation: 'horizontal' as const, ends: false, eps: 0.9, Tamb: 298.15, V: 0 };
    const c = fadeCoefficient({ cRef: 980, Tref: 298.15, viscousShare: 0.3, oil: waltherFit(20e-6, 4.5e-6) }, T);
    expectClose({ label: 'Q(Teq) = P(c(Teq))', computed: bodyCooling(body, T).Q, expected: 0.5 * c * (2 * Math.PI * 1.5) ** 2 * 0.02 ** 2, tol: 1e-7, why: 'root tolerance 1e-9 K' });
  });
  it('converges or reports non-convergence clearly for every input in its valid range', () => {
    const number = (key: string) => {
      const d = def.inputs.find((i) => i.key === key);
      if (!d || !('min' in d)) throw new Error(key);
      return fc.double({ min: d.min, max: d.max, noNaN: true }).filter((x) => !(d.minExclusive && x === d.min));
    };
    const keys = ['cRef', 'Tref', 'share', 'nu40', 'nu100', 'X', 'f', 'P', 'Tlimit', 'Cth', 'D', 'L', 'Tamb', 'dTsur', 'V', 'flowFactor', 'eps'];
    const arb = fc.record({
      ...Object.fromEntries(keys.map((k) => [k, number(k)])),
      duty: fc.constantFrom('harmonic', 'random'),
      orientation: fc.constantFrom('horizontal', 'vertical'),
      ends: fc.constantFrom('0', '1'),
    });
    fc.assert(fc.property(arb, (drawn) => {
      const inputs = drawn as Record<string, number | string>;
      try {
        const r = evaluate(def, inputs);
        const s = r.outputs.status;
        if (s === 'equilibrium below the limit') {
          const T = r.outputs.Teq as number;
          return Number.isFinite(T) && T >= (inputs.Tamb as number) - 1e-9 && T <= (inputs.Tlimit as number) + 1e-9 && (r.outputs.cEq as number) >= 0; // ≥ 0: a denormal c_ref (5e-324) underflows to 0
        }
        if (s === 'no equilibrium below the limit') return r.warnings.some((w) => /No equilibrium/.test(w)) && (r.outputs.tLimit === undefined || (r.outputs.tLimit as number) >= 0);
        return s === 'limit not above the air temperature';
      } catch (e) {
        // a typed error with a message naming the cause is a clear report (e.g. ν100 ≥ ν40)
        return e instanceof DampbookError && e.message.length > 10;
      }
    }), { seed: 1, numRuns: 150 });
  });
  it('finds exactly one equilibrium when c falls with temperature (heat out rises, power falls)', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0.001, max: 0.05, noNaN: true }), (share, X) => {
      const r = evaluate(def, { share, X, f: 1.5, Tlimit: 473.15 });
      return (r.outputs.crossings as number) <= 1;
    }), { seed: 1, numRuns: 40 });
  });
});
