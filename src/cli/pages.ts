/**
 * Reads handbook pages for the CLI: every `content/**\/*.mdx` (files starting with _ are not
 * pages, src/content/pageFiles.ts), its YAML frontmatter validated with the same schema the
 * site build uses. YAML 1.2 core rules, as Astro's js-yaml parser applies them (`n`, `y`, `on` stay strings; dates are coerced by the schema).
 */
import { relative, sep } from 'node:path';
import { parseDocument } from 'yaml';
import { topicTitles } from '../content/handbookConfig.ts';
import { readHandbookConfig } from '../content/readHandbookConfig.ts';
import { findPageFiles, pageIdOf, unreadableReason } from '../content/pageFiles.ts';
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

/** Largest page file read (a page is text; a bigger file is reported, not read). */
const MAX_PAGE_BYTES = 16 * 1024 * 1024;

const FRONTMATTER = /^---\r?\n([\s\S]*?)\r?\n---(?:\r?\n|$)/;

type PageSchema = ReturnType<typeof pageSchemaFor>;

export function readPage(file: string, contentDir: string, schema: PageSchema = pageSchema): PageFile {
  const entry = pageIdOf(file, contentDir);
  let text: string;
  try { text = readBoundedFile(file, MAX_PAGE_BYTES).text; } catch (e) { return { file, entry, errors: [e instanceof FileReadError ? e.message : unreadableReason(e)] }; }
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
  return findPageFiles(contentDir).map((e) => (e.reason === undefined ? readPage(e.file, contentDir, schema) : { file: e.file, entry: relative(contentDir, e.file).split(sep).join('/'), errors: [e.reason] }));
}
