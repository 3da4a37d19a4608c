import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { energyPerCycleCalculator } from '../../../src/calculators/vibration/energy-per-cycle.ts';
import { evaluate, defaults } from '../../../src/calculators/evaluate.ts';
import { energyPerCycleQuadrature } from '../../../src/core/dampers/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const run = (inputs: Record<string, unknown>) => evaluate(energyPerCycleCalculator, inputs);

/** Shoelace area of the closed force–displacement loop: the work of one cycle. */
function loopArea(x: readonly number[], y: readonly number[]): number {
  let a = 0;
  for (let i = 0; i + 1 < x.length; i++) a += x[i]! * y[i + 1]! - x[i + 1]! * y[i]!;
  return Math.abs(a) / 2;
}

describe('energy-per-cycle calculator', () => {
  it('refuses a hysteretic law with a zero loss stiffness, naming kh', () => {
    expect(() => run({ law: 'hysteretic', eta: 0.1, kh: 0, X: 0.01, f: 2 })).toThrow(InputRangeError);
    expect(() => run({ law: 'hysteretic', eta: 0.1, kh: 0, X: 0.01, f: 2 })).toThrow(/'kh'/);
  });

  it('refuses a power-law exponent above 2, naming alpha', () => expect(() => run({ law: 'power', Fref: 800, alpha: 2.5, X: 0.01, f: 2 })).toThrow(/'alpha'/));

  it('leaves ζ_eq out when k is not given', () => expect(run({ law: 'linear', c: 100, X: 0.01, f: 2 }).outputs.zetaEq).toBeUndefined());

  // Chopra, Dynamics of Structures 5th ed., eq. 3.8.1 (published): E = πcωX²; the loop of a linear
  // damper is an ellipse of area πcωX². The 241-point polygon underestimates an ellipse by
  // (sin(2π/n)/(2π/n) − 1) ≈ 1.1e-4, hence the tolerance.
  it('draws a force–displacement loop whose area is the energy per cycle', () => {
    for (const inputs of [{ law: 'linear', c: 1500, X: 0.025, f: 1.5 }, { law: 'power', Fref: 800, alpha: 0.5, X: 0.025, f: 1.5 }, { law: 'bilinear', c1: 3000, c2: 900, c1c: 1200, c2c: 360, vknee: 0.1, X: 0.05, f: 2 }]) {
      const r = run(inputs);
      const loop = energyPerCycleCalculator.charts!(r.values, r).find((c) => c.id === 'loop')!;
      expectClose({ label: `loop area ${inputs.law}`, computed: loopArea(loop.series[0]!.x, loop.series[0]!.y), expected: r.outputs.E as number, tol: 2e-4, why: 'polygon of 241 points' });
    }
  });

  it('gives the bilinear law the energy of two linear halves when the knee is above the peak velocity', () => {
    // closed form, no source needed: below the knee each half cycle is linear with its own c1
    const r = run({ law: 'bilinear', c1: 2000, c2: 500, c1c: 1000, c2c: 250, vknee: 5, X: 0.02, f: 1 });
    const w = 2 * Math.PI;
    expectClose({ label: 'E', computed: r.outputs.E as number, expected: 0.5 * Math.PI * (2000 + 1000) * w * 0.02 ** 2, tol: 1e-9, why: 'quadrature to 1e-10' });
  });

  it('bilinear energy from the calculator equals direct quadrature of the four-slope law', () => {
    const r = run({ law: 'bilinear', c1: 3600, c2: 1080, c1c: 1200, c2c: 360, vknee: 0.1, X: 0.05, f: 2 });
    const q = energyPerCycleQuadrature({ kind: 'bilinear', rebound: { c1: 3600, c2: 1080 }, compression: { c1: 1200, c2: 360 }, vknee: 0.1 }, 0.05, 4 * Math.PI);
    expectClose({ label: 'E', computed: r.outputs.E as number, expected: q, tol: 1e-12, why: 'same quadrature' });
  });

  it('feeds its mean power to the steady-temperature page', () => {
    expect(energyPerCycleCalculator.outputs.find((o) => o.key === 'P')!.feeds).toEqual([{ page: 'steady-temperature', input: 'P', label: 'Steady damper temperature at this power' }]);
  });

  it('reports ζ_eq of a linear damper equal to its own ζ at any amplitude and frequency', () => {
    fc.assert(fc.property(fc.double({ min: 0.1, max: 1e4, noNaN: true }), fc.double({ min: 10, max: 1e8, noNaN: true }), fc.double({ min: 1e-3, max: 3, noNaN: true }),
      fc.double({ min: 1e-4, max: 0.5, noNaN: true }), (m, k, zeta, X) => {
        const c = 2 * zeta * Math.sqrt(k * m);
        const f = Math.sqrt(k / m) / (2 * Math.PI);
        return Math.abs((run({ law: 'linear', c, k, X, f }).outputs.zetaEq as number) - zeta) <= 1e-12 * zeta;
      }), { seed: 1, numRuns: 100 });
  });

  it('never reports negative energy, and energy rises with amplitude, for every law at its defaults', () => {
    for (const law of ['linear', 'power', 'coulomb', 'bilinear', 'hysteretic']) {
      fc.assert(fc.property(fc.double({ min: 1e-4, max: 1, noNaN: true }), (X) => {
        const base = { ...defaults(energyPerCycleCalculator), law };
        const e1 = run({ ...base, X }).outputs.E as number;
        const e2 = run({ ...base, X: X * 1.1 }).outputs.E as number;
        return e1 >= 0 && e2 > e1;
      }), { seed: 1, numRuns: 30 });
    }
  });
});
