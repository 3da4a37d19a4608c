/**
 * What held against the red team, kept under test: `new` refuses any slug that could leave the
 * content folder (nothing is written outside it), and hostile YAML frontmatter — alias bombs,
 * language-specific tags, prototype keys, deep nesting, duplicate keys, control characters — is
 * reported by `check` as one escaped FAIL line per page, never a crash, a hang or a polluted
 * prototype; the other pages are still checked. Behaviour, no reference values.
 */
import { cpSync, existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';

const tmp = mkdtempSync(join(tmpdir(), 'dampbook-held-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

async function run(...argv: string[]): Promise<{ code: number; out: string[]; err: string[] }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, (s) => out.push(s), (s) => err.push(s));
  return { code, out, err };
}

describe('new refuses traversal', () => {
  it.each(['../escape', 'a/../../escape', '/etc/escape', '..', 'thermal/../../x', 'a/b/c', 'thermal\\..\\x', 'Thermal/x', 'thermal/x.mdx'])('refuses the slug %j and writes nothing', async (slug) => {
    const content = join(tmp, `c-${Math.random().toString(36).slice(2)}`);
    mkdirSync(content);
    const r = await run('new', slug, '--title', 'A fine page', '--content', content);
    expect(r.code).toBe(2);
    expect(r.err).toHaveLength(1);
    expect(r.err[0]).toMatch(/slug/);
    expect(readdirSync(content)).toEqual([]);
    expect(existsSync(join(tmp, 'escape.mdx'))).toBe(false);
  });
});

describe('check on hostile YAML frontmatter', () => {
  const bomb = ['a: &a ["x","x","x","x","x","x","x","x","x"]', ...Array.from({ length: 8 }, (_, i) => `${String.fromCharCode(98 + i)}: &${String.fromCharCode(98 + i)} [*${String.fromCharCode(97 + i)},*${String.fromCharCode(97 + i)},*${String.fromCharCode(97 + i)},*${String.fromCharCode(97 + i)},*${String.fromCharCode(97 + i)},*${String.fromCharCode(97 + i)},*${String.fromCharCode(97 + i)},*${String.fromCharCode(97 + i)},*${String.fromCharCode(97 + i)}]`)].join('\n');
  const cases: [string, string][] = [
    ['alias-bomb', bomb],
    ['js-tag', 'id: x\ntitle: !!js/function "function () { globalThis.pwned = 1 }"'],
    ['proto', 'id: proto-page\n__proto__: { polluted: true }\nconstructor: { prototype: { polluted: true } }'],
    ['deep', `id: deep\ntitle: ${'['.repeat(5000)}${']'.repeat(5000)}`],
    ['duplicate', 'id: dup\nid: dup2'],
    ['controls', 'id: "ctl\\u001b[31m"\ntitle: "forged\\nok   line"'],
  ];

  it('reports each hostile page on its own FAIL line, escaped, and checks the rest', async () => {
    const content = join(tmp, 'yaml');
    cpSync('content/oscillators', join(content, 'oscillators'), { recursive: true });
    cpSync('content/handbook.config.json', join(content, 'handbook.config.json'));
    mkdirSync(join(content, 'hostile'));
    for (const [name, yaml] of cases) writeFileSync(join(content, 'hostile', `${name}.mdx`), `---\n${yaml}\n---\n\nBody.\n`);
    const r = await run('check', '--content', content);
    expect(r.code).toBe(1);
    for (const [name] of cases) expect(r.out.some((l) => l.startsWith(`FAIL ${join(content, 'hostile', `${name}.mdx`)}`)), name).toBe(true);
    expect(r.out.filter((l) => l.startsWith('ok   ')).length).toBeGreaterThanOrEqual(3); // sdof, forced-response, tmd-tuning
    // eslint-disable-next-line no-control-regex
    for (const l of r.out) expect(l).not.toMatch(/[\u0000-\u001f]/);
    expect(r.out.some((l) => l.startsWith('ok   line'))).toBe(false);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect((globalThis as Record<string, unknown>).pwned).toBeUndefined();
  });

  it('an unknown tag with an escape sequence is a FAIL line, not a raw warning of the YAML library on stderr', async () => {
    const { spawnSync } = await import('node:child_process');
    const content = join(tmp, 'tag');
    mkdirSync(content);
    cpSync('content/handbook.config.json', join(content, 'handbook.config.json'));
    writeFileSync(join(content, 'h.mdx'), '---\nid: x\ntitle: !<tag:\u001b[31mRED> "a"\n---\n');
    const r = spawnSync('node', ['bin/dampbook.mjs', 'check', '--content', content], { encoding: 'utf8', timeout: 30_000 });
    expect(r.status).toBe(1);
    expect(r.stderr).toBe('');
    expect(r.stdout).not.toContain('\u001b');
    expect(r.stdout).toMatch(/FAIL .*h\.mdx: frontmatter is not valid YAML: Unresolved tag: tag:\\u001b\[31mRED/);
  });
});
