/**
 * Validation and evaluation shared by the widget, the CLI, the record import and the tests.
 * Untrusted values come in (strings, numbers, anything); either SI outputs come out, all finite,
 * or an InputRangeError naming the input.
 */
import { ComputationError, InputRangeError, type Range } from '../core/errors.ts';
import { parseQuantity, siSymbol, UnitError } from '../core/units/index.ts';
import type { CalculatorDefinition, InputDef, Result, Values } from './types.ts';

/** Longest text accepted for a number ("1.5e3 lbf·s/in" fits many times over); longer is refused unparsed. */
export const MAX_NUMBER_TEXT = 100;

/** A short, safe description of an untrusted value for a message (never calls its toString). */
function shown(v: unknown): string | number {
  if (typeof v === 'string' || typeof v === 'number') return v;
  if (v === null) return 'null';
  return Array.isArray(v) ? 'array' : typeof v;
}

export interface EvaluateOptions {
  /** Fill missing non-required inputs with their defaults (the page does; the CLI does for non-required). */
  readonly fillDefaults?: boolean;
}

export function rangeOf(def: Extract<InputDef, { min: number }>): Range {
  return { min: def.min, max: def.max, minExclusive: def.minExclusive, maxExclusive: def.maxExclusive };
}

function holds(cond: { readonly key: string; readonly is: readonly string[] } | undefined, values: Values): boolean {
  if (!cond) return true;
  const v = values[cond.key];
  return typeof v === 'string' && cond.is.includes(v);
}

/** True when an input applies under the current choices (its `when` and `alsoWhen` both hold). */
export function isActive(def: InputDef, values: Values): boolean {
  return holds(def.when, values) && holds(def.alsoWhen, values);
}

/**
 * Checks one raw value (SI number, string such as "25 lb", or anything untrusted) against its
 * definition and returns the typed SI value. `values` holds the choices already read (for `when`).
 * Returns undefined for an inactive or empty optional input.
 */
export function checkInput(def: InputDef, v: unknown, values: Values, fill: boolean): number | string | undefined {
  if (def.kind === 'choice') {
    const allowed = def.options.map((o) => o.value).join(', ');
    if (v === undefined || v === '') {
      if (def.required && !fill) throw new InputRangeError(def.key, undefined, undefined, '', `choose one of ${allowed}`);
      v = def.default;
    }
    // a choice whose options are numerals ('0'/'1') also takes the number (records and cases from before it was a choice)
    if (typeof v === 'number' && def.options.some((o) => o.value === String(v))) v = String(v);
    if (typeof v !== 'string' || !def.options.some((o) => o.value === v)) throw new InputRangeError(def.key, shown(v), undefined, '', `choose one of ${allowed}`);
    return v;
  }
  if (!isActive(def, values)) return undefined;
  if (def.kind === 'text') {
    if (v === undefined || v === null) {
      if (def.required && !fill) throw new InputRangeError(def.key, undefined, undefined, '', 'required');
      v = def.default;
    }
    if (typeof v !== 'string') throw new InputRangeError(def.key, shown(v), undefined, '', 'must be text');
    if (v.length > def.maxLength) throw new InputRangeError(def.key, `${v.length} characters`, undefined, '', `longer than ${def.maxLength} characters`);
    return v;
  }
  const unit = siSymbol(def.kind);
  const r = rangeOf(def);
  if (v === undefined || v === null || (typeof v === 'string' && v.trim() === '')) {
    if (def.optional) return undefined;
    if (def.required && !fill) throw new InputRangeError(def.key, undefined, r, unit, 'required');
    v = def.default;
  }
  let n: number;
  if (typeof v === 'number') n = v;
  else if (typeof v === 'string') {
    if (v.length > MAX_NUMBER_TEXT) throw new InputRangeError(def.key, `${v.length} characters`, r, unit, 'too long for a number');
    try {
      n = parseQuantity(v, def.kind);
    } catch (e) {
      if (e instanceof UnitError) throw new InputRangeError(def.key, v, r, unit, e.message);
      throw e;
    }
  } else throw new InputRangeError(def.key, shown(v), r, unit, 'not a number');
  if (!Number.isFinite(n)) throw new InputRangeError(def.key, n, r, unit, 'not a finite number');
  const low = r.minExclusive ? n <= r.min : n < r.min;
  const high = r.maxExclusive ? n >= r.max : n > r.max;
  if (low || high) throw new InputRangeError(def.key, n, r, unit);
  return n;
}

/** Choices first: the `when` clauses of other inputs depend on them. */
export function inputOrder(calc: CalculatorDefinition): InputDef[] {
  return [...calc.inputs].sort((a, b) => Number(a.kind !== 'choice') - Number(b.kind !== 'choice'));
}

/** Converts and checks raw values (SI numbers or strings such as "25 lb") into typed SI values. */
export function validateInputs(calc: CalculatorDefinition, raw: Readonly<Record<string, unknown>>, opts: EvaluateOptions = {}): Values {
  const fill = opts.fillDefaults ?? true;
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) {
    throw new ComputationError(`${calc.id}: inputs must be a record of key → value, not ${shown(raw)}`);
  }
  const values: Record<string, number | string | undefined> = {};
  for (const def of inputOrder(calc)) {
    const has = Object.prototype.hasOwnProperty.call(raw, def.key);
    const v = checkInput(def, has ? raw[def.key] : undefined, values, fill);
    if (v !== undefined) values[def.key] = v;
  }
  return values;
}

/**
 * Validates, computes and checks the outputs: every numeric output is finite. A non-finite
 * output is a bug or an unguarded corner, so it fails loudly rather than reaching a page.
 */
export function evaluate(calc: CalculatorDefinition, raw: Readonly<Record<string, unknown>>, opts: EvaluateOptions = {}): Result & { values: Values } {
  const values = validateInputs(calc, raw, opts);
  let result: Result;
  try {
    result = calc.compute(values);
  } catch (e) {
    // The core names its own parameters (e.g. 'zeta'); when that is not one of this calculator's
    // inputs, the inputs were each valid but their combination has no answer.
    if (e instanceof InputRangeError && !calc.inputs.some((d) => d.key === e.input)) {
      throw new ComputationError(`${calc.id}: no answer for these inputs (intermediate ${e.message})`);
    }
    throw e;
  }
  for (const def of calc.outputs) {
    const v = result.outputs[def.key];
    if (v === undefined) {
      if (!def.optional) throw new ComputationError(`${calc.id}: output '${def.key}' is missing`);
      continue;
    }
    if (typeof v === 'number' && !Number.isFinite(v)) {
      throw new ComputationError(`${calc.id}: output '${def.key}' is not finite for these inputs`);
    }
  }
  checkHandoff(calc, result);
  return { ...result, values };
}

/** Hand-off strings: declared keys only, text, within the declared length. */
function checkHandoff(calc: CalculatorDefinition, result: Result): void {
  if (result.handoff === undefined) return;
  for (const [key, v] of Object.entries(result.handoff)) {
    const def = calc.handoffs?.find((h) => h.key === key);
    if (!def) throw new ComputationError(`${calc.id}: hand-off '${key}' is not declared`);
    if (typeof v !== 'string' || v.length > def.maxLength) throw new ComputationError(`${calc.id}: hand-off '${key}' is not text of at most ${def.maxLength} characters`);
  }
}

/** Default values of every input (SI), as the page pre-fills them. */
export function defaults(calc: CalculatorDefinition): Values {
  // An optional number input starts empty (compute sees undefined), as the CLI leaves it.
  return Object.fromEntries(calc.inputs.map((d) => [d.key, d.kind !== 'choice' && d.kind !== 'text' && d.optional ? undefined : d.default]));
}
