/**
 * Reading one tolerance box of the widget (pure, no DOM): "±15%" of the field's nominal value, or
 * "lo..hi" in the unit shown beside the field (an end may carry its own unit, "0.9 kN·s/m"), so a
 * range typed in US units converts through the same unit path as the field itself. A unit change
 * of the field converts the numbers of a range by unit factors alone, as the field's number is.
 */
import { parseTolerance, percentEnds, type Variation } from '../../calculators/envelope/index.ts';
import type { NumberInput } from '../../calculators/types.ts';
import { DampbookError } from '../../core/errors.ts';
import { findUnit, fromSI, parseQuantity, toSI } from '../../core/units/index.ts';
import { formatInput } from './format.ts';
import { parseTyped } from './fieldState.ts';

export type ToleranceRead = { ok: true; variation: Variation | undefined } | { ok: false; message: string };

export function endSI(def: NumberInput, text: string, unitId: string): number {
  const n = parseTyped(text);
  if (Number.isFinite(n)) return toSI(n, findUnit(def.kind, unitId));
  return parseQuantity(text, def.kind); // a unit typed with the end ("0.9 kN·s/m")
}

/** The SI range a tolerance box asks for; empty text means "not varied". */
export function readTolerance(def: NumberInput, text: string, unitId: string, nominal: number): ToleranceRead {
  if (text.trim() === '') return { ok: true, variation: undefined };
  try {
    const t = parseTolerance(def.key, text);
    if (t.type === 'percent') return { ok: true, variation: percentEnds(def.key, nominal, t.percent) };
    const lo = endSI(def, t.lo, unitId);
    const hi = endSI(def, t.hi, unitId);
    if (!Number.isFinite(lo) || !Number.isFinite(hi)) return { ok: false, message: 'Both ends must be numbers.' };
    return { ok: true, variation: { lo, hi } };
  } catch (e) {
    return { ok: false, message: e instanceof DampbookError || e instanceof Error ? toleranceReason(e.message) : 'Not a tolerance.' };
  }
}

/** The reason of an "input 'c' = … (reason)" message, for a note under the box. */
export function toleranceReason(msg: string): string {
  const m = /\(([^)]*)\)/.exec(msg);
  return `${(m ? m[1]! : msg).replace(/^./, (c) => c.toUpperCase())}.`;
}

/** A range's plain numbers re-expressed after the field's unit changed (`±%` and typed units stay). */
export function convertTolerance(def: NumberInput, text: string, fromId: string, toId: string): string {
  if (fromId === toId) return text;
  const dots = text.indexOf('..');
  if (dots <= 0) return text;
  const ends = [text.slice(0, dots), text.slice(dots + 2)];
  if (!ends.every((e) => Number.isFinite(parseTyped(e)))) return text;
  const from = findUnit(def.kind, fromId);
  const to = findUnit(def.kind, toId);
  return ends.map((e) => formatInput(fromSI(toSI(parseTyped(e), from), to))).join('..');
}
