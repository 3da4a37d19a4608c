import { calculators } from '../../calculators/registry.ts';
import { siSymbol } from '../../core/units/index.ts';
import type { ParsedArgs } from '../args.ts';

/** `dampbook list [--json]`: every calculator with its inputs and outputs (key, kind, SI unit). */
export function list(args: ParsedArgs, out: (s: string) => void): number {
  const data = calculators.map((c) => ({
    id: c.id,
    title: c.title,
    inputs: c.inputs.map((i) => ({
      key: i.key, kind: i.kind, unit: i.kind === 'choice' || i.kind === 'text' ? null : siSymbol(i.kind), label: i.label,
      ...(i.kind === 'choice' ? { options: i.options.map((o) => o.value) } : {}),
      ...('min' in i ? { min: i.min, max: i.max } : {}),
      default: i.default, required: Boolean(i.required), optional: 'optional' in i ? Boolean(i.optional) : false,
    })),
    outputs: c.outputs.map((o) => ({ key: o.key, kind: o.kind, unit: o.kind === 'text' ? null : siSymbol(o.kind), label: o.label, optional: Boolean(o.optional) })),
  }));
  if (args.flags.has('json')) { for (const l of JSON.stringify(data, null, 2).split('\n')) out(l); return 0; }
  for (const c of data) {
    out(`${c.id} — ${c.title}`);
    out(`  in:  ${c.inputs.map((i) => `${i.key}${i.unit ? ` [${i.unit}]` : i.kind === 'choice' ? ` (${(i.options ?? []).join('|')})` : ''}`).join(', ')}`);
    out(`  out: ${c.outputs.map((o) => `${o.key}${o.unit ? ` [${o.unit}]` : ''}`).join(', ')}`);
  }
  return 0;
}
