/**
 * `dampbook approve` / `check-off` and the sign-off check of `dampbook check`, in temporary copies
 * of the demo content: editing an approved page's method fails check naming the file; approving it
 * again makes check pass; only the sign-off lines of the file change.
 */
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, afterEach, describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

const tmp = mkdtempSync(join(tmpdir(), 'dampbook-approve-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));
const savedEnv = process.env.DAMPBOOK_CONTENT;
afterEach(() => { if (savedEnv === undefined) delete process.env.DAMPBOOK_CONTENT; else process.env.DAMPBOOK_CONTENT = savedEnv; });

function copy(name: string): string {
  const dir = join(tmp, name);
  cpSync('content', dir, { recursive: true });
  return dir;
}
const edit = (file: string, f: (t: string) => string) => writeFileSync(file, f(readFileSync(file, 'utf8')));

describe('approval integrity', () => {
  it('fails check naming an approved page whose method changed; approve makes it pass again', async () => {
    const dir = copy('method-edit');
    const file = join(dir, 'oscillators/sdof.mdx');
    const before = readFileSync(file, 'utf8');
    edit(file, (t) => t.replace('Every damper sizing starts here', 'Every damper sizing begins here'));
    const failed = await run('check', '--content', dir);
    expect(failed.code).toBe(1);
    expect(failed.out).toMatch(/FAIL .*oscillators\/sdof\.mdx: changed since approval: .*approvalHash [0-9a-f]{16}, now [0-9a-f]{16}/);
    expect(failed.out.split('\n').filter((l) => l.startsWith('FAIL'))).toHaveLength(1);

    const allowed = await run('check', '--content', dir, '--allow-changed');
    expect(allowed.code).toBe(0);
    expect(allowed.out).toMatch(/warn .*oscillators\/sdof\.mdx: changed since approval/);

    const signed = await run('approve', 'sdof', '--by', 'Ines Marrow', '--date', '2026-12-03', '--content', dir);
    expect(signed.code).toBe(0);
    expect(signed.out).toMatch(/sdof rev B approved by Ines Marrow on 2026-12-03; approvalHash [0-9a-f]{16}/);
    expect((await run('check', '--content', dir)).code).toBe(0);
    // only the method edit, the date and the hash differ from the original file
    const after = readFileSync(file, 'utf8').split('\n');
    const changed = before.split('\n').filter((l, i) => l !== after[i]);
    expect(changed).toHaveLength(3);
    expect(changed.map((l) => l.split(':')[0])).toEqual(['approved', 'approvalHash', expect.stringContaining('Every damper sizing starts here')]);
  });

  it("fails a checked page whose verification case changed, through DAMPBOOK_CONTENT; check-off seals it again", async () => {
    const dir = copy('case-edit');
    const file = join(dir, 'duty/impact.mdx');
    edit(file, (t) => t.replace(/^(\s+tolerance: )(\S+)/m, (_m, a: string, b: string) => `${a}${Number(b) * 2}`));
    process.env.DAMPBOOK_CONTENT = dir;
    const failed = await run('check');
    expect(failed.code).toBe(1);
    expect(failed.out).toMatch(/FAIL .*duty\/impact\.mdx: changed since check/);
    expect((await run('check-off', 'impact', '--by', 'Tobias Quell')).code).toBe(0);
    expect((await run('check')).code).toBe(0);
  });

  it('fails a signed-off page that has no hash, and refuses to approve a page nobody checked', async () => {
    const dir = copy('no-hash');
    edit(join(dir, 'oscillators/sdof.mdx'), (t) => t.replace(/^approvalHash: .*\n/m, ''));
    const r = await run('check', '--content', dir);
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/FAIL .*sdof\.mdx: approved but has no approvalHash: run dampbook approve sdof/);
    expect((await run('new', 'handbook/fresh-page', '--content', dir, '--by', 'Rana Oduya')).code).toBe(0);
    const refused = await run('approve', 'fresh-page', '--by', 'Ines Marrow', '--content', dir);
    expect(refused.code).toBe(2);
    expect(refused.err).toMatch(/not written: .*fresh-page\.mdx would fail check: checkedBy: a approved page needs checkedBy/);
    expect((await run('approve', 'no-such-page', '--by', 'Ines Marrow', '--content', dir)).code).toBe(2);
    expect((await run('approve', 'sdof', '--content', dir)).err).toMatch(/needs --by/);
  });
});
