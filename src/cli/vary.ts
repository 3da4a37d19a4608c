/**
 * `--vary key=±15%` / `--vary key=lo..hi` for `dampbook calc`: reads each tolerance (a ± % of the
 * nominal SI value, or two ends read as `--in` reads a number: plain = SI, "0.9 kN·s/m" in its
 * unit), runs the envelope and formats it for JSON (`bounds`, SI) and for the text table.
 */
import { envelope, MAX_VARIED, parseTolerance, percentEnds, type EnvelopeResult, type Variation } from '../calculators/envelope/index.ts';
import { variableInput } from '../calculators/envelope/variations.ts';
import type { CalculatorDefinition, Outputs, Values } from '../calculators/types.ts';
import { InputRangeError } from '../core/errors.ts';
import { isPlainNumber } from '../core/numeric/plainNumber.ts';
import { parseQuantity, siSymbol, UnitError } from '../core/units/index.ts';
import { UsageError } from './args.ts';

function end(calc: CalculatorDefinition, key: string, text: string, nominal: Values): number {
  const def = variableInput(calc, key, nominal);
  if (isPlainNumber(text)) return Number(text);
  try {
    return parseQuantity(text, def.kind);
  } catch (e) {
    if (e instanceof UnitError) throw new InputRangeError(key, text, undefined, siSymbol(def.kind), `tolerance end: ${e.message}`);
    throw e;
  }
}

/** The SI ranges of `--vary` pairs around the nominal values (each key once). */
export function readVariations(calc: CalculatorDefinition, pairs: readonly (readonly [string, string])[], nominal: Values): Record<string, Variation> {
  const out: Record<string, Variation> = Object.create(null);
  if (pairs.length > MAX_VARIED) throw new InputRangeError(pairs[MAX_VARIED]![0], undefined, undefined, '', `at most ${MAX_VARIED} inputs can be varied at once (${pairs.length} given)`);
  for (const [key, text] of pairs) {
    if (Object.hasOwn(out, key)) throw new UsageError(`--vary ${key} is given twice`);
    variableInput(calc, key, nominal);
    const t = parseTolerance(key, text);
    out[key] = t.type === 'percent' ? percentEnds(key, nominal[key] as number, t.percent) : { lo: end(calc, key, t.lo, nominal), hi: end(calc, key, t.hi, nominal) };
  }
  return out;
}

export function varyEnvelope(calc: CalculatorDefinition, pairs: readonly (readonly [string, string])[], nominal: Values): EnvelopeResult {
  return envelope(calc, nominal, readVariations(calc, pairs, nominal));
}

/** JSON parts: `bounds` (the contract: output → {min, max}, SI) and `envelope` (method, ranges, drivers, failures). */
export function envelopeJson(e: EnvelopeResult): { bounds: Record<string, { min: number; max: number }>; envelope: unknown } {
  const bounds = Object.fromEntries(Object.entries(e.bounds).map(([k, b]) => [k, { min: b.min, max: b.max }]));
  return {
    bounds,
    envelope: {
      method: e.method,
      varied: Object.fromEntries(e.varied.map((v) => [v.key, { lo: v.lo, hi: v.hi }])),
      drivers: Object.fromEntries(Object.entries(e.bounds).map(([k, b]) => [k, { min: b.minDrivers, max: b.maxDrivers }])),
      failed: e.failed,
      failures: e.failures,
    },
  };
}

const n8 = (x: number) => String(Number(x.toPrecision(8)));

function driverText(d: Readonly<Record<string, string>>): string {
  const parts = Object.entries(d).map(([k, v]) => `${k} ${v}`);
  return parts.length ? parts.join(', ') : 'none (constant)';
}

/** The envelope as text lines: method, ranges, then one row per output (SI). */
export function envelopeLines(calc: CalculatorDefinition, e: EnvelopeResult, outputs: Outputs): string[] {
  const lines = [`  envelope: ${e.method}`];
  for (const v of e.varied) lines.push(`    ${v.key} from ${n8(v.lo)} to ${n8(v.hi)}${siSymbol(v.def.kind) ? ` ${siSymbol(v.def.kind)}` : ''}`);
  lines.push(`  ${'output'.padEnd(10)} ${'nominal'.padEnd(14)} ${'min'.padEnd(14)} ${'max'.padEnd(14)} ${'unit'.padEnd(8)} drivers at min / at max`);
  for (const o of calc.outputs) {
    const b = e.bounds[o.key];
    const v = outputs[o.key];
    if (!b || o.kind === 'text') continue;
    lines.push(`  ${o.key.padEnd(10)} ${(typeof v === 'number' ? n8(v) : '—').padEnd(14)} ${n8(b.min).padEnd(14)} ${n8(b.max).padEnd(14)} ${siSymbol(o.kind).padEnd(8)} ${driverText(b.minDrivers)} / ${driverText(b.maxDrivers)}`);
  }
  if (e.failed) lines.push(`  warning: ${e.failed} envelope point(s) could not be computed; first: ${e.failures[0]?.message ?? ''}`);
  return lines;
}
