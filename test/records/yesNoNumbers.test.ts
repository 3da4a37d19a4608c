/**
 * Yes/no inputs that were 0/1 numbers (body-cooling's `ends`) are choices now; the old number is
 * still read from the CLI and from a record, with a note, and anything but 0 or 1 is refused.
 * No reference values: the same computation with the choice given as its option (closed form).
 */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/calculators/evaluate.ts';
import { getCalculator } from '../../src/calculators/registry.ts';
import { migrateYesNoNumbers } from '../../src/calculators/shared/yesNoNumbers.ts';
import { readInputs } from '../../src/cli/inputs.ts';
import { parseRecord } from '../../src/records/record.ts';
import { makeRecord, replayRecord } from '../../src/records/replay.ts';
import { InputRangeError } from '../../src/core/errors.ts';

const calc = getCalculator('body-cooling')!;
const ctx = { page: { id: 'body-cooling', revision: 'A' }, coreVersion: '0.4.0' };

describe('yes/no choices that were 0/1 numbers', () => {
  it('no number input of any calculator is a 0/1 switch any more (a [0, 1] number with a yes/no help text)', async () => {
    const { calculators } = await import('../../src/calculators/registry.ts');
    for (const c of calculators) for (const d of c.inputs) {
      if (d.kind === 'choice' || d.kind === 'text') continue;
      expect(`${c.id}.${d.key}: ${d.label}`).not.toMatch(/\(0\/1\)|yes\/no/i);
    }
  });
  it('the CLI reads ends=1.0 as the option 1, with a note', () => {
    const r = readInputs(calc, [['ends', '1.0']]);
    expect(r.raw.ends).toBe('1');
    expect(r.notes.join(' ')).toMatch(/'ends' was a 0\/1 number/);
    expect(readInputs(calc, [['ends', '1']]).notes).toEqual([]);
  });
  it('a record with ends as the number 1 replays with a warning and the same outputs as the choice', () => {
    const r = evaluate(calc, { ends: '1' });
    const rec = makeRecord(calc, r.values, r.outputs, {}, ctx, new Date('2026-12-02T10:00:00Z'));
    const old = { ...rec, inputs: { ...rec.inputs, ends: { value: 1, unit: '1' } } };
    const p = parseRecord(JSON.stringify(old));
    expect(p.ok).toBe(true);
    if (!p.ok) return;
    const back = replayRecord(calc, p.record, ctx);
    expect(back.ok, back.ok ? '' : back.message).toBe(true);
    expect(back.ok && back.diffs).toEqual([]);
    expect(back.ok && back.warnings.join(' ')).toMatch(/Old input: 'ends' was a 0\/1 number/);
  });
  it('a number other than 0 or 1 is refused naming the input', () => {
    const m = migrateYesNoNumbers(calc, { ends: 0.5 });
    expect(() => evaluate(calc, m.raw)).toThrow(InputRangeError);
    expect(() => evaluate(calc, m.raw)).toThrow(/'ends'/);
  });
});
