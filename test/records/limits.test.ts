/**
 * A record's text limit follows the calculator input's own maxLength (one source of truth): the
 * exported record of a valid calculation at the input's limit imports again and reproduces every
 * output; one character more is refused naming the input. Also: a record file with a UTF-8
 * byte-order mark is read as the browser reads it.
 * No reference values: reproduction within REPRODUCE_TOLERANCE of the same computation
 * (closed form: replay runs the same evaluate()).
 */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/calculators/evaluate.ts';
import { calculators, getCalculator } from '../../src/calculators/registry.ts';
import { MAX_RECORD_CHARS, parseRecord, recordCharLimit } from '../../src/records/record.ts';
import { makeRecord, replayRecord } from '../../src/records/replay.ts';

const ctx = { page: { id: 'recorded-motion', revision: 'A' }, coreVersion: '0.1.0' };

function textAt(length: number, base: string): string {
  const pad = length - base.length - 2;
  return `${base}\n#${'x'.repeat(pad)}`;
}

describe('record size limits', () => {
  const calc = getCalculator('recorded-motion')!;
  const csvDef = calc.inputs.find((i) => i.key === 'csv')!;
  const maxLength = csvDef.kind === 'text' ? csvDef.maxLength : 0;

  it('round-trips recorded-motion with a CSV of exactly the input maxLength', () => {
    const csv = textAt(maxLength, String(csvDef.default));
    expect(csv.length).toBe(maxLength);
    const r = evaluate(calc, { csv });
    const text = JSON.stringify(makeRecord(calc, r.values, r.outputs, {}, ctx, new Date('2026-12-02T10:00:00Z')));
    const p = parseRecord(text);
    expect(p.ok, p.ok ? '' : p.message).toBe(true);
    if (!p.ok) return;
    const back = replayRecord(calc, p.record, ctx);
    expect(back.ok, back.ok ? '' : back.message).toBe(true);
    expect(back.ok && back.diffs).toEqual([]);
  }, 60_000);

  it('refuses a CSV one character over the input maxLength, naming the input', () => {
    const csv = textAt(maxLength, String(csvDef.default));
    const r = evaluate(calc, { csv });
    const rec = makeRecord(calc, r.values, r.outputs, {}, ctx, new Date('2026-12-02T10:00:00Z'));
    const over = { ...rec, inputs: { ...rec.inputs, csv: { value: `${csv}x` } } };
    const p = parseRecord(JSON.stringify(over));
    expect(p.ok).toBe(true);
    if (!p.ok) return;
    const back = replayRecord(calc, p.record, ctx);
    expect(back.ok).toBe(false);
    expect(!back.ok && back.message).toMatch(/'csv'.*longer than 5000000 characters/);
  }, 60_000);

  it('the whole-record guard admits the largest record of every calculator', () => {
    for (const c of calculators) expect(recordCharLimit(c), c.id).toBeLessThanOrEqual(MAX_RECORD_CHARS);
    // JSON.stringify writes at most 6 characters per character of text (\u001f): the limit allows it
    expect(recordCharLimit(calc)).toBeGreaterThanOrEqual(6 * maxLength);
  });

  it('a record text with a UTF-8 byte-order mark parses as without', () => {
    const sdof = getCalculator('sdof')!;
    const r = evaluate(sdof, { m: 10, k: 4000, c: 40 });
    const text = JSON.stringify(makeRecord(sdof, r.values, r.outputs, {}, ctx, new Date('2026-12-02T10:00:00Z')));
    const p = parseRecord(`\uFEFF${text}`);
    expect(p.ok, p.ok ? '' : p.message).toBe(true);
  });
});

describe('record replay and the old power-law key c', () => {
  // an old record's power-law C (key c) is read in SI base units only, N·(s/m)^α: its unit depends
  // on α, so a record giving it in another unit is refused (behaviour; no reference value)
  const epc = getCalculator('energy-per-cycle')!;
  const base = evaluate(epc, { law: 'power', Fref: 1500 });
  const rec = makeRecord(epc, base.values, base.outputs, {}, { coreVersion: '0.1.0' }, new Date('2026-12-02T10:00:00Z'));

  it('replays a power-law record in SI', () => {
    const r = replayRecord(epc, rec, { coreVersion: '0.1.0' });
    expect(r.ok && r.diffs).toEqual([]);
  });

  it('refuses a power-law C recorded in lbf·s/in, naming c', () => {
    const bad = { ...rec, inputs: { ...rec.inputs, c: { value: 1500, unit: 'lbf.s/in' } } };
    const r = replayRecord(epc, bad, { coreVersion: '0.1.0' });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(/'c'.*SI base units/);
  });

  it('still converts a linear c recorded in lbf·s/in', () => {
    const lin = evaluate(epc, { law: 'linear', c: '10 lbf·s/in' });
    const r0 = makeRecord(epc, lin.values, lin.outputs, { c: { value: 10, unit: 'lbf.s/in' } }, { coreVersion: '0.1.0' }, new Date('2026-12-02T10:00:00Z'));
    expect(r0.inputs.c).toEqual({ value: 10, unit: 'lbf.s/in' });
    const r = replayRecord(epc, r0, { coreVersion: '0.1.0' });
    expect(r.ok && r.diffs).toEqual([]);
  });
});
