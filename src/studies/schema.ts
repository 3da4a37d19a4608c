/**
 * The study file: one damper in one application, as our own JSON format (`dampbook-study`,
 * version 1). Study files are untrusted text: prototype keys, deep nesting, oversized text and
 * unknown fields are refused here with one line, before anything runs.
 *
 * ```json
 * { "format": "dampbook-study", "version": 1, "title": "…",
 *   "project": { "number": "TW-210", "name": "…", "damper": "…", "calculationNo": "…", "preparedBy": "…" },
 *   "quantities": { "airTemperature": "35 °C", "vehicleSpeed": 15 },
 *   "limits": { "allowedTemperature": "120 °C" },
 *   "steps": [{ "id": "road", "page": "road-power", "calculator": "road-power",
 *               "inputs": { "roadClass": "D" }, "from": {}, "checks": [] }] }
 * ```
 * Numbers are SI; text such as "35 °C" is converted through the unit table.
 */
import { z } from 'zod';

export const STUDY_FORMAT = 'dampbook-study';
export { STUDY_STORE } from './storeKey.ts';
/** Largest study file accepted, in characters. */
export const MAX_STUDY_CHARS = 200_000;
const FORBIDDEN_KEYS = new Set(['__proto__', 'constructor', 'prototype']);
const MAX_DEPTH = 6;
const KEY = /^[A-Za-z][A-Za-z0-9_]{0,39}$/;
const STEP_ID = /^[a-z][a-z0-9-]{0,39}$/;

export const CHECKS = ['steady-temperature', 'surroundings', 'time-to-limit', 'fade', 'power-rating', 'tyre-load', 'travel', 'stroke-energy', 'hourly-energy'] as const;
export type CheckName = (typeof CHECKS)[number];

const value = z.union([z.number().finite(), z.string().min(1).max(6000)]);
const valueMap = z
  .record(value)
  .refine((m) => Object.keys(m).length <= 100, 'at most 100 entries')
  .refine((m) => Object.keys(m).every((k) => KEY.test(k)), 'keys are names of letters, digits and _');
const text = (max: number) => z.string().min(1).max(max).regex(/^[^<>]*$/, 'plain text');

const step = z
  .object({
    id: z.string().regex(STEP_ID, 'a step id of lower-case letters, digits and -'),
    title: text(120).optional(),
    page: z.string().regex(/^[a-z0-9-]{1,80}$/, 'a page id'),
    calculator: z.string().regex(/^[a-z0-9-]{1,60}$/, 'a calculator id'),
    inputs: valueMap.optional(),
    from: z
      .record(z.string().regex(/^[a-z][a-z0-9-]{0,39}\.[A-Za-z][A-Za-z0-9_]{0,39}$/, 'a binding "stepId.outputKey"'))
      .refine((m) => Object.keys(m).every((k) => KEY.test(k)), 'keys are input names')
      .optional(),
    checks: z.array(z.enum(CHECKS)).max(CHECKS.length).optional(),
  })
  .strict();

export const studySchema = z
  .object({
    format: z.literal(STUDY_FORMAT),
    version: z.literal(1),
    /** The core (package) version the study was made with; `study run` lists the result changes since (src/calculators/changes.ts). */
    coreVersion: z.string().max(40).regex(/^\d+\.\d+\.\d+[-+.0-9A-Za-z]*$/, 'a version such as 0.4.0').optional(),
    title: text(160),
    project: z
      .object({
        number: text(40),
        name: text(120),
        damper: text(160),
        calculationNo: text(40),
        preparedBy: text(80).optional(),
        checkedBy: text(80).optional(),
        date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'a date YYYY-MM-DD').optional(),
      })
      .strict(),
    quantities: valueMap.optional(),
    limits: valueMap.optional(),
    steps: z.array(step).min(1).max(30),
  })
  .strict();

export type Study = z.infer<typeof studySchema>;
export type StudyStep = z.infer<typeof step>;
export type StudyParse = { ok: true; study: Study } | { ok: false; message: string };

function hostile(v: unknown, depth = 0): string | undefined {
  if (depth > MAX_DEPTH) return 'nested too deeply';
  if (v === null || typeof v !== 'object') return undefined;
  for (const k of Object.keys(v)) {
    if (FORBIDDEN_KEYS.has(k)) return `contains the forbidden key '${k}'`;
    const bad = hostile((v as Record<string, unknown>)[k], depth + 1);
    if (bad) return bad;
  }
  return undefined;
}

/** Checks an already-parsed value. Never throws. */
export function validateStudy(data: unknown): StudyParse {
  const bad = hostile(data);
  if (bad) return { ok: false, message: `Not a valid study: it ${bad}.` };
  const r = studySchema.safeParse(data);
  if (r.success) return { ok: true, study: r.data };
  const issue = r.error.issues[0]!;
  const where = issue.path.length ? issue.path.join('.') : 'the study';
  return { ok: false, message: `Not a valid study: ${where}: ${issue.message.replace(/\s+/g, ' ')}.` };
}

/** Parses study text (a file). Never throws. */
export function parseStudy(textIn: string): StudyParse {
  if (typeof textIn !== 'string') return { ok: false, message: 'Not a valid study: not text.' };
  if (textIn.length > MAX_STUDY_CHARS) return { ok: false, message: `Not a valid study: ${textIn.length} characters; at most ${MAX_STUDY_CHARS}.` };
  // a UTF-8 byte-order mark is not part of the study: the build, the browser and the CLI all drop it (as for records and pages)
  if (textIn.charCodeAt(0) === 0xfeff) textIn = textIn.slice(1);
  let data: unknown;
  try {
    data = JSON.parse(textIn);
  } catch {
    return { ok: false, message: 'Not a valid study: the file is not JSON.' };
  }
  return validateStudy(data);
}
