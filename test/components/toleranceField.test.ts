/**
 * The page's tolerance boxes (render/toleranceField.ts): ± % of the nominal SI value, lo..hi in
 * the field's shown unit, and a range converted with its field when the unit changes.
 * Conversion factor: 1 lb = 0.45359237 kg (NIST SP 811 (2008), Appendix B.8; published, exact).
 */
import { describe, expect, it } from 'vitest';
import { sdofCalculator } from '../../src/calculators/vibration/sdof.ts';
import type { NumberInput } from '../../src/calculators/types.ts';
import { convertTolerance, readTolerance } from '../../src/components/render/toleranceField.ts';

const m = sdofCalculator.inputs.find((d) => d.key === 'm') as NumberInput;
const LB = 0.45359237;

describe('tolerance boxes', () => {
  it('reads ±10 % of the nominal SI value and an empty box as no tolerance', () => {
    // 10 kg ± 10 % = 9..11 kg (arithmetic; common practice, no source)
    expect(readTolerance(m, '±10%', 'kg', 10)).toEqual({ ok: true, variation: { lo: 9, hi: 11 } });
    expect(readTolerance(m, '  ', 'kg', 10)).toEqual({ ok: true, variation: undefined });
  });

  it('reads lo..hi in the shown unit (lb), or with a unit typed at an end', () => {
    const r = readTolerance(m, '20..25', 'lb', 10);
    // 20 lb and 25 lb in kg by the exact pound (NIST SP 811 (2008) Appendix B.8; published)
    expect(r.ok && r.variation!.lo).toBeCloseTo(20 * LB, 12);
    expect(r.ok && r.variation!.hi).toBeCloseTo(25 * LB, 12);
    const t = readTolerance(m, '9 kg..25', 'lb', 10);
    expect(t.ok && t.variation!.lo).toBeCloseTo(9, 12); // a typed '9 kg' end is 9 kg (SI; common practice, no source)
  });

  it('says what is wrong with a box that is not a tolerance', () => {
    const r = readTolerance(m, 'abc', 'kg', 10);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(/±15% or as low\.\.high/);
  });

  it('converts a range with its field and leaves ± % alone', () => {
    // 9 kg and 11 kg shown in lb, ten significant digits (NIST SP 811 (2008) Appendix B.8; published)
    expect(convertTolerance(m, '9..11', 'kg', 'lb')).toBe(`${Number((9 / LB).toPrecision(10))}..${Number((11 / LB).toPrecision(10))}`);
    expect(convertTolerance(m, '±10%', 'kg', 'lb')).toBe('±10%');
  });
});
