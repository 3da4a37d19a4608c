/**
 * Files given to the CLI (`--in key=@file`, `calc --record file`): at most the limit + 1 bytes are
 * read, only regular files are read (devices, directories and FIFOs are refused with a message,
 * quickly), nothing of a file's contents is echoed in an error, and `--json` summarises text
 * inputs (file, characters, rows, SHA-256) instead of echoing them.
 * Reference values: SHA-256 of the file's bytes from node:crypto (closed form: the same digest
 * `sha256sum` prints); ring-down's damping ratio of its own demo record is not checked here.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { getCalculator } from '../../src/calculators/registry.ts';
import { main } from '../../src/cli/main.ts';

const dir = mkdtempSync(join(tmpdir(), 'dampbook-files-'));

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

/** The real bin with a time limit: an unbounded read or a blocking open fails the test instead of hanging. */
function bin(...argv: string[]): { status: number | null; stdout: string; stderr: string } {
  const r = spawnSync('node', ['bin/dampbook.mjs', ...argv], { encoding: 'utf8', timeout: 20_000, env: { ...process.env, DAMPBOOK_DEBUG: '' } });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

function expectOneLine(r: { status: number | null; stderr: string }, mentions: RegExp): void {
  expect(r.status, r.stderr).not.toBe(null); // null: killed at the time limit (hung or read without end)
  expect(r.status, r.stderr).not.toBe(0);
  expect(r.stderr.trim().split('\n'), r.stderr).toHaveLength(1);
  expect(r.stderr).toMatch(mentions);
}

const demo = String(getCalculator('ring-down')!.inputs.find((i) => i.key === 'record')!.default);

describe('files the CLI reads', () => {
  const fifo = join(dir, 'fifo');
  execFileSync('mkfifo', [fifo]);

  it.each([
    ['/dev/zero', /record.*not a regular file/],
    ['/dev/urandom', /record.*not a regular file/],
    [dir, /record.*directory/],
    [fifo, /record.*FIFO/],
  ])('calc refuses --in record=@%s quickly with one line', (path, msg) => {
    expectOneLine(bin('calc', 'ring-down', '--in', `record=@${path}`), msg);
  });

  it.each([
    ['/dev/zero', /not a regular file/],
    [dir, /directory/],
    [fifo, /FIFO/],
  ])('calc --record refuses %s quickly with one line', (path, msg) => {
    expectOneLine(bin('calc', '--record', path), msg);
  });

  it.each([
    ['/dev/zero', /study.*not a regular file/],
    [dir, /study.*directory/],
    [fifo, /study.*FIFO/],
  ])('study run refuses %s quickly with one line', (path, msg) => {
    expectOneLine(bin('study', 'run', path), msg);
  });

  it('calc --record reads a record file with a UTF-8 byte-order mark as the browser does', async () => {
    const { evaluate } = await import('../../src/calculators/evaluate.ts');
    const { makeRecord } = await import('../../src/records/replay.ts');
    const sdof = getCalculator('sdof')!;
    const r = evaluate(sdof, { m: 10, k: 4000, c: 40 });
    const f = join(dir, 'bom.json');
    writeFileSync(f, `\uFEFF${JSON.stringify(makeRecord(sdof, r.values, r.outputs, {}, { coreVersion: '0.1.0' }))}`);
    const out = await run('calc', '--record', f, '--json');
    expect(out.code, out.err).toBe(0);
    expect((JSON.parse(out.out) as { reproduced: boolean }).reproduced).toBe(true);
  });

  it('refuses a file larger than the input allows without reading it all', async () => {
    const big = join(dir, 'big.csv');
    writeFileSync(big, 'x'.repeat(6_000_010)); // ring-down record: maxLength 2,000,000 characters (≤ 6,000,003 bytes)
    const r = await run('calc', 'ring-down', '--in', `record=@${big}`);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/'record'.*larger than 6000003 bytes/);
  });

  it('never echoes a file that is not a record (a secret file stays secret)', async () => {
    const secret = join(dir, 'shadow');
    writeFileSync(secret, 'root:$6$SECRETHASHxyz:19000:0:99999:7:::\ndaemon:*:19000:0:99999:7:::\n');
    const r = await run('calc', 'ring-down', '--in', `record=@${secret}`);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/'record'/);
    expect(r.err).not.toMatch(/SECRET|root:|daemon/);
    expect(r.err.split('\n')).toHaveLength(1);
  });

  it('--json summarises a text input (file, rows, characters, SHA-256 of the bytes) and does not echo it', async () => {
    const f = join(dir, 'ring.csv');
    writeFileSync(f, demo);
    const r = await run('calc', 'ring-down', '--in', `record=@${f}`, '--json');
    expect(r.code, r.err).toBe(0);
    expect(r.out.length).toBeLessThan(demo.length);
    const j = JSON.parse(r.out) as { inputs: Record<string, unknown>; texts: { key: string; file: string; rows: number; characters: number; sha256: string }[] };
    const sha = createHash('sha256').update(demo, 'utf8').digest('hex').slice(0, 12);
    const rows = demo.split('\n').filter((l) => l.trim() !== '').length;
    expect(j.texts).toEqual([{ key: 'record', file: 'ring.csv', characters: demo.length, rows, sha256: sha }]);
    expect(j.inputs.record).toBe(`ring.csv, ${rows} rows, ${demo.length} characters, sha256 ${sha}`);
  });

  it('reads a text file with a UTF-8 byte-order mark as the browser does', async () => {
    const f = join(dir, 'bom.csv');
    writeFileSync(f, `\uFEFF${demo}`);
    const plain = join(dir, 'plain.csv');
    writeFileSync(plain, demo);
    const a = await run('calc', 'ring-down', '--in', `record=@${f}`, '--json');
    const b = await run('calc', 'ring-down', '--in', `record=@${plain}`, '--json');
    expect(a.code, a.err).toBe(0);
    expect((JSON.parse(a.out) as { outputs: unknown }).outputs).toEqual((JSON.parse(b.out) as { outputs: unknown }).outputs);
  });
});

describe('calc --record keeps the SI-only rule of the old power-law key c', () => {
  // behaviour, no reference value: the power law's C has a unit that depends on α, so an old
  // record giving it in lbf·s/in is refused exactly as the page's record import refuses it
  it('refuses a power-law C recorded in lbf·s/in with one line naming c, and nothing else is computed', async () => {
    const { evaluate } = await import('../../src/calculators/evaluate.ts');
    const { makeRecord } = await import('../../src/records/replay.ts');
    const epc = getCalculator('energy-per-cycle')!;
    const base = evaluate(epc, { law: 'power', Fref: 1500 });
    const rec = makeRecord(epc, base.values, base.outputs, {}, { coreVersion: '0.1.0' }, new Date('2026-12-02T10:00:00Z'));
    const f = join(dir, 'power-us.json');
    writeFileSync(f, JSON.stringify({ ...rec, inputs: { ...rec.inputs, c: { value: 1500, unit: 'lbf.s/in' } } }));
    const r = await run('calc', '--record', f);
    expect(r.code).not.toBe(0);
    expect(r.out).toBe('');
    expect(r.err.split('\n')).toHaveLength(1);
    expect(r.err).toMatch(/'c'.*SI base units/);
  });
});
