/**
 * The text form of a power profile: what a reader types and what a duty page hands over in a
 * link. One entry per line (or separated by ';'): "t, P" — from time t (s) the power is P (W);
 * the last entry is the end time alone. Blank lines and lines starting with '#' are skipped (whole
 * lines: a ';' inside a comment does not end it).
 *
 *     # 120 W for 10 min, then 10 min off (period 20 min)
 *     0, 120
 *     600, 0
 *     1200
 */
import { InputRangeError } from '../errors.ts';
import { PLAIN_NUMBER } from '../numeric/plainNumber.ts';
import { checkProfile, MAX_PROFILE_POWER, MAX_PROFILE_SEGMENTS, MAX_PROFILE_TIME, type PowerProfile } from './powerProfile.ts';

/** Longest profile text read, characters (a page's field has its own, smaller maxLength). */
export const MAX_PROFILE_TEXT = 200_000;


/**
 * Parses the text form. Each problem names its line (1-based, counting ';'-separated entries
 * as lines) and quotes at most 40 characters of it.
 *
 * @param text the profile text (untrusted)
 * @param input the input key named in errors
 * @throws InputRangeError naming `input` and the line for any malformed entry
 * @example parsePowerProfile('0,120;600,0;1200') // { t: [0, 600, 1200], P: [120, 0] }
 * @source common practice, no source (a piecewise-constant duty as a table of times and powers)
 */
export function parsePowerProfile(text: string, input = 'profile'): PowerProfile {
  const fail = (line: number, entry: string, why: string): never => {
    throw new InputRangeError(input, entry, undefined, '', `line ${line}: ${why}`);
  };
  if (typeof text !== 'string') throw new InputRangeError(input, typeof text, undefined, '', 'must be text');
  if (text.length > MAX_PROFILE_TEXT) throw new InputRangeError(input, `${text.length} characters`, undefined, '', `longer than ${MAX_PROFILE_TEXT} characters`);
  // comments are whole lines: drop them before splitting a line into ';'-separated entries
  const entries = text.split(/\r\n|\n|\r/).flatMap((l) => (l.trim().startsWith('#') ? ['#'] : l.split(';')));
  const t: number[] = [];
  const P: number[] = [];
  let end: number | undefined;
  for (let i = 0; i < entries.length; i++) {
    const line = i + 1;
    const entry = entries[i]!.trim();
    if (entry === '' || entry.startsWith('#')) continue;
    if (end !== undefined) fail(line, entry, 'an entry after the end time (the end time alone must come last)');
    const fields = entry.split(/[\s,]+/);
    if (!fields.every((f) => PLAIN_NUMBER.test(f))) fail(line, entry, 'not a number (write seconds and watts as digits, e.g. 600, 120)');
    if (fields.length > 2) fail(line, entry, 'expected "time, power" or the end time alone');
    const [ti, Pi] = fields.map(Number) as [number, number | undefined];
    if (!Number.isFinite(ti) || ti < 0 || ti > MAX_PROFILE_TIME) fail(line, entry, `time must be between 0 and ${MAX_PROFILE_TIME} s`);
    if (t.length === 0 && ti !== 0) fail(line, entry, 'the first entry must start at time 0');
    if (t.length > 0 && !(ti > t[t.length - 1]!)) fail(line, entry, 'times must increase from line to line');
    if (Pi === undefined) {
      if (t.length === 0) fail(line, entry, 'the first entry needs a power ("0, P")');
      end = ti;
      continue;
    }
    if (!Number.isFinite(Pi) || Pi < 0 || Pi > MAX_PROFILE_POWER) fail(line, entry, `power must be between 0 and ${MAX_PROFILE_POWER} W`);
    if (P.length >= MAX_PROFILE_SEGMENTS) fail(line, entry, `more than ${MAX_PROFILE_SEGMENTS} segments`);
    t.push(ti);
    P.push(Pi);
  }
  if (t.length === 0) throw new InputRangeError(input, text.slice(0, 40), undefined, '', 'no entries: give "0, P" lines and the end time alone on the last line');
  if (end === undefined) throw new InputRangeError(input, text.slice(0, 40), undefined, '', `line ${entries.length}: the last line must be the end time alone (e.g. "${t[t.length - 1]! + 600}")`);
  return checkProfile({ t: [...t, end], P }, input);
}

/**
 * The text form of a profile, one entry per ';' (compact for a page address), numbers to
 * `digits` significant figures.
 */
export function formatPowerProfile(p: PowerProfile, digits = 8): string {
  const n = (x: number) => String(Number(x.toPrecision(digits)));
  const parts = p.P.map((Pi, i) => `${n(p.t[i]!)},${n(Pi)}`);
  parts.push(n(p.t[p.t.length - 1]!));
  return parts.join(';');
}
