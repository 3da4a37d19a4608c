/**
 * One batch row = one `calc`: the row's non-empty cells become `--in key=value` pairs and go
 * through the CLI's own readInputs()/evaluateInputs() (no second parser), so a cell means exactly
 * what the same text means after `--in`, and an empty cell is an input not given (the defaults and
 * the "required" rule of `calc`). Used in process and by the worker threads alike.
 */
import type { CalculatorDefinition } from '../../calculators/types.ts';
import { DampbookError } from '../../core/errors.ts';
import { UsageError } from '../args.ts';
import { escapeControls } from '../escape.ts';
import { evaluateInputs, readInputs, summariseText, textLabel } from '../inputs.ts';
import { requireCalculator } from '../lookup.ts';

export type RowValue = number | string | boolean;

export type RowResult =
  | { readonly row: number; readonly inputs?: Record<string, RowValue>; readonly outputs: Record<string, RowValue>; readonly warnings: readonly string[] }
  | { readonly row: number; readonly error: string };

/** A chunk of rows sent to a worker: `first` is the 1-based number of its first data row. */
export interface RowChunk {
  readonly id: string;
  readonly header: readonly string[];
  readonly rows: readonly (readonly string[])[];
  readonly first: number;
  /** Echo the SI inputs used (for --json). */
  readonly withInputs: boolean;
  /** The handbook folder whose own calculators a worker thread must load first (`--content`). */
  readonly content?: string;
}

/** The one-line message of a refused row: the calculator's own message, escaped like every CLI line. */
function messageOf(e: unknown): string {
  if (e instanceof DampbookError || e instanceof UsageError) return escapeControls(e.message);
  return escapeControls(`internal error: ${e instanceof Error ? e.message : String(e)}`);
}

export function runRow(def: CalculatorDefinition, header: readonly string[], cells: readonly string[], row: number, withInputs: boolean): RowResult {
  try {
    if (cells.length !== header.length) throw new UsageError(`row has ${cells.length} cells, the header has ${header.length} columns`);
    const pairs: [string, string][] = [];
    for (let j = 0; j < header.length; j++) if (cells[j]!.trim() !== '') pairs.push([header[j]!, cells[j]!.trim()]);
    const read = readInputs(def, pairs);
    const r = evaluateInputs(def, read);
    const outputs: Record<string, RowValue> = {};
    for (const o of def.outputs) { const v = r.outputs[o.key]; if (v !== undefined) outputs[o.key] = v as RowValue; }
    const warnings = r.warnings.map(escapeControls);
    if (!withInputs) return { row, outputs, warnings };
    const inputs: Record<string, RowValue> = {};
    for (const [k, v] of Object.entries(r.values)) {
      // text inputs are summarised as `calc --json` does, never echoed back
      inputs[k] = typeof v === 'string' && def.inputs.find((d) => d.key === k)?.kind === 'text' ? textLabel(read.texts.find((x) => x.key === k) ?? summariseText(k, v)) : v as RowValue;
    }
    return { row, inputs, outputs, warnings };
  } catch (e) {
    return { row, error: messageOf(e) };
  }
}

export function runChunk(chunk: RowChunk): RowResult[] {
  const def = requireCalculator('batch', chunk.id);
  return chunk.rows.map((cells, i) => runRow(def, chunk.header, cells, chunk.first + i, chunk.withInputs));
}
