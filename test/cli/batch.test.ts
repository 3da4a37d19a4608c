/**
 * `dampbook batch`: 50,000 sdof cases run on worker threads give, on a sample of rows, the same
 * numbers as `dampbook calc` (withinTolerance 1e-12) and the closed forms of viscously damped
 * free vibration — ωn = √(k/m), ζ = c/(2√(km)), c_cr = 2√(km), ωd = ωn√(1−ζ²) — from Rao,
 * Mechanical Vibrations, 6th ed. (2017), §2.6, Eqs. (2.61)–(2.75) (from memory; the equation
 * numbers may differ) and the same forms in Inman, Engineering Vibration, 4th ed., §1.3 (from
 * memory). Bad rows (negative mass, non-number, unknown unit, missing required input) carry the
 * calculator's own message and do not stop the run; an unknown id, an unknown column and a
 * non-regular file are refused with one line.
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCsv } from '../../src/cli/batch/csv.ts';
import { runRows, type RunStats } from '../../src/cli/batch/pool.ts';
import { main } from '../../src/cli/main.ts';
import { withinTolerance } from '../../src/core/numeric/compare.ts';

const dir = mkdtempSync(join(tmpdir(), 'dampbook-batch-'));
const ROWS = 50_000;
const TOL = 1e-12;

async function run(...argv: string[]): Promise<{ code: number; out: string[]; err: string[] }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, (s) => out.push(s), (s) => err.push(s));
  return { code, out, err };
}

/** Invented demo cases (mass, rate and damping spread over light to heavy damping). */
function caseOf(i: number): [number, number, number, number, number] {
  return [1 + (i % 97), 500 + 37 * i, 2 + ((i * 13) % 4000), 0.005 + (i % 7) * 0.001, (i % 5) * 0.1];
}

function write(name: string, text: string): string {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
}

describe('batch over 50,000 sdof rows', () => {
  it('matches calc and the closed forms on sampled rows, in input order', { timeout: 240_000 }, async () => {
    const lines = ['m,k,c,x0,v0'];
    for (let i = 0; i < ROWS; i++) lines.push(caseOf(i).join(','));
    const csv = write('big.csv', `${lines.join('\r\n')}\r\n`);
    const outFile = join(dir, 'big.out.csv');
    const r = await run('batch', 'sdof', '--csv', csv, '--out', outFile, '--jobs', '2');
    expect(r.err).toEqual([]);
    expect(r.code).toBe(0);
    const [header, ...rows] = parseCsv(readFileSync(outFile, 'utf8'));
    expect(rows).toHaveLength(ROWS);
    const col = (name: string) => header!.indexOf(name);
    for (const i of [0, 1, 4_999, 12_345, 25_000, 37_777, ROWS - 1]) {
      const row = rows[i]!;
      const [m, k, c, x0, v0] = caseOf(i);
      expect(row.slice(0, 5).map(Number)).toEqual([m, k, c, x0, v0]); // input order kept
      const single = await run('calc', 'sdof', '--in', `m=${m}`, '--in', `k=${k}`, '--in', `c=${c}`, '--in', `x0=${x0}`, '--in', `v0=${v0}`, '--json');
      const outputs = JSON.parse(single.out[0]!).outputs as Record<string, number | string>;
      for (const [key, v] of Object.entries(outputs)) {
        if (typeof v === 'number') expect(withinTolerance(Number(row[col(key)]), v, TOL), `row ${i + 1} ${key}`).toBe(true);
        else expect(row[col(key)]).toBe(v);
      }
      // Rao §2.6 closed forms (from memory)
      const wn = Math.sqrt(k / m);
      const zeta = c / (2 * Math.sqrt(k * m));
      expect(withinTolerance(Number(row[col('wn')]), wn, TOL)).toBe(true);
      expect(withinTolerance(Number(row[col('zeta')]), zeta, TOL)).toBe(true);
      expect(withinTolerance(Number(row[col('ccr')]), 2 * Math.sqrt(k * m), TOL)).toBe(true);
      if (zeta < 1) expect(withinTolerance(Number(row[col('wd')]), wn * Math.sqrt(1 - zeta * zeta), TOL)).toBe(true);
      expect(row[col('error')]).toBe('');
    }
  });
});

describe('bad rows are reported, not fatal', () => {
  const text = 'm,k,c\n10,4000,40\n-1,4000,40\n10,abc,40\n10,4000,3 furlongs\n,4000,40\n10,"25 kN/m",40\n10,4000\n';
  it('CSV: each bad row has its one-line message in the error column; exit 1 with the count', async () => {
    const r = await run('batch', 'sdof', '--csv', write('bad.csv', text), '--jobs', '1');
    expect(r.code).toBe(1);
    expect(r.err).toEqual(['dampbook: 5 of 7 rows refused (see the error column)']);
    const [header, ...rows] = parseCsv(r.out.join('\n'));
    const error = rows.map((row) => row[header!.indexOf('error')]);
    expect(error[0]).toBe('');
    expect(error[1]).toMatch(/^input 'm' = -1; allowed \[0\.000001, 10000000\] kg$/);
    expect(error[2]).toMatch(/^input 'k' = "abc" \('abc' is not a number/);
    expect(error[3]).toMatch(/^input 'c' = "3 furlongs" \(unit 'furlongs' is not a unit of damping/);
    expect(error[4]).toMatch(/^input 'm' = missing \(required\)/);
    expect(error[5]).toBe('');
    expect(error[6]).toMatch(/^row has 2 cells, the header has 3 columns$/);
    // 25 kN/m read as 25,000 N/m: ωn = √(25000/10) = 50 rad/s (closed form)
    expect(Number(rows[5]![header!.indexOf('wn')])).toBeCloseTo(50, 12);
  });

  it('--json: {row, inputs, outputs, warnings} or {row, error}, rows numbered from 1', async () => {
    const r = await run('batch', 'sdof', '--csv', write('bad2.csv', text), '--json');
    expect(r.code).toBe(1);
    const results = JSON.parse(r.out[0]!) as { row: number; error?: string; inputs?: Record<string, unknown> }[];
    expect(results.map((x) => x.row)).toEqual([1, 2, 3, 4, 5, 6, 7]);
    expect(results.map((x) => 'error' in x)).toEqual([false, true, true, true, true, false, true]);
    expect(results[5]!.inputs).toMatchObject({ m: 10, k: 25_000, c: 40, x0: 0.01, v0: 0 }); // defaults as calc
  });

  it('a message with control characters stays on one line', async () => {
    const r = await run('batch', 'sdof', '--csv', write('ctl.csv', 'm,k,c\n"1\u001b[31m\n2",4000,40\n'), '--jobs', '1');
    expect(r.code).toBe(1);
    expect(r.out.every((l) => !/[\u0000-\u001f]/.test(l))).toBe(true);
    expect(r.out).toHaveLength(2);
  });
});

describe('refused with one line before any row runs', () => {
  it.each([
    ['unknown calculator id', ['batch', 'no-such', '--csv', 'x.csv'], /^dampbook: unknown calculator 'no-such'; known: sdof, /],
    ['unknown column', ['batch', 'sdof', '--csv', write('col.csv', 'm,k,cc\n1,2,3\n')], /^dampbook: .*col\.csv: sdof has no input 'cc'; inputs: m, k, c, x0, v0$/],
    ['column twice', ['batch', 'sdof', '--csv', write('twice.csv', 'm,k,m\n1,2,3\n')], /column 'm' appears twice$/],
    ['a directory', ['batch', 'sdof', '--csv', dir], /not a regular file$/],
    ['a device', ['batch', 'sdof', '--csv', '/dev/zero'], /^dampbook: cannot read \/dev\/zero: a device, not a regular file$/],
    ['no --csv', ['batch', 'sdof'], /batch needs --csv/],
    ['unclosed quote', ['batch', 'sdof', '--csv', write('quote.csv', 'm,k,c\n1,2,3\n"4,5,6\n')], /quote\.csv: the quoted field opened on line 3 is never closed$/],
    ['empty file', ['batch', 'sdof', '--csv', write('empty.csv', '')], /empty\.csv is empty: the first line must name the inputs/],
    ['bad --jobs', ['batch', 'sdof', '--csv', write('ok.csv', 'm,k,c\n1,2,3\n'), '--jobs', '0'], /--jobs 0: expected a whole number/],
    ['--in', ['batch', 'sdof', '--csv', 'x.csv', '--in', 'm=1'], /batch does not take --in/],
  ])('%s', async (_case, argv, message) => {
    const r = await run(...argv);
    expect(r.code).not.toBe(0);
    expect(r.out).toEqual([]);
    expect(r.err).toHaveLength(1);
    expect(r.err[0]).toMatch(message);
  });
});

describe('the real bin', () => {
  it('writes CSV to stdout and nothing to stderr when stderr is not a terminal (no progress bar)', async () => {
    const { spawnSync } = await import('node:child_process');
    const r = spawnSync('node', ['bin/dampbook.mjs', 'batch', 'sdof', '--csv', write('bin.csv', 'm,k,c\n10,4000,40\n')], { encoding: 'utf8', timeout: 30_000 });
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    // Rao §2.6: ωn = √(4000/10) = 20 rad/s, ζ = 40/(2√40000) = 0.1 (closed form)
    const [header, row] = parseCsv(r.stdout);
    expect(Number(row![header!.indexOf('wn')])).toBe(20);
    expect(Number(row![header!.indexOf('zeta')])).toBeCloseTo(0.1, 15);
  });
});

describe('threads', () => {
  it('worker threads and --jobs 1 write the same file (3,000 rows)', { timeout: 120_000 }, async () => {
    const lines = ['m,k,c,x0,v0'];
    for (let i = 0; i < 3_000; i++) lines.push(caseOf(i * 7).join(','));
    lines.push('-1,1,1,0,0'); // one refused row among them
    const csv = write('mid.csv', `${lines.join('\n')}\n`);
    const a = join(dir, 'mid.2.csv');
    const b = join(dir, 'mid.1.csv');
    expect((await run('batch', 'sdof', '--csv', csv, '--out', a, '--jobs', '2')).code).toBe(1);
    expect((await run('batch', 'sdof', '--csv', csv, '--out', b, '--jobs', '1')).code).toBe(1);
    expect(readFileSync(a, 'utf8')).toBe(readFileSync(b, 'utf8'));
  });
});

describe('how many threads the default starts', () => {
  const rowsOf = (n: number) => Array.from({ length: n }, (_, i) => caseOf(i).map(String));
  const base = { id: 'sdof', header: ['m', 'k', 'c', 'x0', 'v0'], withInputs: false };
  it('none for rows that one thread finishes sooner than a worker starts (3,000 sdof rows)', async () => {
    const stats: RunStats = { workersStarted: 0 };
    const r = await runRows(base, rowsOf(3000), { threads: 2, measure: true }, undefined, stats);
    expect(r).toHaveLength(3000);
    expect(stats.workersStarted).toBe(0);
  });
  it('an explicit --jobs 2 starts its worker at once, and the results are the same', { timeout: 120_000 }, async () => {
    const stats: RunStats = { workersStarted: 0 };
    const rows = rowsOf(3000);
    const forced = await runRows(base, rows, { threads: 2, measure: false }, undefined, stats);
    expect(stats.workersStarted).toBe(1);
    expect(forced).toEqual(await runRows(base, rows, { threads: 1, measure: false }));
  });
});
