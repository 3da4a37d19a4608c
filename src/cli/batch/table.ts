/**
 * A batch file's cases: the header names input keys (each once; an unknown name is refused before
 * any row runs, since a misspelt column would otherwise leave every row on its default), and the
 * results are written back as the input cells as given, one SI column per output, `warnings` (joined by "; ") and `error`.
 */
import { isLegacyLawKey } from '../../calculators/shared/damperLawMigrate.ts';
import type { CalculatorDefinition } from '../../calculators/types.ts';
import { UsageError } from '../args.ts';
import { escapeControls } from '../escape.ts';
import { csvRecord, parseCsv } from './csv.ts';
import type { RowResult } from './rows.ts';

export interface Cases {
  readonly header: string[];
  readonly rows: string[][];
}

/** Parses the CSV text and checks its header against the calculator's inputs. */
export function readCases(def: CalculatorDefinition, text: string, file: string): Cases {
  const records = parseCsv(text);
  const head = records[0];
  if (!head) throw new UsageError(`${file} is empty: the first line must name the inputs (${def.inputs.map((i) => i.key).join(', ')})`);
  const header = head.map((h) => h.trim());
  const seen = new Set<string>();
  for (const key of header) {
    if (key === '') throw new UsageError(`${file}: a column of the header has no name`);
    if (seen.has(key)) throw new UsageError(`${file}: column '${key}' appears twice`);
    seen.add(key);
    if (!def.inputs.some((i) => i.key === key) && !isLegacyLawKey(def, key)) {
      throw new UsageError(`${file}: ${def.id} has no input '${key}'; inputs: ${def.inputs.map((i) => i.key).join(', ')}`);
    }
  }
  return { header, rows: records.slice(1) };
}

/** A number in SI with every digit kept (shortest round-trip form), so a re-read gives the same double. */
function cell(v: unknown): string {
  return v === undefined ? '' : String(v);
}

/** The result lines (header first), each one line with control characters escaped. */
export function resultLines(def: CalculatorDefinition, cases: Cases, results: readonly RowResult[]): string[] {
  const keys = def.outputs.map((o) => o.key);
  const lines = [csvRecord([...cases.header, ...keys, 'warnings', 'error'])];
  results.forEach((r, i) => {
    const given = cases.rows[i]!;
    // a row with too few or too many cells is written with the header's width
    const inputs = cases.header.map((_, j) => given[j] ?? '');
    const tail = 'error' in r ? [...keys.map(() => ''), '', r.error] : [...keys.map((k) => cell(r.outputs[k])), r.warnings.join('; '), ''];
    lines.push(escapeControls(csvRecord([...inputs, ...tail])));
  });
  return lines;
}
