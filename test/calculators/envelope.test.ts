/**
 * Tolerance envelopes (src/calculators/envelope/): exact on monotone closed forms, enclosing a
 * dense-sampling reference on a non-monotone output, refusing what cannot be varied.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { envelope, INTERIOR_SAMPLES, parseTolerance, percentEnds, sweep } from '../../src/calculators/envelope/index.ts';
import { defaults, evaluate, isActive } from '../../src/calculators/evaluate.ts';
import { calculators } from '../../src/calculators/registry.ts';
import { sdofCalculator } from '../../src/calculators/vibration/sdof.ts';
import { forcedResponseCalculator } from '../../src/calculators/vibration/forced-response.ts';
import { InputRangeError } from '../../src/core/errors.ts';
import { expectClose } from '../helpers/expectClose.ts';

// sdof defaults from its definition: m = 10 kg, k = 4000 N/m, c = 40 N·s/m.
// Source: closed form ζ = c/(2√(km)) (Rao, Mechanical Vibrations, 6th ed., §2.6; provenance: closed form).
// ζ rises with c and falls with m, so its extremes sit at the corners:
// c = 34..46 → ζ = 34/400 … 46/400 = 0.085 … 0.115; with m = 9..11 as well →
// 34/(2√(4000·11)) = 0.081044 … 46/(2√(4000·9)) = 0.121221.
describe('envelope of sdof ζ (closed form ζ = c/(2√(km)), Rao 6th ed. §2.6)', () => {
  const nominal = defaults(sdofCalculator);
  it('takes the sdof defaults the expected values assume (m 10 kg, k 4000 N/m, c 40 N·s/m)', () => {
    expect([nominal.m, nominal.k, nominal.c]).toEqual([10, 4000, 40]);
  });

  it('c = 40 ± 15 % gives ζ from 0.085 to 0.115, driven by c low / c high', () => {
    const tol = parseTolerance('c', '±15%');
    expect(tol).toEqual({ type: 'percent', percent: 15 });
    const e = envelope(sdofCalculator, nominal, { c: percentEnds('c', 40, 15) });
    expectClose({ label: 'ζ min', computed: e.bounds.zeta!.min, expected: 0.085, tol: 1e-12, why: 'a corner of the box is evaluated exactly' });
    expectClose({ label: 'ζ max', computed: e.bounds.zeta!.max, expected: 0.115, tol: 1e-12, why: 'a corner of the box is evaluated exactly' });
    expect(e.bounds.zeta!.minDrivers).toEqual({ c: 'low' });
    expect(e.bounds.zeta!.maxDrivers).toEqual({ c: 'high' });
    expect(e.corners).toBe(2);
    expect(e.interior).toBe(INTERIOR_SAMPLES);
    expect(e.method).toMatch(/all 2\^1 = 2 corners \+ 64 interior samples/);
  });

  it('with m = 10 ± 10 % as well gives ζ from 0.08104 to 0.12122 at (m high, c low) and (m low, c high)', () => {
    const e = envelope(sdofCalculator, nominal, { c: percentEnds('c', 40, 15), m: percentEnds('m', 10, 10) });
    expectClose({ label: 'ζ min', computed: e.bounds.zeta!.min, expected: 34 / (2 * Math.sqrt(4000 * 11)), tol: 1e-12, why: 'corner evaluated exactly' });
    expectClose({ label: 'ζ max', computed: e.bounds.zeta!.max, expected: 46 / (2 * Math.sqrt(4000 * 9)), tol: 1e-12, why: 'corner evaluated exactly' });
    expectClose({ label: 'ζ min (issue value)', computed: e.bounds.zeta!.min, expected: 0.08104, tol: 6e-5, why: 'issue value written to 4 significant digits' });
    expectClose({ label: 'ζ max (issue value)', computed: e.bounds.zeta!.max, expected: 0.12122, tol: 6e-5, why: 'issue value written to 5 significant digits' });
    expect(e.bounds.zeta!.minDrivers).toEqual({ m: 'high', c: 'low' });
    expect(e.bounds.zeta!.maxDrivers).toEqual({ m: 'low', c: 'high' });
    expect(e.bounds.zeta!.maxAt).toEqual({ m: 9, c: 46 });
    // ωn = √(k/m) does not depend on c: m alone drives it
    expect(e.bounds.wn!.maxDrivers).toEqual({ m: 'low' });
    expect(e.failed).toBe(0);
  });
});

describe('reading tolerances', () => {
  it('reads ±15%, +-15%, 15 % and lo..hi with units, and refuses anything else naming the input', () => {
    expect(parseTolerance('c', '+-15%')).toEqual({ type: 'percent', percent: 15 });
    expect(parseTolerance('c', '15 %')).toEqual({ type: 'percent', percent: 15 });
    expect(parseTolerance('c', '0.9 kN·s/m..1.1 kN·s/m')).toEqual({ type: 'range', lo: '0.9 kN·s/m', hi: '1.1 kN·s/m' });
    for (const bad of ['15', '±0%', '±150%', '..3', '1..2..3', 'abc']) expect(() => parseTolerance('c', bad)).toThrow(/input 'c'/);
    expect(() => percentEnds('x0', 0, 10)).toThrow(/input 'x0'.*zero/);
  });
});

describe('refusals name the input', () => {
  const nominal = defaults(sdofCalculator);
  const refuses = (f: () => unknown, key: string, why: RegExp) => {
    try { f(); } catch (e) {
      expect(e).toBeInstanceOf(InputRangeError);
      expect((e as InputRangeError).input).toBe(key);
      expect((e as Error).message).toMatch(why);
      return;
    }
    expect.fail(`no refusal for ${key}`);
  };
  it('an unknown input, a choice, an inactive input, an inverted range, a range leaving the valid range, a nominal outside', () => {
    refuses(() => envelope(sdofCalculator, nominal, { q: { lo: 1, hi: 2 } }), 'q', /no such input/);
    const fr = defaults(forcedResponseCalculator);
    refuses(() => envelope(forcedResponseCalculator, fr, { excitation: { lo: 1, hi: 2 } }), 'excitation', /choice/);
    refuses(() => envelope(forcedResponseCalculator, fr, { Y: { lo: 0.001, hi: 0.003 } }), 'Y', /does not apply/);
    refuses(() => envelope(sdofCalculator, nominal, { c: { lo: 46, hi: 34 } }), 'c', /low end must be below/);
    refuses(() => envelope(sdofCalculator, nominal, { c: { lo: -1, hi: 46 } }), 'c', /low end .* valid range.*allowed/);
    refuses(() => envelope(sdofCalculator, nominal, { m: { lo: 9, hi: 2e7 } }), 'm', /high end .* valid range/);
    refuses(() => envelope(sdofCalculator, nominal, { c: { lo: 50, hi: 60 } }), 'c', /nominal value lies outside/);
  });

  it('more than 8 varied inputs, naming the ninth', () => {
    // any calculator with nine number inputs active at its defaults
    const calc = calculators.find((c) => { const d = defaults(c); return c.inputs.filter((i) => i.kind !== 'choice' && i.kind !== 'text' && isActive(i, d) && typeof d[i.key] === 'number' && d[i.key] !== 0).length >= 9; })!;
    const d = evaluate(calc, defaults(calc)).values;
    const keys = calc.inputs.filter((i) => i.kind !== 'choice' && i.kind !== 'text' && typeof d[i.key] === 'number' && d[i.key] !== 0).map((i) => i.key).slice(0, 9);
    const vary = Object.fromEntries(keys.map((k) => [k, { lo: d[k] as number, hi: d[k] as number }]));
    refuses(() => envelope(calc, d, vary), keys[8]!, /at most 8 inputs/);
  });
});

describe('failing points are reported, not swallowed', () => {
  it('forced-response at resonance with c down to 0: the c = 0 corner fails and is listed', () => {
    const fr = defaults(forcedResponseCalculator);
    const fn = Math.sqrt((fr.k as number) / (fr.m as number)) / (2 * Math.PI);
    const e = envelope(forcedResponseCalculator, { ...fr, f: fn }, { c: { lo: 0, hi: 1500 } });
    expect(e.failed).toBeGreaterThan(0);
    expect(e.failures[0]!.at.c).toBe(0);
    expect(e.failures[0]!.message).toMatch(/./);
    expect(e.bounds.X!.min).toBeGreaterThan(0);
  });
});

// Non-monotone output: the mass amplitude X of forced-response peaks near resonance
// (X = (F0/k)/√((1−r²)² + (2ζr)²); Rao, Mechanical Vibrations, 6th ed., §3.4; provenance: closed form).
// Reference: a dense grid over the same box (41 × 9 × 9 points), computed through evaluate().
describe('property: the envelope encloses a dense-sampling reference on a non-monotone output', () => {
  it('forced-response X over f (across resonance), c and m', () => {
    const base = defaults(forcedResponseCalculator);
    const fn = Math.sqrt((base.k as number) / (base.m as number)) / (2 * Math.PI); // 7.12 Hz
    fc.assert(fc.property(
      fc.double({ min: 0.5, max: 2, noNaN: true }), fc.double({ min: 0.05, max: 0.6, noNaN: true }),
      fc.double({ min: 0.01, max: 0.6, noNaN: true }), fc.double({ min: 0.01, max: 0.2, noNaN: true }),
      (rf, pf, pc, pm) => {
        const nominal = { ...base, f: rf * fn };
        const vary = { f: percentEnds('f', rf * fn, pf * 100), c: percentEnds('c', 1200, pc * 100), m: percentEnds('m', 120, pm * 100) };
        const e = envelope(forcedResponseCalculator, nominal, vary);
        let lo = Infinity;
        let hi = -Infinity;
        const g = (v: { lo: number; hi: number }, i: number, n: number) => v.lo + (i / (n - 1)) * (v.hi - v.lo);
        for (let i = 0; i < 41; i++) for (let j = 0; j < 9; j++) for (let l = 0; l < 9; l++) {
          const X = evaluate(forcedResponseCalculator, { ...nominal, f: g(vary.f, i, 41), c: g(vary.c, j, 9), m: g(vary.m, l, 9) }).outputs.X as number;
          lo = Math.min(lo, X);
          hi = Math.max(hi, X);
        }
        // 1e-9 relative: the reference and the envelope evaluate the same function; only rounding differs
        expect(e.bounds.X!.min).toBeLessThanOrEqual(lo * (1 + 1e-9));
        expect(e.bounds.X!.max).toBeGreaterThanOrEqual(hi * (1 - 1e-9));
      }), { seed: 1, numRuns: 25 });
  });
});

describe('sweep', () => {
  it('sdof ζ against c is the straight line c/400 through the nominal point (closed form, Rao §2.6)', () => {
    const s = sweep(sdofCalculator, defaults(sdofCalculator), 'c', 20, 60, 'zeta', 21);
    expect(s.x).toHaveLength(21);
    for (let i = 0; i < s.x.length; i++) expectClose({ label: `ζ at c = ${s.x[i]}`, computed: s.y[i]!, expected: s.x[i]! / 400, tol: 1e-12, why: 'closed form' });
    expect(s.nominal).toEqual({ x: 40, y: 0.1 });
    expect(() => sweep(sdofCalculator, defaults(sdofCalculator), 'c', 20, 60, 'regime')).toThrow(/'regime'/);
  });
});
