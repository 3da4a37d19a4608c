/**
 * A defensive reader for pasted or exported numeric tables (test-rig records, logger exports):
 * header rows, comment lines, comma / semicolon / tab / space delimiters, decimal points or
 * decimal commas (with a non-comma delimiter), quoted fields and CRLF line ends. Every rejected
 * row is named by its 1-based line number so a reader can fix the file.
 */
import { InputRangeError } from '../errors.ts';
import { PLAIN_NUMBER } from '../numeric/plainNumber.ts';
import { maxOf } from '../numeric/extent.ts';

export type Delimiter = ',' | ';' | '\t' | ' ';

export interface NumericTable {
  /** Column names from the last header line, when there was one. */
  readonly header: readonly string[] | undefined;
  readonly columnCount: number;
  /** Data rows, each with columnCount finite numbers. */
  readonly rows: readonly (readonly number[])[];
  /** 1-based source line of each row (for messages). */
  readonly lines: readonly number[];
  readonly delimiter: Delimiter;
  readonly decimalComma: boolean;
  /** Header and comment lines skipped. */
  readonly skipped: number;
}

export interface ParseOptions {
  /** Input name used in error messages (default 'record'). */
  readonly input?: string;
  /** Fewest columns a data row must have (default 1). */
  readonly minColumns?: number;
  /** Most data rows accepted (default 200 000). */
  readonly maxRows?: number | undefined;
  /** Most header lines before the first data row (default 50). */
  readonly maxHeaderLines?: number;
}

const COMMENT = /^(?:#|%|\/\/)/;
const DATA_START = /^["']?[+\-.\d]/;

/** Parses one field; undefined when it is not a plain decimal number. */
export function parseNumberField(raw: string, decimalComma: boolean): number | undefined {
  let s = raw.trim();
  if (s.length >= 2 && (s[0] === '"' || s[0] === "'") && s[s.length - 1] === s[0]) s = s.slice(1, -1).trim();
  if (decimalComma && !s.includes('.')) s = s.replace(',', '.');
  if (!PLAIN_NUMBER.test(s)) return undefined;
  const v = Number(s);
  return Number.isFinite(v) ? v : undefined;
}

function split(line: string, d: Delimiter): string[] {
  const parts = d === ' ' ? line.trim().split(/\s+/) : line.split(d);
  while (parts.length > 1 && parts[parts.length - 1]!.trim() === '') parts.pop(); // trailing delimiter
  return parts;
}

function parseRow(line: string, d: Delimiter, decimalComma: boolean): number[] | undefined {
  const out: number[] = [];
  for (const f of split(line, d)) {
    const v = parseNumberField(f, decimalComma);
    if (v === undefined) return undefined;
    out.push(v);
  }
  return out;
}

/**
 * Picks the delimiter (and decimal mark) under which most sample data lines parse with one
 * column count; ties go to the earlier candidate (tab, semicolon, comma, space). A malformed
 * line among the samples does not hide the format: it is reported later with its line number.
 */
function detect(sample: readonly string[], minColumns: number): { d: Delimiter; comma: boolean } | undefined {
  const candidates: Delimiter[] = ['\t', ';', ',', ' '];
  let best: { d: Delimiter; comma: boolean; score: number } | undefined;
  for (const d of candidates) {
    if (d !== ' ' && !sample.some((l) => l.includes(d))) continue;
    for (const comma of d === ',' ? [false] : [false, true]) {
      const tally = new Map<number, number>();
      for (const l of sample) {
        const c = parseRow(l, d, comma)?.length ?? -1;
        if (c >= minColumns) tally.set(c, (tally.get(c) ?? 0) + 1);
      }
      const score = Math.max(0, maxOf([...tally.values()])) / sample.length;
      if (score >= 0.5 && (!best || score > best.score)) best = { d, comma, score };
    }
  }
  return best && { d: best.d, comma: best.comma };
}

/**
 * Reads a numeric table from text.
 * @throws InputRangeError naming the input and the line when the text holds no data rows, a row
 *   has a non-numeric field, or rows disagree on the number of columns
 * @example parseNumericCsv('t;x\n0;1,5\n0,01;1,2').rows // [[0, 1.5], [0.01, 1.2]]
 * @source common practice, no source (the comma form is RFC 4180; semicolons with decimal commas
 *   and tab-separated exports follow common spreadsheet and logger practice)
 */
export function parseNumericCsv(text: string, opts: ParseOptions = {}): NumericTable {
  const input = opts.input ?? 'record';
  const minColumns = opts.minColumns ?? 1;
  const maxRows = opts.maxRows ?? 200_000;
  const maxHeader = opts.maxHeaderLines ?? 50;
  const all = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  const meaningful = (l: string) => l !== '' && !COMMENT.test(l);
  // format sample: data-looking lines 2–21 (the first may be a numeric-looking header)
  const candidates: string[] = [];
  for (let i = 0; i < all.length && candidates.length < 21; i++) {
    const l = all[i]!.trim();
    if (meaningful(l) && DATA_START.test(l)) candidates.push(l);
  }
  const fmt = detect(candidates.length > 1 ? candidates.slice(1) : candidates, minColumns);
  if (!fmt) {
    // name a line, as every other refusal here does: the first that is not a data row, else the first
    const idx = all.findIndex((l) => meaningful(l.trim()) && !DATA_START.test(l.trim()));
    const line = (idx >= 0 ? idx : Math.max(0, all.findIndex((l) => meaningful(l.trim())))) + 1;
    throw new InputRangeError(input, text.slice(0, 40), undefined, '', `line ${line}: no table of at least ${minColumns} numeric columns found (delimiters tried: tab, semicolon, comma, space)`);
  }
  const rows: number[][] = [];
  const lines: number[] = [];
  let header: string[] | undefined;
  let headerLines = 0;
  let ignored = 0;
  for (let i = 0; i < all.length; i++) {
    const l = all[i]!.trim();
    const line = i + 1;
    if (!meaningful(l)) { ignored++; continue; }
    const row = parseRow(l, fmt.d, fmt.comma);
    if (row === undefined) {
      if (rows.length === 0 && headerLines < maxHeader) {
        header = split(l, fmt.d).map((h) => h.trim().replace(/^["']|["']$/g, ''));
        headerLines++;
        continue;
      }
      throw new InputRangeError(input, `line ${line}: ${l}`, undefined, '', `line ${line} is not a row of numbers`);
    }
    if (rows.length > 0 && row.length !== rows[0]!.length) {
      throw new InputRangeError(input, `line ${line}: ${l}`, undefined, '', `line ${line} has ${row.length} columns, the first data row has ${rows[0]!.length}`);
    }
    if (row.length < minColumns) {
      throw new InputRangeError(input, `line ${line}: ${l}`, undefined, '', `line ${line} has ${row.length} columns, need at least ${minColumns}`);
    }
    if (rows.length >= maxRows) throw new InputRangeError(input, `${maxRows}+ rows`, undefined, '', `more than ${maxRows} data rows`);
    rows.push(row);
    lines.push(line);
  }
  if (rows.length === 0) throw new InputRangeError(input, text.slice(0, 40), undefined, '', 'no data rows found');
  return { header, columnCount: rows[0]!.length, rows, lines, delimiter: fmt.d, decimalComma: fmt.comma, skipped: ignored + headerLines };
}
