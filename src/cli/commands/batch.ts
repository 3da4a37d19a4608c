/**
 * `dampbook batch <id> --csv cases.csv [--out results.csv] [--jobs N] [--json]`: one `calc` per
 * row (src/cli/batch/rows.ts), on every core by default when the rows are worth it
 * (src/cli/batch/pool.ts), results in the
 * order of the rows. A refused row gets its one-line message in the `error` column and the run
 * goes on; the exit code is 1 when any row was refused, and stderr says how many.
 */
import { writeFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { resolve } from 'node:path';
import { UsageError, type ParsedArgs } from '../args.ts';
import { CsvError } from '../batch/csv.ts';
import { runRows, type ThreadPlan } from '../batch/pool.ts';
import { progressBar } from '../batch/progress.ts';
import { readCases, resultLines } from '../batch/table.ts';
import { requireCalculator } from '../lookup.ts';
import { FileReadError, readBoundedFile } from '../readFile.ts';

/** Largest case file read (about a million rows of a five-input calculator). */
export const BATCH_FILE_LIMIT = 50 * 1024 * 1024;
const MAX_JOBS = 64;

function stringFlag(args: ParsedArgs, name: string): string | undefined {
  const v = args.flags.get(name);
  if (v === true) throw new UsageError(`--${name} needs a value`);
  return v;
}

/** Without --jobs: every core, once the rows are seen to be worth it (pool.ts); with it: N threads. */
function plan(args: ParsedArgs): ThreadPlan {
  const v = stringFlag(args, 'jobs');
  if (v === undefined) return { threads: availableParallelism(), measure: true };
  if (!/^\d+$/.test(v) || Number(v) < 1 || Number(v) > MAX_JOBS) throw new UsageError(`--jobs ${v}: expected a whole number from 1 to ${MAX_JOBS}`);
  return { threads: Number(v), measure: false };
}

export async function batch(args: ParsedArgs, out: (s: string) => void, err: (s: string) => void): Promise<number> {
  if (args.positionals.length > 2) throw new UsageError(`batch takes one calculator id, got: ${args.positionals.slice(1).join(' ')}`);
  const def = requireCalculator('batch', args.positionals[1]);
  const csvPath = stringFlag(args, 'csv');
  if (csvPath === undefined) throw new UsageError('batch needs --csv <cases.csv> (header = input keys, one case per row)');
  const outPath = stringFlag(args, 'out');
  if (outPath !== undefined && resolve(outPath) === resolve(csvPath)) throw new UsageError('--out must not be the --csv file (it would overwrite the cases)');
  const threads = plan(args);
  let cases;
  try {
    cases = readCases(def, readBoundedFile(csvPath, BATCH_FILE_LIMIT).text, csvPath);
  } catch (e) {
    if (e instanceof FileReadError) throw new UsageError(e.message);
    if (e instanceof CsvError) throw new UsageError(`${csvPath}: ${e.message}`);
    throw e;
  }
  const json = args.flags.has('json');
  const bar = progressBar(cases.rows.length);
  let results;
  try {
    const content = stringFlag(args, 'content');
    results = await runRows({ id: def.id, header: cases.header, withInputs: json, ...(content !== undefined ? { content } : {}) }, cases.rows, threads, (n) => bar.update(n));
  } finally {
    bar.end();
  }
  const lines = json ? [JSON.stringify(results)] : resultLines(def, cases, results);
  if (outPath === undefined) for (const l of lines) out(l);
  else {
    try { writeFileSync(outPath, `${lines.join('\n')}\n`); } catch (e) { throw new UsageError(`cannot write ${outPath}: ${(e as { code?: string }).code ?? 'error'}`); }
  }
  const failed = results.filter((r) => 'error' in r).length;
  if (failed) err(`dampbook: ${failed} of ${results.length} rows refused (see the error ${json ? 'fields' : 'column'})`);
  return failed ? 1 : 0;
}
