import { readFileSync, writeFileSync } from 'node:fs';
import { existsSync } from 'node:fs';
import { pageBody, SEAL_FIELD, sealOf } from '../../content/seal.ts';
import { UsageError, type ParsedArgs } from '../args.ts';
import { contentDirOf } from '../contentDir.ts';
import { setFields, yamlScalar, type FieldEdit } from '../frontmatterEdit.ts';
import { topicTitles } from '../../content/handbookConfig.ts';
import { readHandbookConfig } from '../../content/readHandbookConfig.ts';
import { pageSchemaFor } from '../../content/schema.ts';
import { parsePage, readPages } from '../pages.ts';

type Level = 'approved' | 'checked';

/**
 * `dampbook approve <page-id> --by "<name>" [--date YYYY-MM-DD] [--content dir]` and
 * `dampbook check-off …`: set the page's status, the name, the date and the seal of what is
 * signed (src/content/seal.ts) in its frontmatter, editing only those lines. The page must pass
 * the schema afterwards (an approval needs a checker) or nothing is written.
 */
function signOff(level: Level, args: ParsedArgs, out: (s: string) => void): number {
  const cmd = level === 'approved' ? 'approve' : 'check-off';
  const id = args.positionals[1];
  if (!id) throw new UsageError(`${cmd} needs a page id, e.g. dampbook ${cmd} sdof --by "Ines Marrow"`);
  const by = args.flags.get('by');
  if (typeof by !== 'string' || by.trim().length < 2) throw new UsageError(`${cmd} needs --by "<name>" (at least 2 characters)`);
  const date = args.flags.get('date') ?? new Date().toISOString().slice(0, 10);
  if (typeof date !== 'string' || !/^\d{4}-\d{2}-\d{2}$/.test(date) || Number.isNaN(Date.parse(date))) throw new UsageError(`--date ${String(date)}: a date YYYY-MM-DD`);
  const dir = contentDirOf(args);
  if (!existsSync(dir)) throw new UsageError(`no content folder '${dir}'`);
  const page = readPages(dir).find((p) => p.meta?.id === id);
  if (!page) throw new UsageError(`no page with id '${id}' (with valid frontmatter) under ${dir}`);
  const text = readFileSync(page.file, 'utf8');
  const seal = sealOf(pageBody(text), page.meta!);
  const [byKey, dateKey] = level === 'approved' ? ['approvedBy', 'approved'] : ['checkedBy', 'checked'];
  const anchors = level === 'approved' ? ['status', 'preparedBy', 'prepared', 'checkedBy', 'checked'] : ['status', 'preparedBy', 'prepared'];
  const edits: FieldEdit[] = [
    { key: 'status', value: level },
    { key: byKey, value: yamlScalar(by.trim()), after: anchors },
    { key: dateKey, value: date, after: [...anchors, byKey] },
    { key: SEAL_FIELD[level], value: seal, after: [...anchors, byKey, dateKey] },
  ];
  let next: string;
  try { next = setFields(text, edits); } catch (e) { throw new UsageError(`${page.file}: ${e instanceof Error ? e.message : String(e)}`); }
  // the folder's own topics (its handbook.config.json), as check reads the page
  const parsed = parsePage(next, pageSchemaFor(topicTitles(readHandbookConfig(dir))));
  if (parsed.errors.length) throw new UsageError(`not written: ${page.file} would fail check: ${parsed.errors.join('; ')}`);
  // the frontmatter edit must not reach what is signed
  if (sealOf(pageBody(next), parsed.meta!) !== seal) throw new Error('the sign-off edit changed the signed content');
  if (next !== text) writeFileSync(page.file, next);
  out(`${page.file}: ${id} rev ${parsed.meta!.revision} ${level} by ${by.trim()} on ${date}; ${SEAL_FIELD[level]} ${seal}`);
  return 0;
}

export const approve = (args: ParsedArgs, out: (s: string) => void): number => signOff('approved', args, out);
export const checkOff = (args: ParsedArgs, out: (s: string) => void): number => signOff('checked', args, out);
