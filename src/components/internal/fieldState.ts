/**
 * Reading and checking one field of the widget, in the reader's units. Pure (no DOM): the
 * element passes the field's text and unit id, and gets an SI value or a message for the field.
 */
import { checkInput, MAX_NUMBER_TEXT, rangeOf, siOnly } from '../../calculators/evaluate.ts';
import type { InputDef, NumberInput, Values } from '../../calculators/types.ts';
import { InputRangeError } from '../../core/errors.ts';
import { isPlainNumber } from '../../core/numeric/plainNumber.ts';
import { findUnit, fromSI, toSI } from '../../core/units/index.ts';
import { formatNumber } from './format.ts';

export type FieldRead = { ok: true; value: number | string | undefined } | { ok: false; message: string };

/** "greater than 0 kg and at most 1e7 kg" in the field's own unit. */
export function describeRange(def: NumberInput, unitId: string): string {
  const u = findUnit(def.kind, unitId);
  const r = rangeOf(def);
  const lo = fromSI(r.min, u);
  const hi = fromSI(r.max, u);
  const sym = u.symbol ? ` ${u.symbol}` : '';
  const parts: string[] = [];
  if (Number.isFinite(lo)) parts.push(`${r.minExclusive ? 'greater than' : 'at least'} ${formatNumber(lo, 6)}${sym}`);
  if (Number.isFinite(hi)) parts.push(`${r.maxExclusive ? 'less than' : 'at most'} ${formatNumber(hi, 6)}${sym}`);
  return parts.join(' and ');
}

/** Parses a typed number: accepts a decimal comma when there is no decimal point. */
export function parseTyped(text: string): number {
  const t = text.trim().replace(/\s+/g, '');
  const normal = !t.includes('.') && /^[-+]?\d+,\d+(e[-+]?\d+)?$/i.test(t) ? t.replace(',', '.') : t;
  return isPlainNumber(normal) ? Number(normal) : NaN;
}

export function readField(def: InputDef, text: string, unitId: string | undefined, values: Values): FieldRead {
  try {
    if (def.kind === 'choice' || def.kind === 'text') return { ok: true, value: checkInput(def, text, values, true) };
    if (text.trim() === '') {
      if (def.optional) return { ok: true, value: undefined };
      return { ok: false, message: `Enter a value: ${describeRange(def, unitId ?? '')}.` };
    }
    if (text.length > MAX_NUMBER_TEXT) return { ok: false, message: `Too long for a number (${text.length} characters). Type digits, e.g. 12.5 or 1.2e3.` };
    const n = parseTyped(text);
    if (!Number.isFinite(n)) return { ok: false, message: 'Not a number. Type digits, e.g. 12.5 or 1.2e3.' };
    const unit = findUnit(def.kind, unitId ?? '');
    if (siOnly(def, values) && def.siOnlyWhen && unit.factor !== 1) {
      return { ok: false, message: `Choose the SI unit for this field: ${def.siOnlyWhen.why}` };
    }
    const si = toSI(n, unit);
    return { ok: true, value: checkInput(def, si, values, true) };
  } catch (e) {
    if (e instanceof InputRangeError && def.kind !== 'choice' && def.kind !== 'text') return { ok: false, message: `Out of range: ${describeRange(def, unitId ?? '')}.` };
    if (e instanceof Error) return { ok: false, message: e.message };
    return { ok: false, message: 'Invalid value.' };
  }
}
