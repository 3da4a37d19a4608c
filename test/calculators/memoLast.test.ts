/**
 * A long record is read once per change of its text, not on every keystroke in another field
 * (red-team finding: with a 2 MB record in place every keystroke cost 0.7–1.9 s of re-parsing).
 * memoLast counts calls here; the calculators that use it must give exactly the results of a fresh
 * read when another input changes and when the text changes. Behaviour, no reference values.
 */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/calculators/evaluate.ts';
import { memoLast, oncePerValues } from '../../src/calculators/memoLast.ts';
import { getCalculator } from '../../src/calculators/registry.ts';
import { sineRecord } from '../../src/calculators/duty/recorded-motion.demo.ts';

describe('memoLast', () => {
  it('calls the function once while the arguments stay the same, again when one changes', () => {
    let calls = 0;
    const f = memoLast((text: string, n: number) => { calls++; return { len: text.length * n }; });
    const big = 'x'.repeat(1_000_000);
    const a = f(big, 2);
    expect(f(big, 2)).toBe(a);
    expect(f(`${big}`, 2)).toBe(a); // an equal copy of the text is the same text
    expect(calls).toBe(1);
    expect(f(big, 3)).toEqual({ len: 3_000_000 }); // the length of the 3-million-character text built above (common practice, no source)
    expect(f('y', 3)).toEqual({ len: 3 }); // counts of calls: behaviour, no reference value (common practice, no source)
    expect(calls).toBe(3);
  });

  it('remembers an error: a bad text is not read again until it changes', () => {
    let calls = 0;
    const f = memoLast((text: string) => { calls++; if (text === 'bad') throw new RangeError('bad row'); return text.length; });
    expect(() => f('bad')).toThrow('bad row');
    expect(() => f('bad')).toThrow('bad row');
    expect(calls).toBe(1);
    expect(f('good')).toBe(4); // 'good'.length (common practice, no source)
    expect(calls).toBe(2);
  });
});

describe('calculators reading a record once', () => {
  it('recorded-motion: changing the law after the record was read gives the fresh result', () => {
    const calc = getCalculator('recorded-motion')!;
    const csv = sineRecord({ X: 0.02, f: 2, cycles: 20, rate: 400, columns: 'tx' });
    const first = evaluate(calc, { csv, layout: 'tx', law: 'linear', c: 1500 });
    const changed = evaluate(calc, { csv, layout: 'tx', law: 'linear', c: 3000 });
    expect(changed.outputs.P as number).toBeCloseTo(2 * (first.outputs.P as number), 9); // P = c·v̄² (closed form, linear in c: Chopra, Dynamics of Structures, 5th ed., eq. 3.8.1, from memory)
    const other = evaluate(calc, { csv: `${csv}\n`, layout: 'tx', law: 'linear', c: 3000 });
    expect(other.outputs).toEqual(changed.outputs);
  });

  it('ring-down: m and k change the outputs that depend on them, the record is the same', () => {
    const calc = getCalculator('ring-down')!;
    const a = evaluate(calc, { m: 10 });
    const b = evaluate(calc, { m: 20 });
    expect(b.outputs.zeta).toBe(a.outputs.zeta); // ζ comes from the record alone (Rao, Mechanical Vibrations, 6th ed., §2.6, log decrement; from memory)
    expect(b.outputs.c as number).toBeCloseTo(2 * (a.outputs.c as number), 9); // c = 2ζmω_n (closed form; Rao, Mechanical Vibrations, 6th ed., §2.6, from memory)
    const bad = 't,x\n0,1\n';
    expect(() => evaluate(calc, { record: bad })).toThrow(/record/);
    expect(() => evaluate(calc, { record: bad, m: 30 })).toThrow(/record/);
  });
});

describe('oncePerValues', () => {
  it('runs once per values object (compute and charts share it), again for a new object; an error is not kept', () => {
    let calls = 0;
    const f = oncePerValues((v: { n: number }) => { calls++; if (v.n < 0) throw new Error('negative'); return { twice: 2 * v.n }; });
    const v = { n: 4 };
    expect(f(v)).toBe(f(v)); // the same result object (behaviour; common practice, no source)
    expect(calls).toBe(1);
    expect(f({ n: 4 })).toEqual({ twice: 8 }); // a new object is analysed again: 2·4 = 8 (arithmetic)
    expect(calls).toBe(2);
    const bad = { n: -1 };
    expect(() => f(bad)).toThrow('negative');
    expect(() => f(bad)).toThrow('negative');
    expect(calls).toBe(4);
  });
});
