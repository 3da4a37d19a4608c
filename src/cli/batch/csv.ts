/**
 * RFC 4180 CSV for `dampbook batch`: fields separated by commas, records by CRLF or LF, a field
 * in double quotes may hold commas, line breaks and doubled quotes (""). Blank records are
 * skipped (a trailing newline is not a row). Written fields are quoted only when they must be.
 *
 * Source: IETF RFC 4180 (2005), "Common Format and MIME Type for CSV Files", §2 rules 1–7.
 */
export class CsvError extends Error {
  override name = 'CsvError';
}

/** Parses CSV text into records of fields. Throws CsvError naming the line of an unclosed quote. */
export function parseCsv(text: string): string[][] {
  // a byte-order mark (spreadsheet exports) is not part of the first column's name
  if (text.startsWith('\uFEFF')) text = text.slice(1);
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  let line = 1;
  let startLine = 1;
  let i = 0;
  const n = text.length;
  const endRecord = () => {
    row.push(field);
    field = '';
    // a record that is one empty field is a blank line
    if (!(row.length === 1 && row[0] === '')) rows.push(row);
    row = [];
  };
  while (i < n) {
    const ch = text[i]!;
    if (quoted) {
      if (ch === '"') {
        if (text[i + 1] === '"') { field += '"'; i += 2; continue; }
        quoted = false; i++; continue;
      }
      if (ch === '\n') line++;
      field += ch; i++; continue;
    }
    if (ch === '"' && field === '') { quoted = true; startLine = line; i++; continue; }
    if (ch === ',') { row.push(field); field = ''; i++; continue; }
    if (ch === '\r' && text[i + 1] === '\n') { endRecord(); line++; i += 2; continue; }
    if (ch === '\n' || ch === '\r') { endRecord(); line++; i++; continue; }
    field += ch; i++;
  }
  if (quoted) throw new CsvError(`the quoted field opened on line ${startLine} is never closed`);
  if (field !== '' || row.length) endRecord();
  return rows;
}

/** One field, quoted when it holds a comma, quote, or line break (RFC 4180 §2 rules 6–7). */
export function csvField(s: string): string {
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function csvRecord(fields: readonly string[]): string {
  return fields.map(csvField).join(',');
}
