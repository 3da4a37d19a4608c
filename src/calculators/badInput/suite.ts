/**
 * The bad-input rules as a function any calculator can be run through without a test runner:
 * `dampbook check --content` runs a team's own calculators through it (the built-ins run the
 * fuller fast-check version in test/calculators/hostile.test.ts, which shares the values). Each
 * call must return finite outputs or throw a typed DampbookError; an InputRangeError must name
 * one of the calculator's inputs. The random cases come from a fixed seed, so a failure repeats.
 */
import { DampbookError, InputRangeError } from '../../core/errors.ts';
import { evaluate } from '../evaluate.ts';
import type { CalculatorDefinition, InputDef, Result } from '../types.ts';
import { describeValue, HOSTILE_TEXT, HOSTILE_VALUES, sampleNumber } from './values.ts';

/** mulberry32: a small, well-mixed 32-bit generator; the seed fixes every case. */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function validValue(def: InputDef, r: () => number): number | string {
  if (def.kind === 'choice') return def.options[Math.floor(r() * def.options.length)]!.value;
  if (def.kind === 'text') return def.default;
  return sampleNumber(def, r(), r());
}

/** The first problem of one call, or undefined when it behaved. */
function problem(calc: CalculatorDefinition, raw: unknown, fillDefaults: boolean, what: string): string | undefined {
  let r: Result;
  try {
    r = evaluate(calc, raw as Record<string, unknown>, { fillDefaults });
  } catch (e) {
    if (!(e instanceof DampbookError)) return `${what}: threw ${e instanceof Error ? `${e.name}: ${e.message}` : String(e)}, not a typed error`;
    if (e instanceof InputRangeError && !calc.inputs.some((d) => d.key === e.input)) return `${what}: the error names '${e.input}', which is not an input`;
    return undefined;
  }
  for (const o of calc.outputs) {
    const v = r.outputs[o.key];
    if (v === undefined) { if (!o.optional) return `${what}: output '${o.key}' is missing`; continue; }
    if (o.kind === 'text' ? typeof v !== 'string' : !(typeof v === 'number' && Number.isFinite(v))) return `${what}: output '${o.key}' = ${String(v)}`;
    if (typeof v === 'string' && /NaN|Infinity|undefined/.test(v)) return `${what}: output '${o.key}' says ${v.slice(0, 40)}`;
  }
  for (const w of r.warnings) if (/NaN|Infinity|undefined/.test(w)) return `${what}: a warning says ${w.slice(0, 60)}`;
  return undefined;
}

/** Runs the rules; returns one line per problem (empty: the calculator passes). */
export function badInputProblems(calc: CalculatorDefinition, options: { seed?: number; runs?: number } = {}): string[] {
  const r = random(options.seed ?? 1);
  const found: string[] = [];
  const note = (p: string | undefined) => { if (p !== undefined && found.length < 10) found.push(p); };
  const defaults = () => Object.fromEntries(calc.inputs.map((d) => [d.key, d.default]));
  for (let i = 0; i < (options.runs ?? 150); i++) {
    const raw = Object.fromEntries(calc.inputs.map((d) => [d.key, validValue(d, r)]));
    note(problem(calc, raw, false, `random valid inputs ${JSON.stringify(raw)}`));
  }
  for (const def of calc.inputs) {
    for (const bad of HOSTILE_VALUES) note(problem(calc, { ...defaults(), [def.key]: bad }, true, `${def.key} = ${describeValue(bad)}`));
    if (def.kind === 'text') for (const t of HOSTILE_TEXT) note(problem(calc, { ...defaults(), [def.key]: t, ...(def.when ? { [def.when.key]: def.when.is[0] } : {}) }, true, `${def.key} = text ${describeValue(t)}`));
  }
  note(problem(calc, {}, false, 'no inputs, no defaults'));
  note(problem(calc, JSON.parse('{"__proto__": {"x": 1}}'), true, 'a prototype-polluting key'));
  try {
    evaluate(calc, {}, { fillDefaults: true });
  } catch (e) {
    found.push(`the defaults do not compute: ${e instanceof Error ? e.message : String(e)}`);
  }
  for (const raw of [null, 42, 'm=1', [1, 2]]) {
    try { evaluate(calc, raw as never, { fillDefaults: true }); found.push(`a record that is not an object (${describeValue(raw)}) was accepted`); } catch (e) {
      if (!(e instanceof DampbookError)) found.push(`a record that is not an object (${describeValue(raw)}) threw an untyped error`);
    }
  }
  return found;
}
