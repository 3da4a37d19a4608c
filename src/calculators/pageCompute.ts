/**
 * What a calculator's page shows for one set of SI values: the result and, when the page draws
 * charts, the chart data with the operating point marked — or the reason it could not be computed.
 *
 * Why one function: the page computes light calculators on its own thread and heavy ones in a
 * worker (components/client/off-thread*.ts); both must give the reader the same answer and refuse
 * the same inputs with the same message, so both call this. Plain data in and out: no DOM.
 */
import { withOperatingPoint } from './chartMarks.ts';
import { evaluate } from './evaluate.ts';
import type { CalculatorDefinition, ChartSpec, Result, Values } from './types.ts';
import { DampbookError, InputRangeError } from '../core/errors.ts';

export type PageResult = Result & { readonly values: Values };

export type PageComputation =
  | { readonly ok: true; readonly result: PageResult; readonly charts?: ChartSpec[]; readonly chartError?: string }
  /** `known`: a typed error whose message is for the reader; `input`: the field it names. */
  | { readonly ok: false; readonly message: string; readonly known: boolean; readonly input?: string };

/**
 * Evaluates `values` (already validated SI) and, when `charts` is set, the calculator's charts.
 * `offered`: a result computed elsewhere for these same values (e.g. by a study), used as is.
 * A chart that cannot be drawn for these inputs leaves the result standing with `chartError`;
 * an error that is not a DampbookError in the charts is a bug and is thrown.
 */
export function computeForPage(calc: CalculatorDefinition, values: Values, charts: boolean, offered?: PageResult): PageComputation {
  let result: PageResult;
  try {
    result = offered ?? evaluate(calc, values);
  } catch (e) {
    return { ok: false, known: e instanceof DampbookError, message: e instanceof Error ? e.message : String(e), ...(e instanceof InputRangeError ? { input: e.input } : {}) };
  }
  if (!charts || !calc.charts) return { ok: true, result };
  try {
    return { ok: true, result, charts: withOperatingPoint(calc, calc.charts(result.values, result), result.values) };
  } catch (e) {
    if (!(e instanceof DampbookError)) throw e;
    return { ok: true, result, chartError: e.message };
  }
}
