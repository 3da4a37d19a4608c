/**
 * Which files of a handbook folder are pages, and each page's id: one rule for the site build
 * (src/build/handbook-pages.ts) and the CLI (src/cli/pages.ts), so `dampbook check`, `sheet` and
 * the built site agree on what a page is and where it lives.
 *
 * A page is a `.mdx` file whose name does not start with `_`, anywhere under the folder except
 * under a name starting with `.` (a team's `.git`, an editor's swap folder). Its id is its path
 * without `.mdx`, each segment slugged as GitHub slugs headings (`thermal/warm-up`; upper case
 * lowered, spaces to hyphens), `…/index` ending in its folder: the id the earlier content
 * collection gave, so every address of earlier builds holds.
 */
import { lstatSync, readdirSync, realpathSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { slug } from 'github-slugger';

/** A page file found, or a folder entry that cannot be read (dangling link, link loop, no permission). */
export interface FoundFile { readonly file: string; readonly reason?: string }

/** Why a file or folder could not be read, in words. */
export function unreadableReason(e: unknown): string {
  const code = (e as { code?: string }).code;
  if (code === 'ENOENT') return 'dangling symbolic link (its target does not exist)';
  if (code === 'ELOOP') return 'symbolic link loop';
  if (code === 'EACCES' || code === 'EPERM') return 'permission denied';
  return `cannot be read (${code ?? 'unknown error'})`;
}

/**
 * Every page file under `dir`, in name order. A folder reached twice (a link back to a parent)
 * is walked once; an entry that cannot be read is listed with its reason and the walk goes on.
 */
export function findPageFiles(dir: string): FoundFile[] {
  const out: FoundFile[] = [];
  const seen = new Set<string>();
  const walk = (d: string): void => {
    let real: string;
    try { real = realpathSync(d); } catch (e) { out.push({ file: d, reason: unreadableReason(e) }); return; }
    if (seen.has(real)) return;
    seen.add(real);
    let names: string[];
    try { names = readdirSync(d).sort(); } catch (e) { out.push({ file: d, reason: unreadableReason(e) }); return; }
    for (const name of names) {
      if (name.startsWith('.')) continue;
      const p = join(d, name);
      let isDir: boolean;
      try { isDir = statSync(p).isDirectory(); } catch (e) {
        if (name.endsWith('.mdx') || lstatSync(p).isSymbolicLink()) out.push({ file: p, reason: unreadableReason(e) });
        continue;
      }
      if (isDir) walk(p);
      else if (name.endsWith('.mdx') && !name.startsWith('_')) out.push({ file: p });
    }
  };
  walk(dir);
  return out;
}

/** A page's id from its path relative to the folder (`/` or the platform's separator). */
export function pageId(relativePath: string): string {
  return relativePath.split(sep).join('/').replace(/\.mdx$/, '').split('/').map((s) => slug(s)).join('/').replace(/\/index$/, '');
}

/** The id of a page file under `contentDir`. */
export function pageIdOf(file: string, contentDir: string): string {
  return pageId(relative(contentDir, file));
}
