/**
 * The studies of a content folder (`<content>/studies/*.json`), read at build time and by tests.
 * A file that is not a valid study throws, naming the file, so the build fails.
 */
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { MAX_STUDY_CHARS, parseStudy, type Study } from './schema.ts';

export interface StudyFile { readonly id: string; readonly study: Study }

export function readStudies(content = process.env.DAMPBOOK_CONTENT ?? './content'): StudyFile[] {
  const dir = join(content, 'studies');
  if (!existsSync(dir)) return [];
  return readdirSync(dir).filter((f) => /^[a-z0-9-]+\.json$/.test(f)).sort().map((f) => {
    const st = statSync(join(dir, f));
    // a study is a small text file: refuse devices, folders and anything far over the schema's limit before reading
    if (!st.isFile() || st.size > 4 * MAX_STUDY_CHARS) throw new Error(`${join(dir, f)}: not a study file (a regular file of at most ${4 * MAX_STUDY_CHARS} bytes)`);
    const p = parseStudy(readFileSync(join(dir, f), 'utf8'));
    if (!p.ok) throw new Error(`${join(dir, f)}: ${p.message}`);
    // /studies/open/ prints the study open in a browser: no built-in study may take that address
    if (f === 'open.json') throw new Error(`${join(dir, f)}: the study id 'open' is reserved; rename the file`);
    return { id: f.replace(/\.json$/, ''), study: p.study };
  });
}

let stepCalculators: Record<string, string[]> | undefined;

/** Each built-in study's step calculators, by study id (read once per build: every calculator page carries it as a loading hint). */
export function builtInStepCalculators(): Record<string, string[]> {
  stepCalculators ??= Object.fromEntries(readStudies().map((f) => [f.id, [...new Set(f.study.steps.map((s) => s.calculator))]]));
  return stepCalculators;
}
