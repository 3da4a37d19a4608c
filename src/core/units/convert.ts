/**
 * Conversion at the edges: the interface and the CLI call these; the core only sees SI.
 */
import { DampbookError } from '../errors.ts';
import { DECIMAL_COMMA, hasDecimalComma } from '../numeric/plainNumber.ts';
import { QUANTITY_KINDS, SI_SYMBOL, type QuantityKind } from './kinds.ts';
import { PREFERRED, UNITS, type UnitDef, type UnitSystem } from './table.ts';
import { validateUnitTable } from './validate.ts';

validateUnitTable(UNITS, QUANTITY_KINDS);

const BY_KIND = new Map<QuantityKind, UnitDef[]>();
for (const u of UNITS) {
  const list = BY_KIND.get(u.kind) ?? [];
  list.push(u);
  BY_KIND.set(u.kind, list);
}

/** An unknown unit, or a unit of the wrong kind for the quantity. */
export class UnitError extends DampbookError {
  override name = 'UnitError';
}

/** Every unit of a kind, SI unit first. */
export function unitsOf(kind: QuantityKind): readonly UnitDef[] {
  return BY_KIND.get(kind) ?? [];
}

/** Looks up a unit of `kind` by id or display symbol ("lbf.s/in" or "lbf·s/in"). */
export function findUnit(kind: QuantityKind, idOrSymbol: string): UnitDef {
  const want = idOrSymbol.trim();
  const list = unitsOf(kind);
  const hit = list.find((u) => u.id === want) ?? list.find((u) => u.symbol === want)
    ?? list.find((u) => u.id.toLowerCase() === want.toLowerCase());
  if (!hit) {
    const known = list.map((u) => u.id).join(', ');
    throw new UnitError(`unit '${want}' is not a unit of ${kind}; known: ${known || 'none'}`);
  }
  return hit;
}

/** The SI unit of a kind (factor 1, offset 0). */
export function siUnit(kind: QuantityKind): UnitDef {
  const u = unitsOf(kind).find((d) => d.factor === 1 && !d.offset);
  if (!u) throw new UnitError(`no SI unit for ${kind}`);
  return u;
}

/** The unit a system shows a kind in by default. */
export function preferredUnit(kind: QuantityKind, system: UnitSystem): UnitDef {
  const pick = PREFERRED[kind]?.[system];
  if (pick) return findUnit(kind, pick);
  const list = unitsOf(kind);
  return list.find((u) => u.system === system) ?? list.find((u) => u.system === 'both') ?? siUnit(kind);
}

/** value in `unit` → SI. */
export function toSI(value: number, unit: UnitDef): number {
  return value * unit.factor + (unit.offset ?? 0);
}

/** SI → value in `unit`. */
export function fromSI(value: number, unit: UnitDef): number {
  return (value - (unit.offset ?? 0)) / unit.factor;
}

/** Display symbol of the SI unit of a kind. */
export function siSymbol(kind: QuantityKind): string {
  return SI_SYMBOL[kind];
}

/**
 * Splits "25 lb", "25lb" or "1.5e3" into the number as written and the unit text ('' when none),
 * or undefined when the text does not start with a number. One reader for every "number with a
 * unit" text (CLI, address, typed fields).
 */
export function splitQuantity(text: string): { readonly number: string; readonly unit: string } | undefined {
  const m = /^\s*([-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][-+]?\d+)?)\s*(.*?)\s*$/.exec(text);
  return m ? { number: m[1]!, unit: m[2] ?? '' } : undefined;
}

/**
 * Parses "25 lb", "25lb", "1.5e3" (SI assumed) into an SI number for `kind`.
 * Returns NaN-free results or throws UnitError.
 */
export function parseQuantity(text: string, kind: QuantityKind): number {
  // the same rule as the page's fields: a decimal comma is refused with one message, not read as a unit
  if (hasDecimalComma(text)) throw new UnitError(DECIMAL_COMMA);
  const q = splitQuantity(text);
  if (!q) throw new UnitError(`'${text.slice(0, 40)}' is not a number with an optional unit`);
  const value = Number(q.number);
  return q.unit === '' ? value : toSI(value, findUnit(kind, q.unit));
}
