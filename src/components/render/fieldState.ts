/**
 * Reading and checking one field of the widget, in the reader's units. Pure (no DOM): the
 * element passes the field's text and unit id, and gets an SI value or a message for the field.
 */
import { checkInput, MAX_NUMBER_TEXT, rangeOf } from '../../calculators/evaluate.ts';
import type { InputDef, NumberInput, Values } from '../../calculators/types.ts';
import type { QuantityKind } from '../../core/units/index.ts';
import { InputRangeError } from '../../core/errors.ts';
import { DECIMAL_COMMA, hasDecimalComma, isPlainNumber } from '../../core/numeric/plainNumber.ts';

export { DECIMAL_COMMA, hasDecimalComma };
import { findUnit, fromSI, splitQuantity, toSI } from '../../core/units/index.ts';
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

/**
 * Parses a typed number. A decimal point only, as the command line reads numbers: "1,5" is refused
 * (in many locales it means 1.5, in others 15 — a handbook must not guess; see DECIMAL_COMMA).
 */
export function parseTyped(text: string): number {
  const t = text.trim().replace(/\s+/g, '');
  return isPlainNumber(t) ? Number(t) : NaN;
}

/**
 * A number typed with its unit ("22 kN/m", "250 N/mm", "980 N.s/m"): the number as typed and the
 * unit's id, or undefined when the text is not a number followed by a unit of this kind. A bare
 * number gives unit ''.
 */
export function splitTyped(text: string, kind?: QuantityKind): { number: string; unit: string } | undefined {
  const q = splitQuantity(text);
  if (!q) return undefined;
  if (q.unit === '') return { number: q.number, unit: '' };
  if (!kind) return undefined;
  try { return { number: q.number, unit: findUnit(kind, q.unit).id }; } catch { return undefined; }
}

/** A short, printable excerpt of untrusted text for a message. */
export function clip(text: string, n = 40): string {
  // eslint-disable-next-line no-control-regex -- control characters are what we remove
  const t = text.replace(/[\u0000-\u001f\u007f-\u009f]/g, ' ');
  return t.length > n ? `${t.slice(0, n)}…` : t;
}

/** FNV-1a (32 bit) of a text's UTF-16 code units, 8 hex digits: marks a text a link cannot carry. */
export function textSum(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) { h ^= text.charCodeAt(i); h = Math.imul(h, 0x01000193) >>> 0; }
  return h.toString(16).padStart(8, '0');
}

export function readField(def: InputDef, text: string, unitId: string | undefined, values: Values): FieldRead {
  try {
    if (def.kind === 'choice' || def.kind === 'text') return { ok: true, value: checkInput(def, text, values, true) };
    if (text.trim() === '') {
      if (def.optional) return { ok: true, value: undefined };
      return { ok: false, message: `Enter a value: ${describeRange(def, unitId ?? '')}.` };
    }
    if (text.length > MAX_NUMBER_TEXT) return { ok: false, message: `Too long for a number (${text.length} characters). Type digits, e.g. 12.5 or 1.2e3.` };
    let n = parseTyped(text);
    let unit = findUnit(def.kind, unitId ?? '');
    if (!Number.isFinite(n)) {
      if (hasDecimalComma(text)) return { ok: false, message: DECIMAL_COMMA };
      // a number typed with its own unit ("22 kN/m") is read in that unit
      const typed = splitTyped(text, def.kind);
      if (!typed || typed.unit === '') return { ok: false, message: `Not a number. Type digits, e.g. 12.5 or 1.2e3, or a number with a unit of this field (${unit.symbol || 'no unit'}).` };
      n = Number(typed.number);
      unit = findUnit(def.kind, typed.unit);
    }
    const si = toSI(n, unit);
    return { ok: true, value: checkInput(def, si, values, true) };
  } catch (e) {
    if (e instanceof InputRangeError && def.kind !== 'choice' && def.kind !== 'text') return { ok: false, message: `Out of range: ${describeRange(def, unitId ?? '')}.` };
    if (e instanceof Error) return { ok: false, message: e.message };
    return { ok: false, message: 'Invalid value.' };
  }
}
