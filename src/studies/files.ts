/**
 * The studies of a content folder (`<content>/studies/*.json`), read at build time and by tests.
 * A file that is not a valid study throws, naming the file, so the build fails.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parseStudy, type Study } from './schema.ts';

export interface StudyFile { readonly id: string; readonly study: Study }

export function readStudies(content = process.env.DAMPBOOK_CONTENT ?? './content'): StudyFile[] {
  const dir = join(content, 'studies');
  if (!existsSync(dir)) return [];
  return readdirSync(dir).filter((f) => /^[a-z0-9-]+\.json$/.test(f)).sort().map((f) => {
    const p = parseStudy(readFileSync(join(dir, f), 'utf8'));
    if (!p.ok) throw new Error(`${join(dir, f)}: ${p.message}`);
    // /studies/open/ prints the study open in a browser: no built-in study may take that address
    if (f === 'open.json') throw new Error(`${join(dir, f)}: the study id 'open' is reserved; rename the file`);
    return { id: f.replace(/\.json$/, ''), study: p.study };
  });
}
