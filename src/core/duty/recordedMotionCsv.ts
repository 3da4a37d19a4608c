/**
 * Reads a recorded-motion CSV (time with displacement or velocity, optionally force) into SI
 * arrays. Every row is accounted for: used, blank, comment, header, units, or rejected with a
 * reason and its row number. Nothing is dropped silently.
 */
import { ComputationError, InputRangeError } from '../errors.ts';
import { PLAIN_NUMBER } from '../numeric/plainNumber.ts';
import { mapColumns, type ColumnLayout, type ColumnMap, type Role } from './recordedMotionHeader.ts';

export interface RejectedRow {
  /** 1-based row number in the file. */
  readonly row: number;
  readonly reason: string;
}

export interface ParsedRecord {
  readonly t: number[];
  readonly x?: number[] | undefined;
  readonly v?: number[] | undefined;
  readonly F?: number[] | undefined;
  readonly columns: ColumnMap;
  readonly rejected: RejectedRow[];
  /** Blank and comment ('#') lines skipped. */
  readonly skipped: number;
}


function detectDelimiter(line: string): { split: (s: string) => string[]; decimalComma: boolean } {
  const count = (c: string) => line.split(c).length - 1;
  if (count(';') > 0) return { split: (s) => s.split(';'), decimalComma: true };
  if (count('\t') > 0) return { split: (s) => s.split('\t'), decimalComma: false };
  if (count(',') > 0) return { split: (s) => s.split(','), decimalComma: false };
  return { split: (s) => s.trim().split(/\s+/), decimalComma: false };
}

/**
 * Parses the record.
 *
 * @param text CSV text: optional header row (names, units in [..] or (..)), optional units row,
 *   then data rows; delimiter ',', ';' (decimal comma allowed), tab or spaces
 * @param layout column layout, 'auto' to read the header
 * @throws InputRangeError naming the row when the header cannot be understood, or when fewer
 *   than 3 rows are usable, or more than half the data rows are rejected (the first reason is quoted)
 * @example parseRecordedMotion('time [s],x [mm]\n0,0\n0.01,1\n0.02,2').x // [0, 0.001, 0.002]
 * @source common practice, no source (CSV as written by data loggers and damper dynamometers)
 */
export function parseRecordedMotion(text: string, layout: ColumnLayout = 'auto'): ParsedRecord {
  const lines = text.split(/\r\n|\n|\r/);
  if (lines.length > 1 && lines[lines.length - 1] === '') lines.pop(); // the file's final newline is not a line
  let skipped = 0;
  let i = 0;
  const nextContent = () => {
    while (i < lines.length && (lines[i]!.trim() === '' || lines[i]!.trim().startsWith('#'))) { skipped++; i++; }
  };
  nextContent();
  if (i >= lines.length) throw new InputRangeError('csv', '', undefined, '', 'the record is empty');
  const delim = detectDelimiter(lines[i]!);
  const cellsOf = (line: string) => {
    const cells = delim.split(line);
    for (let k = 0; k < cells.length; k++) {
      const c = cells[k]!.trim();
      cells[k] = c.length > 1 && c.charCodeAt(0) === 34 && c.charCodeAt(c.length - 1) === 34 ? c.slice(1, -1) : c;
    }
    return cells;
  };
  const isNum = (c: string) => PLAIN_NUMBER.test(delim.decimalComma ? c.replace(',', '.') : c);
  let header: string[] | undefined;
  let units: string[] | undefined;
  let headerRow = i + 1;
  const first = cellsOf(lines[i]!);
  if (!first.every(isNum)) {
    header = first; headerRow = i + 1; i++;
    nextContent();
    if (i < lines.length) {
      const second = cellsOf(lines[i]!);
      if (!second.some(isNum)) { units = second; i++; }
    }
  }
  nextContent();
  const ncols = i < lines.length ? cellsOf(lines[i]!).length : 0;
  const columns = mapColumns(header, units, layout, ncols, headerRow);
  const roles = Object.keys(columns.index) as Role[];
  const out: Record<Role, number[]> = { t: [], x: [], v: [], F: [] };
  const rejected: RejectedRow[] = [];
  let lastT = -Infinity;
  for (; i < lines.length; i++) {
    const line = lines[i]!;
    const trimmed = line.trim();
    if (trimmed === '' || trimmed.startsWith('#')) { skipped++; continue; }
    const cells = cellsOf(line);
    const row = i + 1;
    let bad: string | undefined;
    const vals: Partial<Record<Role, number>> = {};
    for (const r of roles) {
      const c = cells[columns.index[r]!];
      if (c === undefined || c === '') { bad = `missing value in column ${columns.index[r]! + 1}`; break; }
      const s = delim.decimalComma ? c.replace(',', '.') : c;
      if (!PLAIN_NUMBER.test(s)) { bad = `'${c.slice(0, 20)}' in column ${columns.index[r]! + 1} is not a number`; break; }
      vals[r] = Number(s) * columns.factor[r]!;
    }
    if (!bad && !(vals.t! > lastT)) bad = `time ${vals.t} does not increase (previous ${lastT})`;
    if (bad) { rejected.push({ row, reason: bad }); continue; }
    lastT = vals.t!;
    for (const r of roles) out[r].push(vals[r]!);
  }
  const used = out.t.length;
  if (used < 3 || rejected.length > used) {
    const firstBad = rejected[0];
    const why = firstBad ? `row ${firstBad.row}: ${firstBad.reason}` : 'fewer than 3 data rows';
    throw new InputRangeError('csv', `${used} usable rows`, undefined, '', `${rejected.length} rows rejected; ${why}`);
  }
  if (columns.index.x === undefined && columns.index.v === undefined) throw new ComputationError('record has no motion column');
  return {
    t: out.t,
    x: columns.index.x !== undefined ? out.x : undefined,
    v: columns.index.v !== undefined ? out.v : undefined,
    F: columns.index.F !== undefined ? out.F : undefined,
    columns, rejected, skipped,
  };
}
