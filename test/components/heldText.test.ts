/**
 * The summary a long record shows in place of its textarea: rows counted as the CLI counts them
 * (non-empty lines, `countRows` in src/cli/inputs.ts), the link's FNV-1a checksum, and a name
 * that cannot carry control characters. Behaviour; FNV-1a of "a" is e40c292c (closed form: the
 * published FNV-1a 32-bit test vector, Fowler–Noll–Vo, "FNV hash" reference, from memory).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { countRows as cliRows } from '../../src/cli/inputs.ts';
import { countRows, describeHeld, holdText, LARGE_TEXT } from '../../src/components/render/heldText.ts';

describe('held long text', () => {
  it('counts non-empty lines exactly as the CLI summary does, for any mix of line ends and blanks', () => {
    const line = fc.constantFrom('1,2', '', '  ', '\t', '# c', 'x');
    const end = fc.constantFrom('\n', '\r\n', '\r');
    fc.assert(fc.property(fc.array(fc.tuple(line, end), { maxLength: 30 }), fc.boolean(), (parts, last) => {
      const text = parts.map(([l, e]) => l + e).join('') + (last ? 'tail' : '');
      expect(countRows(text)).toBe(cliRows(text));
    }), { seed: 1, numRuns: 500 });
  });

  it('summarises name, rows, characters and checksum, and is for texts over the threshold only', () => {
    const h = holdText('a', 'dyno.csv');
    expect(h.sum).toBe('e40c292c');
    expect(describeHeld({ ...h, rows: 420000, text: 'x'.repeat(3873912) })).toBe('dyno.csv: 420 000 rows, 3 873 912 characters, checksum e40c292c. Used as loaded; too long to edit here (edit the file and load it again).');
    expect(LARGE_TEXT).toBeLessThan(2_000_000); // ring-down's largest record would otherwise sit in the textarea
  });
});
