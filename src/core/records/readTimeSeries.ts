import { InputRangeError } from '../errors.ts';
import { parseNumericCsv } from './parseNumericCsv.ts';

export interface TimeSeries {
  /** time, s, strictly increasing */ readonly t: readonly number[];
  /** the chosen signal column, as recorded */ readonly y: readonly number[];
  /** 1-based source line of each sample */ readonly lines: readonly number[];
  /** column name from the header, when there was one */ readonly name: string | undefined;
}

export interface TimeSeriesOptions {
  readonly input?: string;
  /** 1-based column of the signal (time is column 1); default 2 */
  readonly column?: number;
  /** factor from the file's time unit to seconds (0.001 for ms); default 1 */
  readonly timeScale?: number;
  readonly maxRows?: number | undefined;
}

/**
 * Reads a time record (time in the first column, signal in another) and checks that time
 * increases strictly from row to row, which uneven sampling may break but must not reverse.
 * @throws InputRangeError naming the input and the line of the first offending row
 * @example readTimeSeries('t,x\n0,1\n0.1,0.5').y // [1, 0.5]
 * @source common practice, no source
 */
export function readTimeSeries(text: string, opts: TimeSeriesOptions = {}): TimeSeries {
  const input = opts.input ?? 'record';
  const column = opts.column ?? 2;
  const scale = opts.timeScale ?? 1;
  const table = parseNumericCsv(text, { input, minColumns: 2, maxRows: opts.maxRows });
  if (!Number.isInteger(column) || column < 2 || column > table.columnCount) {
    throw new InputRangeError('column', column, { min: 2, max: table.columnCount }, '', `the record has ${table.columnCount} columns; column 1 is time`);
  }
  const t: number[] = [];
  const y: number[] = [];
  for (let i = 0; i < table.rows.length; i++) {
    const row = table.rows[i]!;
    const ti = row[0]! * scale;
    if (i > 0 && !(ti > t[i - 1]!)) {
      const line = table.lines[i]!;
      throw new InputRangeError(input, `line ${line}: t = ${row[0]}`, undefined, '', `time must increase from row to row; line ${line} does not`);
    }
    t.push(ti);
    y.push(row[column - 1]!);
  }
  return { t, y, lines: table.lines, name: table.header?.[column - 1] };
}
