/**
 * Calculation records: one calculator's inputs (in the units the engineer used) and outputs,
 * with the page, its revision and the core version that made them. The same module writes,
 * parses and re-checks records in the browser (import, saved input sets) and in the CLI
 * (`dampbook calc --record`). Records are untrusted text: every check happens here, before
 * anything on the page or in a file changes, and failures are one clear message.
 */
import { z } from 'zod';
import type { CalculatorDefinition } from '../calculators/types.ts';

export const RECORD_FORMAT = 'dampbook-record';
/**
 * Room for everything in a record but its text inputs (numbers, units, names, outputs, hand-offs),
 * in characters.
 */
const RECORD_OVERHEAD = 100_000;

/**
 * Largest record text of one calculator, in characters: its text inputs at their own maxLength
 * (the one limit on a text's length, checked again by evaluate() on replay), each written by
 * JSON.stringify with at most 6 characters per character (`\u001f`), plus the rest.
 */
export function recordCharLimit(calc: CalculatorDefinition): number {
  let text = 0;
  for (const d of calc.inputs) if (d.kind === 'text') text += d.maxLength;
  return 6 * text + RECORD_OVERHEAD;
}

/**
 * Largest record accepted before its calculator is known, in characters: a flood guard at least
 * recordCharLimit() of every calculator (test/records/limits.test.ts keeps it so), so a record of
 * a valid calculation is never refused by size.
 */
export const MAX_RECORD_CHARS = 32_000_000;
/** Keys that could reach an object's prototype: refused anywhere in a record. */
const FORBIDDEN_KEYS = new Set(['__proto__', 'constructor', 'prototype']);
const MAX_DEPTH = 6;
const KEY = /^[A-Za-z][A-Za-z0-9_]{0,39}$/;

const quantity = z
  .object({
    // a text's length is limited by its input's own maxLength (checked by evaluate() on replay)
    value: z.union([z.number().finite(), z.string()]),
    unit: z.string().max(32).regex(/^[^<>&"]*$/, 'plain unit text').optional(),
  })
  .strict();

const valueMap = z
  .record(quantity)
  .refine((m) => Object.keys(m).length <= 200, 'at most 200 entries')
  .refine((m) => Object.keys(m).every((k) => KEY.test(k)), 'keys are names of letters, digits and _');

export const recordSchema = z
  .object({
    format: z.literal(RECORD_FORMAT),
    formatVersion: z.literal(1),
    calculator: z.string().regex(/^[a-z0-9-]{1,60}$/, 'a calculator id'),
    page: z.object({ id: z.string().regex(/^[a-z0-9-]{1,80}$/, 'a page id'), revision: z.string().regex(/^[A-Z0-9][A-Z0-9.]{0,15}$/, 'a revision') }).strict().optional(),
    coreVersion: z.string().max(40).regex(/^\d+\.\d+\.\d+[-+.0-9A-Za-z]*$/, 'a version such as 0.1.0'),
    contentHash: z.string().regex(/^[0-9a-f]{6,64}$/, 'a hex hash').optional(),
    time: z.string().max(40).datetime({ offset: true }),
    name: z.string().min(1).max(120).optional(),
    inputs: valueMap,
    outputs: valueMap,
  })
  .strict();

export type CalcRecord = z.infer<typeof recordSchema>;
export type Quantity = z.infer<typeof quantity>;
export type RecordParse = { ok: true; record: CalcRecord } | { ok: false; message: string };

/** Refuses prototype keys and deep nesting anywhere in a parsed JSON value. */
function hostileKey(v: unknown, depth = 0): string | undefined {
  if (depth > MAX_DEPTH) return 'nested too deeply';
  if (v === null || typeof v !== 'object') return undefined;
  for (const k of Object.keys(v)) {
    if (FORBIDDEN_KEYS.has(k)) return `contains the forbidden key '${k}'`;
    const bad = hostileKey((v as Record<string, unknown>)[k], depth + 1);
    if (bad) return bad;
  }
  return undefined;
}

/** Checks an already-parsed value (e.g. a saved input set read from localStorage). */
export function validateRecord(data: unknown): RecordParse {
  const bad = hostileKey(data);
  if (bad) return { ok: false, message: `Not a valid record: it ${bad}.` };
  const r = recordSchema.safeParse(data);
  if (r.success) return { ok: true, record: r.data };
  const issue = r.error.issues[0]!;
  const where = issue.path.length ? issue.path.join('.') : 'the record';
  return { ok: false, message: `Not a valid record: ${where}: ${issue.message}.` };
}

/**
 * Parses record text (a file or a stored string); a leading UTF-8 byte-order mark is ignored, as
 * the browser's File.text() does. With `calc`, the size limit is that calculator's own
 * (recordCharLimit). Never throws.
 */
export function parseRecord(text: string, calc?: CalculatorDefinition): RecordParse {
  if (typeof text !== 'string') return { ok: false, message: 'Not a valid record: not text.' };
  const limit = calc ? recordCharLimit(calc) : MAX_RECORD_CHARS;
  if (text.length > limit) return { ok: false, message: `Not a valid record: ${text.length} characters; at most ${limit}.` };
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    return { ok: false, message: 'Not a valid record: the file is not JSON.' };
  }
  return validateRecord(data);
}
