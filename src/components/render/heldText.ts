/**
 * Long text (an uploaded or pasted record of up to a few MB) is kept out of the live textarea:
 * Chromium lays out, spell-checks and copies a multi-megabyte textarea value on every read, and a
 * 4.99 MB upload blocked the page for seconds. The element holds such a text itself and the field
 * shows a summary instead — file name, rows, characters and checksum — with a button to clear it
 * and paste or type another (edit a long record in an editor, then load it again). Pure helpers
 * here; the element does the DOM.
 */
import { textSum } from './fieldState.ts';

/** Longer texts (characters) are held, not shown in the textarea. */
export const LARGE_TEXT = 200_000;

export interface HeldText {
  readonly text: string;
  /** File name, or how the text arrived ("pasted text", "from the loaded record"). */
  readonly name: string;
  /** Non-empty lines. */
  readonly rows: number;
  /** FNV-1a checksum, the same one a link carries as `<key>.sha`. */
  readonly sum: string;
}

/** Non-empty lines, counted by a loop (no split of a multi-megabyte string into lines). */
export function countRows(text: string): number {
  let rows = 0;
  let blank = true;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 10 || c === 13) { if (!blank) rows++; blank = true; } else if (blank && c !== 32 && c !== 9) blank = false;
  }
  return blank ? rows : rows + 1;
}

export function holdText(text: string, name: string): HeldText {
  return { text, name, rows: countRows(text), sum: textSum(text) };
}

/** "dyno.csv: 420 000 rows, 3 873 912 characters, checksum 1a2b3c4d. Used as loaded; too long to edit here." */
export function describeHeld(h: HeldText): string {
  const n = (x: number) => x.toLocaleString('en-GB').replace(/,/g, ' ');
  return `${h.name}: ${n(h.rows)} rows, ${n(h.text.length)} characters, checksum ${h.sum}. Used as loaded; too long to edit here (edit the file and load it again).`;
}
