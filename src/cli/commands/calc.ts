import { readFileSync } from 'node:fs';
import { evaluate } from '../../calculators/evaluate.ts';
import { calculatorIds, getCalculator } from '../../calculators/registry.ts';
import { InputRangeError } from '../../core/errors.ts';
import { isPlainNumber } from '../../core/numeric/plainNumber.ts';
import { siSymbol } from '../../core/units/index.ts';
import { UsageError, type ParsedArgs } from '../args.ts';
import { recordCheck } from './recordCheck.ts';

/** Largest file `--in key=@file` reads (a text input's own maxLength still applies). */
const MAX_FILE = 20 * 1024 * 1024;

/**
 * `dampbook calc <id> --in key=value … [--json]`: SI values (or "25 lb"); a missing required or
 * invalid input exits non-zero naming the input and its allowed range.
 */
export function calc(args: ParsedArgs, out: (s: string) => void): number {
  if (args.flags.has('record')) return recordCheck(args, out);
  const id = args.positionals[1];
  if (!id) throw new UsageError(`calc needs a calculator id: ${calculatorIds().join(', ')}`);
  const def = getCalculator(id);
  if (!def) throw new UsageError(`unknown calculator '${id}'; known: ${calculatorIds().join(', ')}`);
  const raw: Record<string, unknown> = Object.create(null);
  for (const [key, value] of args.inputs) {
    const input = def.inputs.find((i) => i.key === key);
    if (!input) throw new UsageError(`${id} has no input '${key}'; inputs: ${def.inputs.map((i) => i.key).join(', ')}`);
    if (input.kind === 'text' && value.startsWith('@')) {
      const file = value.slice(1);
      let text: string;
      try { text = readFileSync(file, 'utf8'); } catch { throw new InputRangeError(key, value, undefined, '', `cannot read file ${file}`); }
      if (text.length > MAX_FILE) throw new InputRangeError(key, value, undefined, '', 'file too large');
      raw[key] = text;
    } else if (input.kind !== 'choice' && input.kind !== 'text' && isPlainNumber(value)) {
      raw[key] = Number(value);
    } else raw[key] = value;
  }
  const r = evaluate(def, raw, { fillDefaults: false });
  const outputs = Object.fromEntries(def.outputs.filter((o) => r.outputs[o.key] !== undefined).map((o) => [o.key, r.outputs[o.key]]));
  if (args.flags.has('json')) {
    // handoff: strings another calculator takes (e.g. recorded-motion's power profile for warm-up's `profile`)
    out(JSON.stringify({ id, outputs, warnings: r.warnings, inputs: r.values, ...(r.handoff ? { handoff: r.handoff } : {}) }));
    return 0;
  }
  out(`${def.title} (${id})`);
  for (const o of def.outputs) {
    const v = r.outputs[o.key];
    if (v === undefined) continue;
    out(`  ${o.key.padEnd(10)} ${typeof v === 'number' ? String(Number(v.toPrecision(8))) : v}${o.kind !== 'text' && siSymbol(o.kind) ? ` ${siSymbol(o.kind)}` : ''}   ${o.label}`);
  }
  for (const w of r.warnings) out(`  warning: ${w}`);
  return 0;
}
