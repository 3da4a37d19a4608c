import { existsSync, readFileSync } from 'node:fs';
import { getCalculator } from '../../calculators/registry.ts';
import { MAX_RECORD_CHARS, parseRecord } from '../../records/record.ts';
import { replayRecord } from '../../records/replay.ts';
import { UsageError, type ParsedArgs } from '../args.ts';
import { readPages } from '../pages.ts';
import { FileReadError, readBoundedFile } from '../readFile.ts';

function coreVersion(): string {
  return (JSON.parse(readFileSync(new URL('../../../package.json', import.meta.url), 'utf8')) as { version: string }).version;
}

/**
 * `dampbook calc --record file.json [--content dir] [--json]`: recomputes a saved record with
 * this core and reports every output that differs; warns when the page revision or the core
 * version differs from the record's. Exit 1 when an output is not reproduced.
 */
export function recordCheck(args: ParsedArgs, out: (s: string) => void): number {
  const file = args.flags.get('record');
  if (typeof file !== 'string') throw new UsageError('--record needs a file: dampbook calc --record record.json');
  let text: string;
  // regular files only, at most the limit + 1 bytes read (a UTF-16 unit is at most 3 UTF-8 bytes)
  try { text = readBoundedFile(file, MAX_RECORD_CHARS * 3 + 3).text; } catch (e) { throw e instanceof FileReadError ? new UsageError(e.message) : e; }
  const parsed = parseRecord(text);
  if (!parsed.ok) throw new UsageError(`${file}: ${parsed.message}`);
  const rec = parsed.record;
  const calc = getCalculator(rec.calculator);
  if (!calc) throw new UsageError(`${file}: no calculator has the id '${rec.calculator}'`);
  const own = parseRecord(text, calc);
  if (!own.ok) throw new UsageError(`${file}: ${own.message}`);
  const dir = typeof args.flags.get('content') === 'string' ? (args.flags.get('content') as string) : 'content';
  const page = rec.page && existsSync(dir) ? readPages(dir).find((p) => p.meta?.id === rec.page!.id)?.meta : undefined;
  const r = replayRecord(calc, rec, { coreVersion: coreVersion(), page: page ? { id: page.id, revision: page.revision } : undefined });
  if (!r.ok) throw new UsageError(`${file}: ${r.message}`);
  const warnings = [...r.warnings, ...(rec.page && !page ? [`page '${rec.page.id}' is not in ${dir}: its revision was not compared`] : [])];
  const reproduced = r.diffs.length === 0;
  if (args.flags.has('json')) {
    out(JSON.stringify({ id: calc.id, reproduced, matched: r.matched, differences: r.diffs, warnings, outputs: r.outputs }));
    return reproduced ? 0 : 1;
  }
  out(`${calc.title} (${calc.id}) — record of ${rec.time}${rec.page ? `, page ${rec.page.id} rev ${rec.page.revision}` : ''}, core ${rec.coreVersion}`);
  out(`  ${r.matched} of ${Object.keys(rec.outputs).length} recorded outputs reproduced`);
  for (const d of r.diffs) out(`  DIFFERS ${d.key}: recorded ${String(d.recorded)}, computed ${String(d.computed ?? '—')}${d.difference !== undefined ? ` (relative difference ${d.difference.toExponential(2)})` : ''}`);
  for (const w of warnings) out(`  warning: ${w}`);
  return reproduced ? 0 : 1;
}
