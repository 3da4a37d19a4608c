/**
 * `dampbook batch` throughput: sdof cases per second through the whole command (read the CSV,
 * one calc per row, write the results file) with the default threads, with every thread started
 * at once (--jobs N) and with --jobs 1,
 * against one process per case (the cost of calling `npx dampbook calc` in a loop: 10 single
 * `calc` processes timed, the median extrapolated). Target ≥ 20,000 rows/s (issue 17). Part of
 * `npm run bench` (bench/run.ts); alone: npx tsx bench/batch.bench.ts [rows]
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { main } from '../src/cli/main.ts';
import { median } from './lib/timing.ts';

const TARGET_ROWS_PER_S = 20_000;

/** `jobs` undefined: the command's default (every core once the rows are worth it). */
async function timedBatch(csv: string, out: string, jobs: number | undefined): Promise<number> {
  const t0 = performance.now();
  const code = await main(['batch', 'sdof', '--csv', csv, '--out', out, ...(jobs === undefined ? [] : ['--jobs', String(jobs)])], () => {}, (s) => process.stderr.write(`${s}\n`));
  if (code !== 0) throw new Error(`batch bench: exit ${code}`);
  return (performance.now() - t0) / 1000;
}

export async function batchBench(rows = 20_000) {
  const dir = mkdtempSync(join(tmpdir(), 'dampbook-batch-bench-'));
  try {
    // invented cases over light to heavy damping
    const lines = ['m,k,c,x0,v0'];
    for (let i = 0; i < rows; i++) lines.push(`${1 + (i % 97)},${500 + 37 * i},${2 + ((i * 13) % 4000)},0.01,0`);
    const csv = join(dir, 'cases.csv');
    writeFileSync(csv, `${lines.join('\n')}\n`);
    const out = join(dir, 'results.csv');
    const jobs = availableParallelism();
    process.stderr.write(`batch: ${rows} sdof rows, the default (up to ${jobs} threads)…\n`);
    const all = await timedBatch(csv, out, undefined);
    process.stderr.write(`batch: --jobs ${jobs} (threads started at once)…\n`);
    const forced = await timedBatch(csv, out, jobs);
    process.stderr.write('batch: --jobs 1…\n');
    const one = await timedBatch(csv, out, 1);
    process.stderr.write('batch: 10 single calc processes…\n');
    const single: number[] = [];
    for (let i = 0; i < 10; i++) {
      const t0 = performance.now();
      const r = spawnSync('node', ['bin/dampbook.mjs', 'calc', 'sdof', '--in', `m=${1 + i}`, '--in', 'k=4000', '--in', 'c=40'], { encoding: 'utf8' });
      if (r.status !== 0) throw new Error(`batch bench: calc exit ${r.status}`);
      single.push((performance.now() - t0) / 1000);
    }
    const perProcess = median(single);
    const rowsPerS = Math.round(rows / all);
    return {
      rows, jobs,
      defaultSeconds: Number(all.toFixed(2)), rowsPerSecond: rowsPerS,
      forcedThreadsSeconds: Number(forced.toFixed(2)), forcedThreadsRowsPerSecond: Math.round(rows / forced),
      oneJobSeconds: Number(one.toFixed(2)), oneJobRowsPerSecond: Math.round(rows / one),
      singleCalcProcessSeconds: Number(perProcess.toFixed(3)), processPerCaseRowsPerSecond: Number((1 / perProcess).toFixed(2)),
      ratioToProcessPerCase: Math.round(rowsPerS * perProcess),
      target: `≥ ${TARGET_ROWS_PER_S} rows/s`, met: rowsPerS >= TARGET_ROWS_PER_S,
    };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  console.log(JSON.stringify(await batchBench(Number(process.argv[2] ?? 20_000)), null, 2));
}
