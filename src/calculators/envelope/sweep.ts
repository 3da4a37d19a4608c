/**
 * A sweep: one numeric output against one number input over a range, the other inputs at their
 * nominal values, as chart data with the nominal point marked. Pure and generic (any definition).
 * Points whose evaluation fails, or where the output is absent, are left out and counted.
 */
import { ComputationError, DampbookError, InputRangeError } from '../../core/errors.ts';
import { maxOf, minOf } from '../../core/numeric/index.ts';
import { q } from '../quantityText.ts';
import { evaluate } from '../evaluate.ts';
import type { CalculatorDefinition, ChartSpec, Values } from '../types.ts';
import { checkVariations } from './variations.ts';

/** Points along a sweep (evenly spaced, plus the nominal value itself). */
export const SWEEP_POINTS = 81;

export interface Sweep {
  readonly input: string;
  readonly output: string;
  readonly x: readonly number[];
  readonly y: readonly number[];
  readonly nominal: { readonly x: number; readonly y: number };
  /** Points left out: the evaluation failed or the output is absent there. */
  readonly missing: number;
}

/** Sweeps `input` from lo to hi (SI, inside its valid range and holding the nominal value). */
export function sweep(calc: CalculatorDefinition, nominal: Values, input: string, lo: number, hi: number, output: string, n = SWEEP_POINTS): Sweep {
  const res = evaluate(calc, nominal);
  const out = calc.outputs.find((o) => o.key === output);
  if (!out || out.kind === 'text') throw new InputRangeError(output, undefined, undefined, '', `${calc.id} has no numeric output of this name to sweep`);
  const y0 = res.outputs[output];
  if (typeof y0 !== 'number') throw new ComputationError(`${calc.id}: output '${output}' has no value at the nominal inputs, so it cannot be swept`);
  const [v] = checkVariations(calc, res.values, { [input]: { lo, hi } });
  const x0 = res.values[input] as number;
  const xs = Array.from({ length: n }, (_, i) => (i === 0 ? v!.lo : i === n - 1 ? v!.hi : v!.lo + (i / (n - 1)) * (v!.hi - v!.lo)));
  if (!xs.includes(x0)) xs.push(x0);
  xs.sort((a, b) => a - b);
  const x: number[] = [];
  const y: number[] = [];
  let missing = 0;
  for (const xi of xs) {
    let yi: unknown;
    try {
      yi = xi === x0 ? y0 : evaluate(calc, { ...res.values, [input]: xi }).outputs[output];
    } catch (e) {
      if (!(e instanceof DampbookError)) throw e;
    }
    if (typeof yi === 'number') { x.push(xi); y.push(yi); } else missing++;
  }
  return { input, output, x, y, nominal: { x: x0, y: y0 }, missing };
}

/** The sweep as a chart: the line and the nominal point; the summary states the range found. */
export function sweepChart(calc: CalculatorDefinition, s: Sweep): ChartSpec {
  const inDef = calc.inputs.find((d) => d.key === s.input)!;
  const outDef = calc.outputs.find((o) => o.key === s.output)!;
  if (inDef.kind === 'choice' || inDef.kind === 'text' || outDef.kind === 'text') throw new TypeError('sweepChart: number input and numeric output only');
  const lo = minOf(s.y);
  const hi = maxOf(s.y);
  const gap = s.missing ? ` ${s.missing} of ${s.x.length + s.missing} points had no value and are left out.` : '';
  return {
    id: 'sweep',
    title: `${outDef.label} against ${inDef.label}`,
    x: { label: inDef.label, kind: inDef.kind },
    y: { label: outDef.label, kind: outDef.kind },
    series: [
      { label: `${outDef.label}`, x: s.x, y: s.y, tone: 0 },
      { label: 'nominal point', x: [s.nominal.x], y: [s.nominal.y], style: 'points', tone: 3 },
    ],
    summary: `Over ${q(s.x[0] ?? s.nominal.x, inDef.kind)} to ${q(s.x[s.x.length - 1] ?? s.nominal.x, inDef.kind)}, ${outDef.label} runs from ${q(lo, outDef.kind)} to ${q(hi, outDef.kind)}; nominal ${q(s.nominal.y, outDef.kind)} at ${q(s.nominal.x, inDef.kind)}.${gap}`,
  };
}
