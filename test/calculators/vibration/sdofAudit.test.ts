/**
 * sdof audit findings: the window-cap warning threshold, no quality factor without a resonance,
 * one energy-audit closure. Sources of the numbers: ωn = √(k/m), c_cr = 2√(km), ζ = c/c_cr and
 * Q = 1/(2ζ) — Rao, Mechanical Vibrations, 6th ed., §2.6 and §3.4 (sections from memory; closed
 * form). The cap threshold ζ = ln(100)/(60π) follows from the page's own window rule (decay to 1 %
 * within 30 periods: e^{−ζωn·30T} = 0.01 with T = 2π/ωn; closed form, no published source).
 */
import { describe, expect, it } from 'vitest';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { evaluate } from '../../../src/calculators/evaluate.ts';

const sdof = getCalculator('sdof')!;
// m = 1 kg, k = 400 N/m: ωn = 20 rad/s, c_cr = 40 N·s/m, ζ = c/40 (closed form)
describe('sdof: window cap warning and quality factor', () => {
  it('warns exactly when the 30-period cap applies: ζ below ln(100)/(60π) ≈ 2.44 % (closed form)', () => {
    const warned = (c: number) => evaluate(sdof, { m: 1, k: 400, c }).warnings.some((w) => /capped/.test(w));
    expect(warned(0.4)).toBe(true); // ζ = 1 %: capped (was silent: the warning fired only below 0.5 %)
    expect(warned(0.9)).toBe(true); // ζ = 2.25 %
    expect(warned(1.0)).toBe(false); // ζ = 2.5 %
    expect(warned(0.1)).toBe(true); // ζ = 0.25 %
  });
  it('gives no quality factor for an overdamped system (Q = 1/(2ζ) describes a resonance)', () => {
    const r = evaluate(sdof, { m: 1, k: 400, c: 120 });
    expect(r.outputs.regime).toBe('overdamped');
    expect(r.outputs.Q).toBeUndefined();
    expect(evaluate(sdof, { m: 1, k: 400, c: 4 }).outputs.Q).toBeCloseTo(5, 12); // ζ = 0.1 → Q = 5 (closed form)
  });
});

describe('sdof: one energy audit closure on the page', () => {
  it('the chart summary states the closure the results table shows (was 41 samples against 401)', () => {
    const values = { m: 1, k: 400, c: 4, x0: 0.01 };
    const r = evaluate(sdof, values);
    const charts = sdof.charts!(r.values, r);
    const summary = charts.map((c) => c.summary).join(' ');
    expect(summary).toContain((r.outputs.closure as number).toExponential(1));
  });
});

describe('damper-simulation: α < 1 smoothing warning', () => {
  it('never calls the linear zone "negligible" (it can halve the residual free-decay amplitude)', () => {
    const calc = getCalculator('damper-simulation')!;
    const r = evaluate(calc, { law: 'power', alpha: 0.5, excitation: 'none', x0: 0.05 });
    const w = r.warnings.join(' ');
    expect(w).toMatch(/taken linear below/);
    expect(w).not.toMatch(/negligible/);
  });
});
