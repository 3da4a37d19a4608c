/**
 * Writing a record from a computed result, and replaying one: converts the recorded inputs to
 * SI, recomputes through the same evaluate() as the page and the CLI, and compares every
 * recorded output. Differences in page revision or core version become warnings.
 */
import { LEGACY_LAW_KEYS, migrateLawKeys } from '../calculators/shared/damperLawMigrate.ts';
import { changeLines } from '../calculators/changes.ts';
import { evaluate } from '../calculators/evaluate.ts';
import { isNumeralChoice, migrateYesNoNumbers } from '../calculators/shared/yesNoNumbers.ts';
import type { CalculatorDefinition, Outputs, Values } from '../calculators/types.ts';
import { DampbookError } from '../core/errors.ts';
import { relativeDifference, withinTolerance } from '../core/numeric/index.ts';
import { findUnit, fromSI, siUnit, toSI } from '../core/units/index.ts';
import { RECORD_FORMAT, type CalcRecord, type Quantity } from './record.ts';

/**
 * An output is reproduced when it differs by at most this relative amount, or by at most
 * REPRODUCE_FLOOR absolute (SI): round-off residuals such as an energy-audit closure of 1e-13
 * change by their own size when an input moves by one unit in the last place.
 */
export const REPRODUCE_TOLERANCE = 1e-9;
export const REPRODUCE_FLOOR = 1e-12;

export interface RecordContext {
  readonly page?: { readonly id: string; readonly revision: string } | undefined;
  readonly coreVersion: string;
  readonly contentHash?: string | undefined;
}

/** A number input as the reader typed it: the number in the field and the field's unit id. */
export interface Shown { readonly value: number; readonly unit: string }

/**
 * A record of `values` (SI). Number inputs are written as `shown` (what the reader typed, so a
 * replay converts exactly the same number) when that converts to the same SI value, else in SI.
 */
export function makeRecord(calc: CalculatorDefinition, values: Values, outputs: Outputs, shown: Readonly<Record<string, Shown>>, ctx: RecordContext, time = new Date(), name?: string): CalcRecord {
  const inputs: Record<string, Quantity> = {};
  for (const def of calc.inputs) {
    const v = values[def.key];
    if (v === undefined) continue;
    if (def.kind === 'choice' || def.kind === 'text' || typeof v !== 'number') { inputs[def.key] = { value: String(v) }; continue; }
    const typed = shown[def.key];
    let u = siUnit(def.kind);
    try { if (typed) u = findUnit(def.kind, typed.unit); } catch { /* unknown unit: record SI */ }
    inputs[def.key] = typed && toSI(typed.value, u) === v ? { value: typed.value, unit: u.id } : { value: fromSI(v, u), unit: u.id };
  }
  const outs: Record<string, Quantity> = {};
  for (const def of calc.outputs) {
    const v = outputs[def.key];
    if (v === undefined) continue;
    outs[def.key] = typeof v === 'number' && def.kind !== 'text' ? { value: v, unit: siUnit(def.kind).id } : { value: String(v) };
  }
  return {
    format: RECORD_FORMAT, formatVersion: 1, calculator: calc.id,
    ...(ctx.page ? { page: { id: ctx.page.id, revision: ctx.page.revision } } : {}),
    coreVersion: ctx.coreVersion, ...(ctx.contentHash ? { contentHash: ctx.contentHash } : {}),
    time: time.toISOString(), ...(name ? { name } : {}), inputs, outputs: outs,
  };
}

export interface OutputDiff { readonly key: string; readonly recorded: number | string; readonly computed: number | string | undefined; readonly difference?: number }

export type Replay =
  | { ok: true; values: Values; outputs: Outputs; shown: Record<string, Shown>; diffs: OutputDiff[]; matched: number; warnings: string[] }
  | { ok: false; message: string };

/**
 * Converts a record's inputs to raw SI values for evaluate(); throws a message for bad entries.
 * Old damper-law keys (migrate.ts) are converted too and mapped to the canonical keys, with notes.
 */
function rawInputs(calc: CalculatorDefinition, rec: CalcRecord): { raw: Record<string, number | string>; shown: Record<string, Shown>; notes: string[] } {
  const raw: Record<string, number | string> = Object.create(null);
  const shown: Record<string, Shown> = Object.create(null);
  for (const [key, q] of Object.entries(rec.inputs)) {
    const def = calc.inputs.find((d) => d.key === key);
    const legacy = !def && calc.inputs.some((d) => d.key === 'law') ? LEGACY_LAW_KEYS[key] : undefined;
    if (!def && !legacy) throw new Error(`input '${key}' is not an input of ${calc.id}`);
    const kind = def ? def.kind : legacy!;
    // a yes/no choice that was a 0/1 number (ends): the number is mapped below, with a note
    if (kind === 'choice' && typeof q.value === 'number' && isNumeralChoice(calc, key)) { raw[key] = q.value; continue; }
    if (kind === 'choice' || kind === 'text') {
      if (typeof q.value !== 'string') throw new Error(`input '${key}' must be text`);
      raw[key] = q.value;
      continue;
    }
    if (typeof q.value !== 'number') throw new Error(`input '${key}' must be a number`);
    const u = q.unit === undefined ? siUnit(kind) : findUnit(kind, q.unit);
    // the old power-law C (key c) was accepted in SI base units only: its unit depends on α
    if (key === 'c' && rec.inputs.law?.value === 'power' && u.id !== siUnit(kind).id) throw new Error(`input 'c' (old key, power-law C) must be in SI base units, N·(s/m)^α, not ${u.symbol}`);
    raw[key] = toSI(q.value, u);
    shown[key] = { value: q.value, unit: u.id };
  }
  const law = migrateLawKeys(calc, raw);
  const m = migrateYesNoNumbers(calc, law.raw);
  // a mapped value is no longer what the reader typed: show it in SI
  for (const key of Object.keys(shown)) if (m.raw[key] !== raw[key]) delete shown[key];
  return { raw: m.raw as Record<string, number | string>, shown, notes: [...law.notes, ...m.notes] };
}

/** Recomputes a record. `ctx` is what the reader has now (page revision, core version). */
export function replayRecord(calc: CalculatorDefinition, rec: CalcRecord, ctx: RecordContext): Replay {
  if (rec.calculator !== calc.id) return { ok: false, message: `This record is for calculator '${rec.calculator}', not '${calc.id}'.` };
  let result;
  let shown: Record<string, Shown>;
  let notes: string[];
  try {
    const r = rawInputs(calc, rec);
    shown = r.shown;
    notes = r.notes;
    result = evaluate(calc, r.raw, { fillDefaults: false });
  } catch (e) {
    const msg = e instanceof DampbookError || e instanceof Error ? e.message : String(e);
    return { ok: false, message: `The record's inputs are not valid: ${msg}` };
  }
  const diffs: OutputDiff[] = [];
  let matched = 0;
  for (const [key, q] of Object.entries(rec.outputs)) {
    const def = calc.outputs.find((o) => o.key === key);
    const computed = result.outputs[key];
    if (!def) { diffs.push({ key, recorded: q.value, computed: undefined }); continue; }
    if (typeof q.value === 'number' && typeof computed === 'number' && def.kind !== 'text') {
      let recordedSI: number;
      try { recordedSI = q.unit === undefined ? q.value : toSI(q.value, findUnit(def.kind, q.unit)); } catch { diffs.push({ key, recorded: q.value, computed }); continue; }
      if (withinTolerance(computed, recordedSI, REPRODUCE_TOLERANCE, REPRODUCE_FLOOR)) matched++;
      else diffs.push({ key, recorded: recordedSI, computed, difference: relativeDifference(computed, recordedSI) });
    } else if (computed !== undefined && String(computed) === String(q.value)) matched++;
    else diffs.push({ key, recorded: q.value, computed });
  }
  const warnings: string[] = notes.map((n) => `Old input: ${n}`);
  if (rec.page && ctx.page && rec.page.id !== ctx.page.id) warnings.push(`The record was made on page '${rec.page.id}', this is page '${ctx.page.id}'.`);
  else if (rec.page && ctx.page && rec.page.revision !== ctx.page.revision) warnings.push(`The record was made with page revision ${rec.page.revision}; this page is revision ${ctx.page.revision}.`);
  if (rec.coreVersion !== ctx.coreVersion) {
    warnings.push(`The record was made with core version ${rec.coreVersion}; this handbook runs ${ctx.coreVersion}.`);
    // which of the changes since then can move this calculator's results (src/calculators/changes.ts)
    warnings.push(...changeLines(rec.coreVersion, ctx.coreVersion, [calc.id]));
  }
  return { ok: true, values: result.values, outputs: result.outputs, shown, diffs, matched, warnings };
}
