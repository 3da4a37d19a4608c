/**
 * Terminal-safe text for every CLI message: control characters (C0 including newline and ESC,
 * DEL, C1), line and paragraph separators and bidirectional overrides are written as `\uXXXX`,
 * so one message is one line and nothing from an input, a record or a page can colour, move or
 * forge output. The same escape is valid inside a JSON string, so `--json` output stays JSON.
 */
// eslint-disable-next-line no-control-regex
const CONTROLS = /[\u0000-\u001f\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;

export function escapeControls(s: string): string {
  return s.replace(CONTROLS, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
