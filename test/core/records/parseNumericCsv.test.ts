import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { InputRangeError } from '../../../src/core/errors.ts';
import { parseNumericCsv, readTimeSeries } from '../../../src/core/records/index.ts';

describe('parseNumericCsv', () => {
  it('reads a comma table with a header row', () => {
    const t = parseNumericCsv('time,disp\n0,1.5\n0.01,-2e-3\n');
    expect(t.header).toEqual(['time', 'disp']);
    expect(t.rows).toEqual([[0, 1.5], [0.01, -0.002]]);
    expect(t.delimiter).toBe(',');
    expect(t.lines).toEqual([2, 3]);
  });
  it('reads semicolons with decimal commas, comments and CRLF line ends', () => {
    const t = parseNumericCsv('# logger 7\r\nt;x\r\n0;1,25\r\n0,002;-0,5\r\n');
    expect(t.delimiter).toBe(';');
    expect(t.decimalComma).toBe(true);
    expect(t.rows).toEqual([[0, 1.25], [0.002, -0.5]]);
  });
  it('reads tabs, quoted fields and a trailing delimiter', () => {
    const t = parseNumericCsv('"t"\t"a"\n"0.0"\t"1"\t\n0.5\t2\t\n');
    expect(t.delimiter).toBe('\t');
    expect(t.rows).toEqual([[0, 1], [0.5, 2]]);
  });
  it('reads space-separated columns', () => {
    expect(parseNumericCsv('0  1\n1  2.5\n').rows).toEqual([[0, 1], [1, 2.5]]);
  });
  it('names the line of a non-numeric row after the data started', () => {
    const bad = 't,x\n0,1\n0.1,2\n0.2,oops\n';
    expect(() => parseNumericCsv(bad, { input: 'record' })).toThrow(InputRangeError);
    expect(() => parseNumericCsv(bad, { input: 'record' })).toThrow(/line 4/);
  });
  it('names the line of a row with a different number of columns', () => {
    expect(() => parseNumericCsv('0,1\n1,2\n2,3,4\n')).toThrow(/line 3 has 3 columns/);
  });
  it('rejects text without a numeric table', () => {
    expect(() => parseNumericCsv('hello\nworld\n', { minColumns: 2 })).toThrow(InputRangeError);
    expect(() => parseNumericCsv('')).toThrow(InputRangeError);
  });
  it('round-trips any table of finite numbers written with any delimiter', () => {
    const cell = fc.double({ min: -1e9, max: 1e9, noNaN: true, noDefaultInfinity: true });
    fc.assert(fc.property(fc.array(fc.tuple(cell, cell, cell), { minLength: 2, maxLength: 30 }), fc.constantFrom(',', ';', '\t'), (rows, d) => {
      const text = 'a' + d + 'b' + d + 'c\n' + rows.map((r) => r.map((v) => String(v)).join(d)).join('\n');
      const t = parseNumericCsv(text);
      return t.rows.length === rows.length && t.rows.every((r, i) => r.every((v, j) => Object.is(v, rows[i]![j]!) || v === rows[i]![j]!));
    }), { seed: 1, numRuns: 100 });
  });
});

describe('readTimeSeries', () => {
  it('scales milliseconds to seconds and picks the signal column', () => {
    const s = readTimeSeries('t_ms,a,b\n0,1,10\n5,2,20\n', { column: 3, timeScale: 1e-3 });
    expect(s.t).toEqual([0, 0.005]);
    expect(s.y).toEqual([10, 20]);
    expect(s.name).toBe('b');
  });
  it('names the line where time stops increasing', () => {
    expect(() => readTimeSeries('t,x\n0,1\n0.1,2\n0.1,3\n')).toThrow(/line 4/);
  });
  it('refuses a signal column that is not in the file', () => {
    expect(() => readTimeSeries('0,1\n1,2\n', { column: 3 })).toThrow(/'column'/);
  });
});
