/**
 * Calculation records: a record made from a result replays to the same outputs; malformed and
 * hostile records are refused with one clear message. Reference values are the closed forms of
 * the oscillator (Rao, Mechanical Vibrations, 6th ed., §2.6; closed form).
 */
// Source of the numbers checked: Rao, Mechanical Vibrations, 6th ed., §2.6 closed forms (see above).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/calculators/evaluate.ts';
import { getCalculator } from '../../src/calculators/registry.ts';
import { MAX_RECORD_CHARS, parseRecord, validateRecord } from '../../src/records/record.ts';
import { makeRecord, replayRecord } from '../../src/records/replay.ts';

const sdof = getCalculator('sdof')!;
const ctx = { page: { id: 'sdof', revision: 'B' }, coreVersion: '0.1.0', contentHash: 'abcdef123456' };

/** A record as the page writes it: `typed` holds numbers as typed in a unit (key → [number, unit]). */
function recordText(raw: Record<string, unknown>, typed: Record<string, [number, string]> = {}): string {
  const withTyped = { ...raw, ...Object.fromEntries(Object.entries(typed).map(([k, [v, u]]) => [k, `${v} ${u}`])) };
  const r = evaluate(sdof, withTyped);
  const shown = Object.fromEntries(Object.entries(typed).map(([k, [value, unit]]) => [k, { value, unit }]));
  return JSON.stringify(makeRecord(sdof, r.values, r.outputs, shown, ctx, new Date('2026-11-30T10:00:00Z')));
}

function good(): Record<string, unknown> {
  return JSON.parse(recordText({ m: 10, k: 4000, c: 40 })) as Record<string, unknown>;
}

describe('calculation record', () => {
  it('round-trips 10 kg, 4 kN/m, 40 N·s/m to ζ = 0.1 with every output reproduced', () => {
    const p = parseRecord(recordText({ m: 10, k: 4000, c: 40 }));
    expect(p.ok).toBe(true);
    if (!p.ok) return;
    expect(p.record.inputs.m).toEqual({ value: 10, unit: 'kg' });
    const r = replayRecord(sdof, p.record, ctx);
    expect(r.ok && r.diffs).toEqual([]);
    expect(r.ok && r.outputs.zeta).toBeCloseTo(0.1, 14);
    expect(r.ok && r.warnings).toEqual([]);
  });

  it('keeps inputs in the units they were typed in (22.0462262185 lb is 10 kg, NIST SP 811 B.8)', () => {
    const p = parseRecord(recordText({ k: 4000, c: 40 }, { m: [22.0462262185, 'lb'] }));
    expect(p.ok && p.record.inputs.m).toEqual({ value: 22.0462262185, unit: 'lb' });
    const r = p.ok ? replayRecord(sdof, p.record, ctx) : undefined;
    expect(r?.ok && r.diffs).toEqual([]);
    expect(r?.ok && r.shown.m).toEqual({ value: 22.0462262185, unit: 'lb' });
    expect(r?.ok && (r.outputs.wn as number)).toBeCloseTo(20, 8);
  });

  it('any record made from valid inputs replays to the same outputs', () => {
    fc.assert(fc.property(
      fc.double({ min: 0.1, max: 1e4, noNaN: true }), fc.double({ min: 1, max: 1e7, noNaN: true }), fc.double({ min: 0.01, max: 1e5, noNaN: true }),
      fc.constantFrom('kg', 'lb'),
      (m, k, c, mu) => {
        const p = parseRecord(recordText({ k, c }, { m: [m, mu] }));
        if (!p.ok) throw new Error(p.message);
        const r = replayRecord(sdof, p.record, ctx);
        expect(r.ok && r.diffs).toEqual([]);
      },
    ), { seed: 1, numRuns: 60 });
  });

  it('warns when the page revision or the core version differs', () => {
    const p = parseRecord(recordText({ m: 10, k: 4000, c: 40 }));
    const r = p.ok ? replayRecord(sdof, p.record, { ...ctx, page: { id: 'sdof', revision: 'C' }, coreVersion: '0.2.0' }) : undefined;
    expect(r?.ok && r.warnings.join(' ')).toMatch(/revision B; this page is revision C/);
    expect(r?.ok && r.warnings.join(' ')).toMatch(/core version 0\.1\.0; this handbook runs 0\.2\.0/);
  });

  it('reports an output that the core no longer reproduces', () => {
    const rec = good() as { outputs: Record<string, { value: number }> };
    rec.outputs.zeta!.value = 0.2;
    const p = validateRecord(rec);
    const r = p.ok ? replayRecord(sdof, p.record, ctx) : undefined;
    expect(r?.ok && r.diffs.map((d) => d.key)).toEqual(['zeta']);
  });
});

describe('malformed or hostile records are refused with a clear message', () => {
  const cases: [string, () => string, RegExp][] = [
    ['not JSON', () => '{"format": ', /not JSON/],
    ['too large', () => ' '.repeat(MAX_RECORD_CHARS + 1), /at most/],
    ['a __proto__ key', () => recordText({ m: 10, k: 4000, c: 40 }).replace('"inputs":{', '"inputs":{"__proto__":{"value":1},'), /forbidden key '__proto__'/],
    ['a constructor key', () => JSON.stringify({ ...good(), constructor: { prototype: { polluted: true } } }), /forbidden key 'constructor'/],
    ['a wrong type', () => JSON.stringify({ ...good(), inputs: { m: { value: [1] } } }), /inputs\.m\.value/],
    ['a string for a number input', () => JSON.stringify({ ...good(), inputs: { m: { value: '10' }, k: { value: 4000 }, c: { value: 40 } } }), /must be a number/],
    ['a script payload as a unit', () => JSON.stringify({ ...good(), inputs: { m: { value: 10, unit: '<script>alert(1)</script>' } } }), /plain unit text/],
    ['an unknown unit', () => JSON.stringify({ ...good(), inputs: { m: { value: 10, unit: 'furlong' }, k: { value: 4000 }, c: { value: 40 } } }), /furlong/],
    ['an unknown input', () => JSON.stringify({ ...good(), inputs: { ...(good().inputs as object), evil: { value: 1 } } }), /'evil' is not an input/],
    ['a huge string', () => JSON.stringify({ ...good(), name: 'x'.repeat(100_000) }), /name/],
    ['an out-of-range input', () => JSON.stringify({ ...good(), inputs: { m: { value: -5, unit: 'kg' }, k: { value: 4000 }, c: { value: 40 } } }), /'m'/],
    ['another calculator', () => JSON.stringify({ ...good(), calculator: 'other-calc' }), /not 'sdof'/],
    ['an extra field', () => JSON.stringify({ ...good(), run: 'rm -rf /' }), /Unrecognized key/],
    ['deep nesting', () => JSON.stringify({ ...good(), inputs: { m: { value: { a: { b: { c: { d: { e: { f: 1 } } } } } } } } }), /nested too deeply/],
  ];
  it.each(cases)('%s', (_what, make, message) => {
    const p = parseRecord(make());
    const text = p.ok ? (() => { const r = replayRecord(sdof, p.record, ctx); return r.ok ? 'accepted' : r.message; })() : p.message;
    expect(text).toMatch(message);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});
