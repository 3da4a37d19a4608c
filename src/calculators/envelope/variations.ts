/**
 * Which inputs an envelope may vary: number inputs of this calculator that apply under the
 * nominal choices, at most MAX_VARIED of them, each over a range inside the input's allowed range
 * that holds the nominal value. Every refusal is an InputRangeError naming the input.
 */
import { InputRangeError } from '../../core/errors.ts';
import { siSymbol } from '../../core/units/index.ts';
import { isActive, rangeOf } from '../evaluate.ts';
import type { CalculatorDefinition, NumberInput, Values } from '../types.ts';
import { MAX_VARIED } from './points.ts';

/** An input's range in SI. */
export interface Variation {
  readonly lo: number;
  readonly hi: number;
}

export interface CheckedVariation extends Variation {
  readonly key: string;
  readonly def: NumberInput;
}

function inRange(def: NumberInput, x: number): boolean {
  const r = rangeOf(def);
  return Number.isFinite(x) && (r.minExclusive ? x > r.min : x >= r.min) && (r.maxExclusive ? x < r.max : x <= r.max);
}

/** The number input `key` of `calc`, active under `nominal`, or an InputRangeError saying why not. */
export function variableInput(calc: CalculatorDefinition, key: string, nominal: Values): NumberInput {
  const def = calc.inputs.find((d) => d.key === key);
  if (!def) throw new InputRangeError(key, undefined, undefined, '', `${calc.id} has no such input; it cannot be varied`);
  if (def.kind === 'choice' || def.kind === 'text') throw new InputRangeError(key, undefined, undefined, '', `a ${def.kind === 'choice' ? 'choice' : 'text'} input cannot be varied; only numbers can`);
  if (!isActive(def, nominal)) throw new InputRangeError(key, undefined, undefined, '', 'does not apply under the chosen options, so it cannot be varied');
  if (typeof nominal[key] !== 'number') throw new InputRangeError(key, undefined, undefined, '', 'is empty; give it a value before varying it');
  return def;
}

/** Checks every variation against `calc` and the nominal values; returns them in input order. */
export function checkVariations(calc: CalculatorDefinition, nominal: Values, vary: Readonly<Record<string, Variation>>): CheckedVariation[] {
  const keys = Object.keys(vary);
  if (keys.length > MAX_VARIED) {
    throw new InputRangeError(keys[MAX_VARIED]!, undefined, undefined, '', `at most ${MAX_VARIED} inputs can be varied at once (${keys.length} given)`);
  }
  const out: CheckedVariation[] = [];
  for (const key of keys) {
    const def = variableInput(calc, key, nominal);
    const { lo, hi } = vary[key]!;
    const unit = siSymbol(def.kind);
    const x = nominal[key] as number;
    if (!Number.isFinite(lo) || !Number.isFinite(hi) || !(lo < hi)) throw new InputRangeError(key, `${lo}..${hi}`, undefined, unit, 'the low end must be below the high end');
    if (!inRange(def, lo)) throw new InputRangeError(key, lo, rangeOf(def), unit, 'the low end of the tolerance leaves the valid range');
    if (!inRange(def, hi)) throw new InputRangeError(key, hi, rangeOf(def), unit, 'the high end of the tolerance leaves the valid range');
    if (x < lo || x > hi) throw new InputRangeError(key, x, undefined, unit, `the nominal value lies outside its tolerance ${lo}..${hi}`);
    out.push({ key, def, lo, hi });
  }
  // input order, so drivers and corners read the same way as the form
  return calc.inputs.flatMap((d) => out.filter((v) => v.key === d.key));
}
