/**
 * Reads a damper dyno sheet as force–velocity points: rows `v, F` (m/s, N) with an optional
 * third column, the oil or body temperature in kelvin. Positive velocity is rebound
 * (extension), negative compression, as in laws.ts; the force carries the sign of the motion it
 * resists. Header and comment lines are skipped by the shared CSV reader.
 */
import { InputRangeError } from '../errors.ts';
import { parseNumericCsv } from '../records/parseNumericCsv.ts';

export interface FvData {
  /** velocity, m/s (signed) */ readonly v: readonly number[];
  /** damper force, N (signed, offset removed) */ readonly F: readonly number[];
  /** temperature per point, K, when the sheet has a third column */ readonly T: readonly number[] | undefined;
  /** 1-based source line of each point */ readonly lines: readonly number[];
}

/** Temperatures below this are taken for degrees Celsius typed into a kelvin column. */
const T_MIN = 150;
const T_MAX = 700;

/**
 * Parses force–velocity rows and removes a constant force offset (the gas force).
 *
 * $$F_i = F_{\mathrm{measured},i} - F_0$$
 *
 * @param text rows `v, F[, T]` in SI (m/s, N, K); comma, semicolon, tab or space delimited
 * @param F0 force the sheet shows at zero velocity (gas-spring force), N, same sign convention
 * @param input name of the text input, for messages
 * @throws InputRangeError naming the input and the line for a non-numeric row, a row with fewer
 *   than two or more than three columns, a velocity beyond ±20 m/s, a force beyond ±1e9 N or a temperature outside
 *   [150, 700] K (a Celsius value in the kelvin column is caught here)
 * @example readFvPoints('v,F\n0.1,98\n-0.1,-40', 0).F // [98, -40]
 * @source common practice, no source (dyno sheets list force against peak velocity per stroke;
 *   sign convention as in dixon2007 ch. 1, from memory)
 */
export function readFvPoints(text: string, F0 = 0, input = 'points'): FvData {
  const table = parseNumericCsv(text, { input, minColumns: 2, maxRows: 20_000 });
  if (table.columnCount > 3) {
    throw new InputRangeError(input, `line ${table.lines[0]}`, undefined, '', `rows have ${table.columnCount} columns; give v, F and optionally T (K)`);
  }
  const v: number[] = [];
  const F: number[] = [];
  const T: number[] | undefined = table.columnCount === 3 ? [] : undefined;
  table.rows.forEach((row, i) => {
    const line = table.lines[i]!;
    const [vi, Fi, Ti] = row as [number, number, number?];
    if (Math.abs(vi) > 20) throw new InputRangeError(input, `line ${line}: v = ${vi}`, undefined, '', `line ${line}: velocity beyond ±20 m/s; give v in m/s`);
    if (Math.abs(Fi) > 1e9) throw new InputRangeError(input, `line ${line}: F = ${Fi}`, undefined, '', `line ${line}: force beyond ±1e9 N; give F in N`);
    if (T && Ti !== undefined) {
      if (Ti < T_MIN || Ti > T_MAX) throw new InputRangeError(input, `line ${line}: T = ${Ti}`, undefined, '', `line ${line}: temperature outside [${T_MIN}, ${T_MAX}] K; the third column is in kelvin (20 °C = 293.15 K)`);
      T.push(Ti);
    }
    v.push(vi);
    F.push(Fi - F0);
  });
  return { v, F, T, lines: table.lines };
}
