import { siSymbol } from '../../core/units/index.ts';
import { UsageError, type ParsedArgs } from '../args.ts';
import { evaluateInputs, readInputs, summariseText, textLabel } from '../inputs.ts';
import { requireCalculator } from '../lookup.ts';
import { recordCheck } from './recordCheck.ts';
import { envelopeJson, envelopeLines, varyEnvelope } from '../vary.ts';

/**
 * `dampbook calc <id> --in key=value … [--json]`: SI values (or "25 lb"); a missing required or
 * invalid input exits non-zero naming the input and its allowed range.
 */
export function calc(args: ParsedArgs, out: (s: string) => void, err: (s: string) => void = () => {}): number {
  if (args.flags.has('record')) {
    if (args.inputs.length) throw new UsageError('--in is not read with --record (the record holds the inputs)');
    if (args.vary.length) throw new UsageError('--vary is not read with --record');
    return recordCheck(args, out);
  }
  const def = requireCalculator('calc', args.positionals[1]);
  const id = def.id;
  const read = readInputs(def, args.inputs);
  for (const n of read.notes) err(`dampbook: note: ${n}`);
  const r = evaluateInputs(def, read);
  // --vary: the tolerance envelope around these (nominal) values, see src/cli/vary.ts
  const env = args.vary.length ? varyEnvelope(def, args.vary, r.values) : undefined;
  const outputs = Object.fromEntries(def.outputs.filter((o) => r.outputs[o.key] !== undefined).map((o) => [o.key, r.outputs[o.key]]));
  if (args.flags.has('json')) {
    // handoff: strings another calculator takes (e.g. recorded-motion's power profile for warm-up's `profile`)
    // text inputs are summarised (file, characters, rows, checksum), never echoed back
    const inputs = Object.fromEntries(Object.entries(r.values).map(([k, v]) => {
      const t = read.texts.find((x) => x.key === k) ?? (typeof v === 'string' && def.inputs.find((d) => d.key === k)?.kind === 'text' ? summariseText(k, v) : undefined);
      return [k, t ? textLabel(t) : v];
    }));
    out(JSON.stringify({ id, outputs, warnings: r.warnings, inputs, ...(read.texts.length ? { texts: read.texts } : {}), ...(r.handoff ? { handoff: r.handoff } : {}), ...(env ? envelopeJson(env) : {}) }));
    return 0;
  }
  out(`${def.title} (${id})`);
  for (const o of def.outputs) {
    const v = r.outputs[o.key];
    if (v === undefined) continue;
    out(`  ${o.key.padEnd(10)} ${typeof v === 'number' ? String(Number(v.toPrecision(8))) : v}${o.kind !== 'text' && siSymbol(o.kind) ? ` ${siSymbol(o.kind)}` : ''}   ${o.label}`);
  }
  for (const w of r.warnings) out(`  warning: ${w}`);
  if (env) for (const l of envelopeLines(def, env, r.outputs)) out(l);
  return 0;
}
