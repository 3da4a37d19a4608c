/**
 * Minimal frontmatter edits for sign-off: sets top-level scalar fields of a page's YAML block line
 * by line, so every other byte of the file (comments, order, quoting, the method text) stays as it
 * was. A field that exists on one line is replaced in place; a new field goes after the field named
 * as its anchor (or at the end of the block). A field written over several lines is refused rather
 * than rewritten.
 */
const BLOCK = /^(\uFEFF?---\r?\n)([\s\S]*?\r?\n)(---(?:\r?\n|$))/;

export interface FieldEdit { readonly key: string; readonly value: string; readonly after?: readonly string[] }

/** A YAML scalar for a name or a hash: plain when that reads back as the same string, else quoted. */
export function yamlScalar(s: string): string {
  return /^[A-Za-z0-9][A-Za-z0-9 .'-]*$/.test(s) && !/^(true|false|null|yes|no|on|off|~)$/i.test(s) && !/^[0-9.+-]+$/.test(s) && !/ $/.test(s) ? s : JSON.stringify(s);
}

export function setFields(fileText: string, edits: readonly FieldEdit[]): string {
  const m = BLOCK.exec(fileText);
  if (!m) throw new Error('no frontmatter: the file must start with a --- block');
  const eol = m[1]!.endsWith('\r\n') ? '\r\n' : '\n';
  const lines = m[2]!.split(/\r?\n/).slice(0, -1);
  const at = (key: string) => lines.findIndex((l) => l.startsWith(`${key}:`));
  for (const e of edits) {
    const line = `${e.key}: ${e.value}`;
    const i = at(e.key);
    if (i >= 0) {
      const next = lines[i + 1];
      if (/^\S+:\s*[|>]?[-+]?\s*$/.test(lines[i]!) || (next !== undefined && /^\s/.test(next))) throw new Error(`frontmatter field '${e.key}' spans several lines; write it on one line first`);
      lines[i] = line;
      continue;
    }
    const anchor = (e.after ?? []).map(at).filter((j) => j >= 0).pop();
    if (anchor === undefined) { lines.push(line); continue; }
    let j = anchor + 1; // past the anchor's own continuation lines
    while (j < lines.length && /^\s/.test(lines[j]!)) j++;
    lines.splice(j, 0, line);
  }
  return m[1]! + lines.map((l) => l + eol).join('') + m[3]! + fileText.slice(m[0].length);
}
