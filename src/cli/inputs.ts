/**
 * The one way the CLI reads calculator inputs from `--in key=value` (used by `calc` and `sheet`):
 * a text input given as `@file` is read from the file (bounded, regular files only), a plain
 * number is an SI number, anything else ("25 lb", a choice) goes to evaluate() as typed.
 * evaluate() then refuses what is missing, invalid or too long, the same for both commands.
 */
import { createHash } from 'node:crypto';
import { basename } from 'node:path';
import { isLegacyLawKey, migrateLawKeys } from '../calculators/shared/damperLawMigrate.ts';
import { migrateYesNoNumbers } from '../calculators/shared/yesNoNumbers.ts';
import { evaluate } from '../calculators/evaluate.ts';
import type { CalculatorDefinition, Result, Values } from '../calculators/types.ts';
import { InputRangeError } from '../core/errors.ts';
import { isPlainNumber } from '../core/numeric/plainNumber.ts';
import { UsageError } from './args.ts';
import { FileReadError, readBoundedFile } from './readFile.ts';

/** What the CLI says about a text input instead of echoing it: enough to identify the data. */
export interface TextSummary {
  readonly key: string;
  /** File name (no folders) when the text came from `@file`. */
  readonly file?: string;
  readonly characters: number;
  /** Non-empty lines. */
  readonly rows: number;
  /** SHA-256 of the file's bytes (or of the UTF-8 text when given inline), first 12 hex digits. */
  readonly sha256: string;
}

export interface ReadInputs {
  readonly raw: Record<string, unknown>;
  readonly texts: TextSummary[];
  /** Deprecation notes for old damper-law keys that were mapped to the canonical ones (for stderr). */
  readonly notes: string[];
}

/** One line naming a text input without its contents: "dyno.csv, 401 rows, 9876 characters, sha256 0a1b2c3d4e5f". */
export function textLabel(t: TextSummary): string {
  return `${t.file ?? 'text'}, ${t.rows} rows, ${t.characters} characters, sha256 ${t.sha256}`;
}

/** Non-empty lines of a text. */
export function countRows(text: string): number {
  let n = 0;
  for (const l of text.split(/\r\n|\r|\n/)) if (l.trim() !== '') n++;
  return n;
}

/** Bytes a text input's file may have: maxLength UTF-16 units take at most 3 UTF-8 bytes each (+ a BOM). */
export function fileLimit(maxLength: number): number {
  return maxLength * 3 + 3;
}

export function readInputs(def: CalculatorDefinition, inputs: readonly (readonly [string, string])[]): ReadInputs {
  const raw: Record<string, unknown> = Object.create(null);
  const texts: TextSummary[] = [];
  const seen = new Set<string>();
  for (const [key, value] of inputs) {
    const input = def.inputs.find((i) => i.key === key);
    if (!input && isLegacyLawKey(def, key)) {
      if (seen.has(key)) throw new UsageError(`--in ${key} is given twice`);
      seen.add(key);
      raw[key] = isPlainNumber(value) ? Number(value) : value;
      continue;
    }
    if (!input) throw new UsageError(`${def.id} has no input '${key}'; inputs: ${def.inputs.map((i) => i.key).join(', ')}`);
    if (seen.has(key)) throw new UsageError(`--in ${key} is given twice`);
    seen.add(key);
    if (input.kind === 'text') {
      let text = value;
      let file: string | undefined;
      let sha256: string;
      if (value.startsWith('@')) {
        const path = value.slice(1);
        try {
          const f = readBoundedFile(path, fileLimit(input.maxLength));
          text = f.text;
          sha256 = f.sha256;
        } catch (e) {
          if (e instanceof FileReadError) throw new InputRangeError(key, value, undefined, '', e.message);
          throw e;
        }
        file = basename(path);
      } else sha256 = sha256Text(value);
      raw[key] = text;
      texts.push({ ...summariseText(key, text, file), sha256 });
    } else if (input.kind !== 'choice' && isPlainNumber(value)) raw[key] = Number(value);
    else raw[key] = value;
  }
  // old damper-law keys (cRebound, c with the power law, k as the hysteretic stiffness) → canonical keys
  const m = migrateLawKeys(def, raw);
  // old 0/1 numbers on yes/no choices (ends) → the choice's option
  const y = migrateYesNoNumbers(def, m.raw);
  return { raw: y.raw, texts, notes: [...m.notes, ...y.notes] };
}

/** A summary of text given inline or a default (checksum of its UTF-8 bytes). */
export function summariseText(key: string, text: string, file?: string): TextSummary {
  return { key, ...(file !== undefined ? { file } : {}), characters: text.length, rows: countRows(text), sha256: sha256Text(text) };
}

function sha256Text(s: string): string {
  return createHash('sha256').update(s, 'utf8').digest('hex').slice(0, 12);
}

/**
 * evaluate() with missing required inputs refused (as the CLI always does). A problem in a text
 * input is reported by its line and reason, never by quoting the text (a file may be secret).
 */
export function evaluateInputs(def: CalculatorDefinition, read: ReadInputs): Result & { values: Values } {
  try {
    return evaluate(def, read.raw, { fillDefaults: false });
  } catch (e) {
    const t = e instanceof InputRangeError ? read.texts.find((x) => x.key === e.input) : undefined;
    if (!t || !(e instanceof InputRangeError)) throw e;
    throw new InputRangeError(t.key, t.file ?? `${t.characters} characters of text`, undefined, '', detailOf(e));
  }
}

/** The "(…)" reason of an InputRangeError's message, without the quoted value. */
function detailOf(e: InputRangeError): string {
  const shown = e.value === undefined ? 'missing' : typeof e.value === 'string' ? JSON.stringify(e.value.slice(0, 40)) : String(e.value);
  const head = `input '${e.input}' = ${shown}`;
  const rest = e.message.startsWith(head) ? e.message.slice(head.length).trim() : '';
  const m = /^\((.*)\)(;.*)?$/.exec(rest);
  return m ? m[1]! : 'not accepted';
}
