/**
 * Reads handbook pages for the CLI: every `content/**\/*.mdx` (files starting with _ are not
 * pages, as in src/content.config.ts), its YAML frontmatter validated with the same schema the
 * site build uses. YAML 1.2 core rules, as Astro's js-yaml parser applies them (`n`, `y`, `on` stay strings; dates are coerced by the schema).
 */
import { lstatSync, readdirSync, realpathSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { parseDocument } from 'yaml';
import { topicTitles } from '../content/handbookConfig.ts';
import { readHandbookConfig } from '../content/readHandbookConfig.ts';
import { pageSchema, pageSchemaFor, type PageMeta } from '../content/schema.ts';
import { FileReadError, readBoundedFile } from './readFile.ts';

export interface PageFile {
  /** Path as given (relative to the working directory when the content dir is relative). */
  readonly file: string;
  /** The collection entry id, e.g. "oscillators/sdof" (the page's URL path). */
  readonly entry: string;
  readonly meta?: PageMeta;
  /** Frontmatter problems, each naming the field. */
  readonly errors: readonly string[];
}

/** A folder entry that cannot be read (dangling link, link loop, no permission): reported, not fatal. */
interface Entry { readonly file: string; readonly reason?: string }

function why(e: unknown): string {
  const code = (e as { code?: string }).code;
  if (code === 'ENOENT') return 'dangling symbolic link (its target does not exist)';
  if (code === 'ELOOP') return 'symbolic link loop';
  if (code === 'EACCES' || code === 'EPERM') return 'permission denied';
  return `cannot be read (${code ?? 'unknown error'})`;
}

/**
 * Every page file under `dir`. A folder reached twice (a link back to a parent) is walked once;
 * an entry that cannot be read is listed with its reason and the walk goes on.
 */
function walk(dir: string, out: Entry[], seen: Set<string>): void {
  let real: string;
  try { real = realpathSync(dir); } catch (e) { out.push({ file: dir, reason: why(e) }); return; }
  if (seen.has(real)) return;
  seen.add(real);
  let names: string[];
  try { names = readdirSync(dir).sort(); } catch (e) { out.push({ file: dir, reason: why(e) }); return; }
  for (const name of names) {
    const p = join(dir, name);
    let isDir: boolean;
    try { isDir = statSync(p).isDirectory(); } catch (e) {
      if (name.endsWith('.mdx') || lstatSync(p).isSymbolicLink()) out.push({ file: p, reason: why(e) });
      continue;
    }
    if (isDir) walk(p, out, seen);
    else if (name.endsWith('.mdx') && !name.startsWith('_')) out.push({ file: p });
  }
}

/** Largest page file read (a page is text; a bigger file is reported, not read). */
const MAX_PAGE_BYTES = 16 * 1024 * 1024;

const FRONTMATTER = /^---\r?\n([\s\S]*?)\r?\n---(?:\r?\n|$)/;

type PageSchema = ReturnType<typeof pageSchemaFor>;

export function readPage(file: string, contentDir: string, schema: PageSchema = pageSchema): PageFile {
  const entry = relative(contentDir, file).split(sep).join('/').replace(/\.mdx$/, '').toLowerCase();
  let text: string;
  try { text = readBoundedFile(file, MAX_PAGE_BYTES).text; } catch (e) { return { file, entry, errors: [e instanceof FileReadError ? e.message : why(e)] }; }
  return { file, entry, ...parsePage(text, schema) };
}

/**
 * A page's frontmatter checked with the site's schema (the demo's topics unless the handbook's
 * own schema is given): the metadata, or problems naming each field.
 */
export function parsePage(text: string, schema: PageSchema = pageSchema): { meta?: PageMeta; errors: string[] } {
  // a byte-order mark is not part of the page (the site build ignores it too)
  const m = FRONTMATTER.exec(text.replace(/^\uFEFF/, ''));
  if (!m) return { errors: ['no frontmatter: the file must start with a --- block'] };
  let data: unknown;
  try {
    // warnings (an unknown tag such as !!js/function) are reported here as a problem of the page,
    // never printed by the YAML library itself (its process warning echoed raw control characters)
    const doc = parseDocument(m[1]!, { schema: 'core', logLevel: 'silent' });
    const problem = doc.errors[0] ?? doc.warnings[0];
    if (problem) return { errors: [`frontmatter is not valid YAML: ${problem.message.split('\n')[0]}`] };
    data = doc.toJS({ maxAliasCount: 100 });
  } catch (e) {
    return { errors: [`frontmatter is not valid YAML: ${e instanceof Error ? e.message.split('\n')[0] : String(e)}`] };
  }
  const r = schema.safeParse(data ?? {});
  if (!r.success) return { errors: r.error.issues.map((i) => `${i.path.join('.') || '(frontmatter)'}: ${i.message}`) };
  return { meta: r.data, errors: [] };
}

/** Every page of a handbook folder, checked against the topics of its handbook.config.json. */
export function readPages(contentDir: string): PageFile[] {
  const schema = pageSchemaFor(topicTitles(readHandbookConfig(contentDir)));
  const entries: Entry[] = [];
  walk(contentDir, entries, new Set());
  return entries.map((e) => (e.reason === undefined ? readPage(e.file, contentDir, schema) : { file: e.file, entry: relative(contentDir, e.file).split(sep).join('/'), errors: [e.reason] }));
}
