/**
 * Number and unit formatting at the interface edge, shared by the server render and the
 * client element so both show exactly the same text.
 */
import { renderQuantities } from '../../calculators/quantityText.ts';
import { findUnit, fromSI, preferredUnit, siUnit, type QuantityKind, type UnitDef, type UnitSystem } from '../../core/units/index.ts';

/** Formats a number to `digits` significant figures; exponent notation outside [1e-4, 1e7). */
export function formatNumber(x: number, digits = 4): string {
  if (!Number.isFinite(x)) return '—';
  if (x === 0) return '0';
  const a = Math.abs(x);
  if (a >= 1e7 || a < 1e-4) {
    // 1.50000e-6 → 1.5e-6: trailing zeros of the mantissa carry no information
    const [mant, exp] = x.toExponential(Math.max(digits - 1, 0)).split('e');
    const m = mant!.includes('.') ? mant!.replace(/\.?0+$/, '') : mant!;
    return `${m}e${exp!.replace('+', '')}`;
  }
  const s = x.toPrecision(digits);
  return s.includes('e') ? String(Number(s)) : s.includes('.') ? s.replace(/\.?0+$/, '') : s;
}

/** Formats an input's value for its text field: enough digits to round-trip a typed value. */
export function formatInput(x: number): string {
  return String(Number(x.toPrecision(10)));
}

/** The unit a kind is shown in for a unit system ('' for dimensionless). */
export function displayUnit(kind: QuantityKind, system: UnitSystem): UnitDef {
  return kind === 'dimensionless' || kind === 'fraction' ? siUnit(kind) : preferredUnit(kind, system);
}

/** Converts an SI value for display. */
export function toDisplay(si: number, unit: UnitDef): number {
  return fromSI(si, unit);
}

export function unitById(kind: QuantityKind, id: string): UnitDef {
  return findUnit(kind, id);
}

/** Escapes text for HTML (server-built strings only; the client uses textContent). */
export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/**
 * A value as JSON for a page's data block (`<script type="application/json">`): `<` is escaped so
 * no text inside can close the block early; JSON.parse reads `\u003c` back as `<`.
 */
export function scriptJson(value: unknown): string {
  return JSON.stringify(value).replace(/</g, '\\u003c');
}

/** A calculator's sentence (chart summary) with its quantities in the reader's unit system. */
export function quantityText(text: string, system: UnitSystem): string {
  return renderQuantities(text, (v, kind, digits) => {
    const u = displayUnit(kind, system);
    const n = formatNumber(fromSI(v, u), digits);
    return u.symbol ? `${n} ${u.symbol}` : n;
  });
}
