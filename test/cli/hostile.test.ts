/**
 * Bad command lines: each exits non-zero with exactly one line on stderr, no stack trace, and,
 * for an input problem, the name of the input. A few run the real bin through Node, as a user
 * would; the per-calculator cases (every registered calculator) call the same main() in-process
 * to keep the suite fast.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { calculators } from '../../src/calculators/registry.ts';
import { main } from '../../src/cli/main.ts';

function dampbook(...argv: string[]): { status: number | null; stdout: string; stderr: string } {
  const r = spawnSync('node', ['bin/dampbook.mjs', ...argv], { encoding: 'utf8', env: { ...process.env, DAMPBOOK_DEBUG: '' } });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

async function inProcess(...argv: string[]): Promise<{ status: number; stdout: string; stderr: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const status = await main(argv, (x) => out.push(x), (x) => err.push(x));
  return { status, stdout: out.join('\n'), stderr: err.join('\n') };
}

function expectOneLineError(r: { status: number | null; stderr: string }, mentions?: RegExp): void {
  expect(r.status, r.stderr).not.toBe(0);
  expect(r.stderr.trim().split('\n'), r.stderr).toHaveLength(1);
  expect(r.stderr).toMatch(/^dampbook: /);
  expect(r.stderr).not.toMatch(/\n\s+at |\.ts:\d+|node:internal/);
  if (mentions) expect(r.stderr).toMatch(mentions);
}

describe('dampbook with bad invocations', () => {
  const dir = mkdtempSync(join(tmpdir(), 'dampbook-cli-'));
  const bigFile = join(dir, 'big.csv');
  writeFileSync(bigFile, 'x'.repeat(21 * 1024 * 1024));

  it.each([
    [['frobnicate'], /unknown command/],
    [['calc'], /needs a calculator id/],
    [['calc', 'no-such-calculator'], /unknown calculator/],
    [['calc', 'sdof', '--in', '__proto__=1'], /has no input '__proto__'/],
    [['calc', 'sdof', '--in', 'm=<img src=x onerror=alert(1)>', '--in', 'k=4000', '--in', 'c=40'], /'m'/],
  ])('refuses %j with one line', (argv, mentions) => {
    expectOneLineError(dampbook(...argv), mentions);
  });

  it.each([
    [['calc', 'sdof', '--in'], /--in needs key=value/],
    [['calc', 'sdof', '--in', 'novalue'], /expected key=value/],
    [['calc', 'sdof', '--in', '=3'], /expected key=value/],
    [['calc', 'sdof', '--in', 'constructor=1'], /has no input 'constructor'/],
    [['calc', 'sdof', '--in', 'toString=1'], /has no input 'toString'/],
  ])('refuses %j with one line (in-process)', async (argv, mentions) => {
    expectOneLineError(await inProcess(...argv), mentions);
  });

  for (const calc of calculators) {
    const num = calc.inputs.find((d) => d.kind !== 'choice' && d.kind !== 'text' && d.required) ?? calc.inputs.find((d) => d.kind !== 'choice' && d.kind !== 'text');
    const choice = calc.inputs.find((d) => d.kind === 'choice');
    const text = calc.inputs.find((d) => d.kind === 'text');
    const bad: [string, string[]][] = [];
    if (num) {
      for (const v of ['NaN', 'Infinity', '-1e999', '1e999', 'abc', '12 furlongs', '<script>alert(1)</script>', '', '9'.repeat(5000)]) bad.push([`${num.key}=${v.slice(0, 20)}`, [`${num.key}=${v}`]]);
    }
    if (choice) bad.push([`${choice.key}=not-an-option`, [`${choice.key}=not-an-option`]]);
    if (text) {
      bad.push([`${text.key}=@missing.csv`, [`${text.key}=@${join(dir, 'missing.csv')}`]]);
      bad.push([`${text.key}=@big.csv (21 MB)`, [`${text.key}=@${bigFile}`]]);
    }
    for (const [label, ins] of bad) {
      it(`${calc.id}: exits non-zero naming the input for ${label}`, async () => {
        const key = ins[0]!.split('=')[0]!;
        // every other required input is given its default, so only the bad one is wrong
        const others = calc.inputs.filter((d) => d.required && d.key !== key && d.kind !== 'text').map((d) => `${d.key}=${String(d.default)}`);
        const r = await inProcess('calc', calc.id, ...[...others, ...ins].flatMap((kv) => ['--in', kv]));
        expectOneLineError(r, new RegExp(`'${key}'`));
      });
    }
  }
});
