/**
 * A temperature history as rows "t, T": points joined by straight lines, a step written as two
 * rows at the same time. Units come from an optional header ("t [h], T [°C]"); without one the
 * rows are seconds and kelvin. Lines starting with # are comments.
 *
 *     t [h], T [°C]
 *     0, 80
 *     450, 80
 *     450, 110
 *     900, 110
 */
import { InputRangeError } from '../errors.ts';
import { readUnitRows } from '../thermal/unitRows.ts';

export interface TemperatureHistory {
  /** Times, s, non-decreasing (a time at most twice: a step). */
  readonly t: readonly number[];
  /** Temperatures, K, at those times. */
  readonly T: readonly number[];
}

/** Most rows read (a logger day at one row a minute is 1440). */
export const MAX_HISTORY_ROWS = 20_000;
/** Temperatures a history may hold, K (−100 °C to 500 °C: any seal or oil). */
export const HISTORY_T_RANGE = { min: 173.15, max: 773.15 } as const;

/**
 * @param text the rows (untrusted)
 * @param input the input key named in errors
 * @throws InputRangeError naming the input and the line: not two numeric columns, a header unit of
 *   the wrong kind, a time going back or repeated three times, a temperature outside 173.15–773.15 K,
 *   fewer than two rows or no time elapsed
 * @example readTemperatureHistory('t [h], T [°C]\n0, 80\n1, 80').t // [0, 3600]
 * @source common practice, no source (a logged or computed temperature trace as a table)
 */
export function readTemperatureHistory(text: string, input = 'history'): TemperatureHistory {
  const { rows, lines } = readUnitRows(text, input, [{ name: 'time', kind: 'time' }, { name: 'temperature', kind: 'temperature' }], MAX_HISTORY_ROWS);
  const fail = (i: number, why: string): never => {
    throw new InputRangeError(input, `line ${lines[i]}`, undefined, '', `line ${lines[i]}: ${why}`);
  };
  const t: number[] = [];
  const T: number[] = [];
  rows.forEach(([ti, Ti], i) => {
    if (!(ti! >= 0 && ti! <= 1e12)) fail(i, 'time must be between 0 and 1e12 s');
    if (!(Ti! >= HISTORY_T_RANGE.min && Ti! <= HISTORY_T_RANGE.max)) fail(i, `temperature must be between ${HISTORY_T_RANGE.min} and ${HISTORY_T_RANGE.max} K (−100 to 500 °C); give the unit in a header such as "t [h], T [°C]"`);
    if (i > 0 && ti! < t[i - 1]!) fail(i, 'times must not go back');
    if (i > 1 && ti === t[i - 1] && ti === t[i - 2]) fail(i, 'a time may appear at most twice (a step)');
    t.push(ti!);
    T.push(Ti!);
  });
  if (t.length < 2) throw new InputRangeError(input, text.slice(0, 40), undefined, '', 'give at least two rows (start and end of the history)');
  if (!(t[t.length - 1]! > t[0]!)) throw new InputRangeError(input, text.slice(0, 40), undefined, '', 'the history must last some time (last time above the first)');
  return { t, T };
}

/**
 * The text form handed between pages: a header in seconds and kelvin, one row per point, times to
 * `tDigits` and temperatures to `TDigits` significant figures, rows separated by newlines.
 *
 * @example formatTemperatureHistory({ t: [0, 600], T: [298.15, 320.5] }).split('\n')[2] // '600, 320.5' (after the header and the first row)
 * @source common practice, no source
 */
export function formatTemperatureHistory(h: TemperatureHistory, tDigits = 9, TDigits = 7): string {
  const n = (x: number, d: number) => String(Number(x.toPrecision(d)));
  return ['t [s], T [K]', ...h.t.map((ti, i) => `${n(ti, tDigits)}, ${n(h.T[i]!, TDigits)}`)].join('\n');
}
