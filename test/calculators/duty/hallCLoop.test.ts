import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { hallCLoopRecord } from '../../../src/calculators/duty/recorded-motion.demo.ts';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { lambdaAlpha } from '../../../src/core/dampers/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const file = readFileSync(new URL('../../../public/data/tw402-c3-loop.csv', import.meta.url), 'utf8');

describe('recorded-motion: the TW-402 Hall C prototype loop record (demo data)', () => {
  it('the published file is the generator output', () => {
    expect(file).toBe(hallCLoopRecord());
  });
  it('gives the numbers the page quotes, and hides the law under a measured force', () => {
    const calc = getCalculator('recorded-motion')!;
    const r = evaluate(calc, { csv: file });
    const o = r.outputs as Record<string, number> & { Eloop: number; F0: number; keff: number; EloopDevMax: number; loopFullness: number };
    // page text, 3–4 significant figures (demo numbers, common practice, no source)
    expect(o.cycles).toBe(4);
    expect(Number((o.Eloop / 1000).toFixed(2))).toBe(10.54);
    expect(Number((o.F0 / 1000).toFixed(1))).toBe(117.7);
    expect(Number((o.keff / 1000).toFixed(1))).toBe(98.8);
    expect(Number((100 * o.EloopDevMax).toFixed(1))).toBe(3.2);
    expect(Number(o.loopFullness.toFixed(3))).toBe(0.89);
    expect(o.betaEff).toBeUndefined();
    expect(r.values.c).toBeUndefined(); // the law's inputs do not apply
    // independent check: the loop energy of the power law without fade is λ(α)·C·ω^α·X^(1+α)
    // (FEMA 274 §9.3, from memory); the four cycles run between velocity up-crossings, t = 0.75–4.75 s,
    // centred on 2.75 s, where C has fallen by 5.5 %
    const C = 150e3 / 0.25 ** 0.4;
    const E = lambdaAlpha(0.4) * C * (2 * Math.PI) ** 0.4 * 0.025 ** 1.4 * (1 - 0.055);
    expectClose({ label: 'Eloop', computed: o.Eloop, expected: E, tol: 5e-4, why: 'the fade is linear in time, so the mean over whole cycles is C at their centre; ripple and sampling leave ~4e-5' });
  });
});
