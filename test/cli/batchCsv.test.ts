/**
 * The batch CSV reader and writer against IETF RFC 4180 (2005), "Common Format and MIME Type for
 * CSV Files", §2 rules 1–7 (published): CRLF or LF records, quoted fields holding commas, line
 * breaks and doubled quotes, no trailing empty record; plus a leading UTF-8 byte-order mark
 * (common practice, no source: spreadsheet exports write one). A fast-check round trip (fixed
 * seed) checks that what csvRecord writes parseCsv reads back unchanged.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { csvField, csvRecord, CsvError, parseCsv } from '../../src/cli/batch/csv.ts';

describe('parseCsv (RFC 4180 §2)', () => {
  it.each([
    // [case, text, records, rule]
    ['LF records', 'a,b\n1,2\n', [['a', 'b'], ['1', '2']], 'rule 1 (LF accepted as well)'],
    ['CRLF records', 'a,b\r\n1,2\r\n', [['a', 'b'], ['1', '2']], 'rule 1'],
    ['last record without a line break', 'a,b\r\n1,2', [['a', 'b'], ['1', '2']], 'rule 2'],
    ['quoted comma', 'a,b\n"1,5",2\n', [['a', 'b'], ['1,5', '2']], 'rule 6'],
    ['embedded CRLF and LF', 'a,b\n"x\r\ny",2\n"p\nq",3\n', [['a', 'b'], ['x\r\ny', '2'], ['p\nq', '3']], 'rule 6'],
    ['doubled quote', 'a\n"say ""25 mm"""\n', [['a'], ['say "25 mm"']], 'rule 7'],
    ['empty fields', 'a,b,c\n,,\n1,,3\n', [['a', 'b', 'c'], ['', '', ''], ['1', '', '3']], 'rule 4'],
    ['blank line skipped', 'a\n\n1\n', [['a'], ['1']], 'common practice, no source'],
    ['byte-order mark', '\uFEFFm,k\n1,2\n', [['m', 'k'], ['1', '2']], 'common practice, no source'],
    ['unit-suffixed cell', 'k\n25 kN/m\n', [['k'], ['25 kN/m']], 'rule 4 (spaces are part of a field)'],
  ])('%s', (_case, text, records) => {
    expect(parseCsv(text)).toEqual(records);
  });

  it('names the line of a quote that is never closed', () => {
    expect(() => parseCsv('a\n1\n"open,\n2\n')).toThrow(CsvError);
    expect(() => parseCsv('a\n1\n"open,\n2\n')).toThrow(/line 3/);
  });
});

describe('csvField / csvRecord', () => {
  it('quotes only fields that need it (rules 6–7)', () => {
    expect(csvField('25 mm')).toBe('25 mm');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvRecord(['x\ny', '1'])).toBe('"x\ny",1');
  });

  it('round-trips any record set (fast-check, seed 1)', () => {
    const field = fc.string({ unit: fc.constantFrom('a', '1', ',', '"', '\n', '\r', ' ', 'é'), maxLength: 8 });
    fc.assert(fc.property(fc.array(fc.array(field, { minLength: 2, maxLength: 4 }), { minLength: 1, maxLength: 6 }), (records) => {
      const text = records.map(csvRecord).join('\r\n');
      expect(parseCsv(text)).toEqual(records);
    }), { seed: 1, numRuns: 300 });
  });
});
