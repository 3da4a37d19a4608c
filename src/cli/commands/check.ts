import { existsSync, readFileSync } from 'node:fs';
import type { PageMeta } from '../../content/schema.ts';
import { pageBody, sealState } from '../../content/seal.ts';
import { failureReport, verifyPage } from '../../content/verify.ts';
import { UsageError, type ParsedArgs } from '../args.ts';
import { calculators, teamFileOf } from '../../calculators/registry.ts';
import { checkTeamCalculators } from '../../team/checkTeam.ts';
import { contentDirOf } from '../contentDir.ts';
import { readPages } from '../pages.ts';

/** Why a signed-off page no longer matches its seal, or undefined when it does (or is a draft). */
function sealProblem(file: string, meta: PageMeta): string | undefined {
  const s = sealState(meta, pageBody(readFileSync(file, 'utf8')));
  if (s.state === 'draft' || s.state === 'current') return undefined;
  const since = s.status === 'approved' ? 'approval' : 'check';
  const redo = `${s.status === 'approved' ? 'approve' : 'check-off'} ${meta.id} --by "<name>"`;
  return s.state === 'unsealed'
    ? `${s.status} but has no ${s.field}: run dampbook ${redo}`
    : `changed since ${since}: the method, calculators or verification cases differ from what was ${s.status} (${s.field} ${s.recorded}, now ${s.computed}); review it and run dampbook ${redo}`;
}

/**
 * `dampbook check [--content dir]`: validates every page's frontmatter with the site's schema
 * and runs every verification case against the core. Exit 1 on any failure, naming the page,
 * the case, the expected and the computed values, and on a checked or approved page that no longer
 * matches its sign-off hash (a warning instead with --allow-changed, for drafts in progress).
 * The folder's own calculators (registered by main.ts from `<dir>/calculators/`) run their
 * verification cases and the bad-input rules too.
 */
export function check(args: ParsedArgs, out: (s: string) => void): number {
  const dir = contentDirOf(args);
  const allowChanged = args.flags.has('allow-changed');
  if (!existsSync(dir)) throw new UsageError(`no content folder '${dir}'`);
  const pages = readPages(dir);
  const lines: string[] = [];
  let failed = 0;
  let checks = 0;
  const ids = new Map<string, string>();
  for (const p of pages) {
    if (!p.meta) {
      failed++;
      for (const e of p.errors) lines.push(`FAIL ${p.file}: ${e}`);
      continue;
    }
    const dup = ids.get(p.meta.id);
    if (dup) { failed++; lines.push(`FAIL ${p.file}: id: '${p.meta.id}' is already the id of ${dup}`); }
    ids.set(p.meta.id, p.file);
    const v = verifyPage(p.meta);
    checks += v.rows.length;
    if (v.failures.length || v.problems.length) {
      failed++;
      lines.push(...failureReport(`FAIL ${p.file}`, v).split('\n'));
      continue;
    }
    const sealed = sealProblem(p.file, p.meta);
    if (sealed && !allowChanged) { failed++; lines.push(`FAIL ${p.file}: ${sealed}`); continue; }
    if (sealed) lines.push(`warn ${p.file}: ${sealed}`);
    const cases = new Set(v.rows.map((r) => r.case)).size;
    lines.push(`ok   ${p.file}: ${p.meta.id} rev ${p.meta.revision} ${p.meta.status}; ${cases} case(s), ${v.rows.length} check(s) pass`);
  }
  const team = checkTeamCalculators(calculators.flatMap((calc) => { const file = teamFileOf(calc.id); return file ? [{ file, calc }] : []; }));
  lines.push(...team.lines);
  checks += team.checks;
  failed += team.failed;
  for (const l of lines) out(l);
  const own = team.lines.length ? ` and ${team.lines.length} team calculator(s)` : '';
  out(`${pages.length} page(s)${own}, ${checks} verification check(s): ${failed === 0 ? 'all pass' : `${failed} page(s) or calculator(s) failed`}`);
  if (pages.length === 0) { out(`no pages found under ${dir}`); return 1; }
  return failed === 0 ? 0 : 1;
}
