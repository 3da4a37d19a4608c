/**
 * Reads handbook pages for the CLI: every `content/**\/*.mdx` (files starting with _ are not
 * pages, as in src/content.config.ts), its YAML frontmatter validated with the same schema the
 * site build uses. YAML 1.2 core rules, as Astro's js-yaml parser applies them (`n`, `y`, `on` stay strings; dates are coerced by the schema).
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { parse } from 'yaml';
import { pageSchema, type PageMeta } from '../content/schema.ts';

export interface PageFile {
  /** Path as given (relative to the working directory when the content dir is relative). */
  readonly file: string;
  /** The collection entry id, e.g. "oscillators/sdof" (the page's URL path). */
  readonly entry: string;
  readonly meta?: PageMeta;
  /** Frontmatter problems, each naming the field. */
  readonly errors: readonly string[];
}

function walk(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir).sort()) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) walk(p, out);
    else if (name.endsWith('.mdx') && !name.startsWith('_')) out.push(p);
  }
  return out;
}

const FRONTMATTER = /^---\r?\n([\s\S]*?)\r?\n---(?:\r?\n|$)/;

export function readPage(file: string, contentDir: string): PageFile {
  const entry = relative(contentDir, file).split(sep).join('/').replace(/\.mdx$/, '').toLowerCase();
  const m = FRONTMATTER.exec(readFileSync(file, 'utf8'));
  if (!m) return { file, entry, errors: ['no frontmatter: the file must start with a --- block'] };
  let data: unknown;
  try {
    data = parse(m[1]!, { schema: 'core' });
  } catch (e) {
    return { file, entry, errors: [`frontmatter is not valid YAML: ${e instanceof Error ? e.message.split('\n')[0] : String(e)}`] };
  }
  const r = pageSchema.safeParse(data ?? {});
  if (!r.success) return { file, entry, errors: r.error.issues.map((i) => `${i.path.join('.') || '(frontmatter)'}: ${i.message}`) };
  return { file, entry, meta: r.data, errors: [] };
}

export function readPages(contentDir: string): PageFile[] {
  return walk(contentDir).map((f) => readPage(f, contentDir));
}
