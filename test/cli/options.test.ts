/**
 * Options a command does not read are refused with a one-line message naming the option and the
 * ones it takes (`--out` was accepted and read by no command); a value option with no value is
 * refused rather than replaced by a default. Documented invocations (README) keep working.
 * No reference values (behaviour).
 */
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

describe('CLI options', () => {
  it.each([
    [['calc', 'sdof', '--in', 'm=10', '--in', 'k=4000', '--in', 'c=40', '--out', 'x.json'], /calc does not take --out/],
    [['list', '--out', 'x'], /list does not take --out/],
    [['check', '--jsn'], /check does not take --jsn/],
    [['list', '--in', 'm=1'], /list does not take --in/],
    [['calc', '--record', 'r.json', '--in', 'm=1'], /--in.*--record/],
    [['new', 'thermal/fin-cooling', '--content', '/nonexistent-dampbook-dir', '--title'], /--title needs a value/],
  ])('refuses %j with one line', async (argv, msg) => {
    const r = await run(...argv);
    expect(r.code).toBe(2);
    expect(r.err.split('\n')).toHaveLength(1);
    expect(r.err).toMatch(msg);
  });

  it('keeps documented invocations', async () => {
    expect((await run('calc', 'sdof', '--in', 'm=10', '--in', 'k=4000', '--in', 'c=40', '--json')).code).toBe(0);
    expect((await run('list', '--json')).code).toBe(0);
    expect((await run('list')).code).toBe(0);
    expect((await run('help')).code).toBe(0);
    expect((await run('calc', '--help')).code).toBe(0);
  });
});
