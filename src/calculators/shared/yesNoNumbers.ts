/**
 * Yes/no inputs that were 0/1 numbers before they became choices (body-cooling's `ends` until 0.4).
 * A choice whose options are the numerals '0' and '1' still takes the old number from the CLI
 * ("1.0", "0e0") and from a record (a number with unit '1'), mapped to the option with a note;
 * any other number is refused by evaluate() naming the options. Pure; remove with the 0.5 release.
 */
import { isPlainNumber } from '../../core/numeric/plainNumber.ts';
import type { CalculatorDefinition } from '../types.ts';

export interface YesNoMigrated {
  readonly raw: Record<string, unknown>;
  readonly notes: string[];
}

/** True when a choice takes the numbers 0 and 1 (its options are the numerals). */
export function isNumeralChoice(calc: CalculatorDefinition, key: string): boolean {
  const def = calc.inputs.find((d) => d.key === key);
  return def?.kind === 'choice' && def.options.some((o) => o.value === '0') && def.options.some((o) => o.value === '1');
}

/** Maps an old 0/1 number (or number text other than the exact option) on a numeral choice to its option. */
export function migrateYesNoNumbers(calc: CalculatorDefinition, raw: Readonly<Record<string, unknown>>): YesNoMigrated {
  const out: Record<string, unknown> = Object.assign(Object.create(null), raw);
  const notes: string[] = [];
  for (const def of calc.inputs) {
    if (def.kind !== 'choice' || !isNumeralChoice(calc, def.key) || !(def.key in out)) continue;
    const v = out[def.key];
    if (typeof v === 'string' && def.options.some((o) => o.value === v)) continue;
    const n = typeof v === 'number' ? v : typeof v === 'string' && isPlainNumber(v.trim()) ? Number(v) : undefined;
    if (n !== 0 && n !== 1) continue; // left for evaluate() to refuse with the options named
    const option = def.options.find((o) => o.value === String(n))!;
    out[def.key] = option.value;
    notes.push(`'${def.key}' was a 0/1 number and is now a choice: ${String(v)} read as '${option.value}' (${option.label}).`);
  }
  return { raw: out, notes };
}
