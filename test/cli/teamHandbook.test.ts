/**
 * A team's own handbook, outside the project: a temporary folder with its handbook.config.json,
 * one page under its own topic "Machines" and one team calculator (test/cli/fixtures/
 * team-handbook/calculators/peak-pair.ts, importing only `dampbook/calculator` and
 * `dampbook/core`) checks, computes, lists, refuses a clashing id, builds (one build, about a
 * minute), runs live in Chromium and prints. Reference values (the calculator's own verification cases and the check
 * below): δ = ln(x₁/x₂), ζ = δ/√(4π² + δ²), Rao, Mechanical Vibrations, 6th ed., eq. 2.85
 * (from memory); for x₁/x₂ = 2: δ = ln 2 = 0.693147…, ζ = 0.109653 (closed form).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { cpSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';
import { serveStatic } from '../../src/server/staticServer.ts';
import { launch, watchedPage } from '../helpers/browser.ts';
import { expectClose } from '../helpers/expectClose.ts';

const BIN = resolve('bin/dampbook.mjs');
const tmp = mkdtempSync(join(tmpdir(), 'dampbook-team-'));
const content = join(tmp, 'handbook');
const out = join(tmp, 'site');
cpSync('test/cli/fixtures/team-handbook', content, { recursive: true });
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const o: string[] = [];
  const e: string[] = [];
  const code = await main(argv, (s) => o.push(s), (s) => e.push(s));
  return { code, out: o.join('\n'), err: e.join('\n') };
}

/** The installed command, from the temporary folder (not the project) as a team would run it. */
function cli(...argv: string[]) {
  const env: NodeJS.ProcessEnv = { ...process.env };
  for (const k of ['VITEST', 'VITEST_MODE', 'VITEST_POOL_ID', 'VITEST_WORKER_ID', 'TEST', 'NODE_ENV']) delete env[k];
  return spawnSync(process.execPath, [BIN, ...argv], { cwd: tmp, env, encoding: 'utf8' });
}

describe('a handbook folder outside the project', () => {
  it('checks: the page under its own topic, the team calculator\'s cases and the bad-input rules', async () => {
    const r = await run('check', '--content', content);
    expect(r.code, `${r.out}\n${r.err}`).toBe(0);
    expect(r.out).toMatch(/ok {3}.*machines\/spindle-decay\.mdx: spindle-decay/);
    expect(r.out).toMatch(/ok {3}.*peak-pair\.ts: peak-pair; 2 case\(s\), 3 check\(s\) pass; bad-input rules hold/);
  });

  it('computes and lists the team calculator with --content', async () => {
    const r = await run('calc', 'peak-pair', '--in', 'x1=2 mm', '--in', 'x2=1 mm', '--json', '--content', content);
    expect(r.code, r.err).toBe(0);
    const o = (JSON.parse(r.out) as { outputs: { delta: number; zeta: number } }).outputs;
    // closed form ln 2 (exact in double precision up to rounding); Rao 6th ed. eq. 2.85 (from memory) for ζ
    expectClose({ label: 'δ for x₁/x₂ = 2', computed: o.delta, expected: Math.LN2, tol: 1e-12, why: 'closed form; only rounding of the mm conversion remains' });
    expectClose({ label: 'ζ for x₁/x₂ = 2', computed: o.zeta, expected: 0.10965258099938507, tol: 1e-12, why: 'closed form evaluated in double precision' });
    const l = await run('list', '--json', '--content', content);
    expect((JSON.parse(l.out) as { id: string }[]).map((c) => c.id)).toContain('peak-pair');
  });

  it('runs the team calculator in batch, on worker threads too (each thread loads the folder\'s calculators)', () => {
    // 2,500 rows: above the one-thread threshold, so --jobs 2 sends chunks to a worker thread
    const rows = Array.from({ length: 2500 }, (_, i) => (i === 7 ? '1 mm,2 mm' : `${2 + (i % 5)} mm,1 mm`));
    const csv = join(tmp, 'pairs.csv');
    writeFileSync(csv, `x1,x2\n${rows.join('\n')}\n`);
    const r = spawnSync(process.execPath, [BIN, 'batch', 'peak-pair', '--csv', csv, '--jobs', '2', '--json', '--content', content], { encoding: 'utf8' });
    const results = JSON.parse(r.stdout) as ({ row: number; outputs: { delta: number } } | { row: number; error: string })[];
    expect(results).toHaveLength(2500);
    // row 1 has x1/x2 = 2: δ = ln 2 (closed form); every row of the same ratio gives the same δ
    expectClose({ label: 'batch δ, row 1', computed: (results[0] as { outputs: { delta: number } }).outputs.delta, expected: Math.LN2, tol: 1e-12, why: 'closed form' });
    expectClose({ label: 'batch δ, row 2496 (ratio 2, on the worker thread)', computed: (results[2495] as { outputs: { delta: number } }).outputs.delta, expected: Math.LN2, tol: 1e-12, why: 'closed form' });
    // row 8 has x1 < x2: refused with the calculator's own message, and the run went on
    expect('error' in results[7]!).toBe(true);
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/1 of 2500 rows refused/);
  });

  it('refuses a team calculator whose id is a built-in\'s, naming the file', async () => {
    const clash = join(tmp, 'clash');
    cpSync(content, clash, { recursive: true });
    const f = join(clash, 'calculators', 'peak-pair.ts');
    writeFileSync(f, readFileSync(f, 'utf8').replace("id: 'peak-pair'", "id: 'sdof'"));
    const r = await run('check', '--content', clash);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/peak-pair\.ts: id: 'sdof' is already the id of a built-in calculator/);
  });

  it('refuses a config with a text colour below 4.5:1 on white, naming the field', async () => {
    const pale = join(tmp, 'pale');
    cpSync(content, pale, { recursive: true });
    const f = join(pale, 'handbook.config.json');
    writeFileSync(f, readFileSync(f, 'utf8').replace('"accentInk": "#1f4d36"', '"accentInk": "#88aa99"'));
    const r = await run('check', '--content', pale);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/handbook\.config\.json: colours\.accentInk: #88aa99 has contrast \d\.\d\d:1 against white; text needs at least 4\.5:1 \(WCAG 2\.1 SC 1\.4\.3\)/);
    expect(r.err.split('\n')).toHaveLength(1);
  });

  it('writes a new page into the folder under a topic of its config', async () => {
    const r = await run('new', 'machines/guard-rattle', '--by', 'Wen Hallberg', '--calc', 'peak-pair', '--content', content);
    expect(r.code, r.err).toBe(0);
    expect(readFileSync(join(content, 'machines', 'guard-rattle.mdx'), 'utf8')).toMatch(/topic: "Machines"/);
    rmSync(join(content, 'machines', 'guard-rattle.mdx'));
    const wrong = await run('new', 'thermal/x', '--content', content);
    expect(wrong.err).toMatch(/'thermal' is not a topic folder/);
  });

  it('seals an approval, fails check once the method is edited (naming the file) and leaves the page "changed since approval" for the build below', async () => {
    const page = join(content, 'machines', 'spindle-decay.mdx');
    const c = await run('check-off', 'spindle-decay', '--by', 'Toma Reeve', '--date', '2026-12-02', '--content', content);
    expect(c.code, c.err).toBe(0);
    const a = await run('approve', 'spindle-decay', '--by', 'Ilse Marrow', '--date', '2026-12-02', '--content', content);
    expect(a.code, a.err).toBe(0);
    expect(readFileSync(page, 'utf8')).toMatch(/status: approved[\s\S]*approvalHash: "?[0-9a-f]{16}/);
    expect((await run('check', '--content', content)).code).toBe(0);
    // an edit of the method, the approval fields untouched
    writeFileSync(page, readFileSync(page, 'utf8').replace('read two successive peaks', 'read two peaks five cycles apart'));
    const changed = await run('check', '--content', content);
    expect(changed.code).toBe(1);
    expect(changed.err + changed.out).toMatch(/spindle-decay\.mdx.*changed since approval/);
    expect((await run('check', '--content', content, '--allow-changed')).code).toBe(0);
  });

  it('builds the page with the live calculator and the folder\'s own name, then prints its sheet', () => {
    const b = cli('build', '--content', content, '--out', out);
    expect(b.status, `${b.stdout}\n${b.stderr}`).toBe(0);
    const page = readFileSync(join(out, 'machines', 'spindle-decay', 'index.html'), 'utf8');
    expect(page).toContain('data-calc="peak-pair"');
    expect(page).toContain('Tarnwick Works — Machine shop');
    expect(page).toContain('--accent-ink:#1f4d36');
    // the server-rendered default result: x₁ = 20 µm, x₂ = 12 µm → δ = ln(5/3) = 0.5108 (closed form)
    expect(page).toMatch(/0\.5108/);
    // the page edited after its approval (the test above) says so instead of "approved"
    expect(page).toMatch(/changed since approval/i);
    const home = readFileSync(join(out, 'index.html'), 'utf8');
    expect(home).toMatch(/<h2>Machines<\/h2>/);
    const pdf = join(tmp, 'sheet.pdf');
    const s = cli('sheet', 'spindle-decay', '--site', out, '--pdf', pdf, '--content', content, '--in', 'x1=1', '--in', 'x2=0.5');
    expect(s.status, `${s.stdout}\n${s.stderr}`).toBe(0);
    expect(existsSync(pdf)).toBe(true);
    const text = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
    expect(text).toContain('Spindle damping from a peak pair');
    expect(text).toContain('Tarnwick Works — Machine shop');
    expect(text).toMatch(/changed since approval/i);
    // without --content: the page's own defaults print; inputs need the folder's calculators
    const plain = cli('sheet', 'spindle-decay', '--site', out, '--pdf', join(tmp, 'plain.pdf'));
    expect(plain.status, plain.stderr).toBe(0);
    expect(execFileSync('pdftotext', ['-layout', join(tmp, 'plain.pdf'), '-'], { encoding: 'utf8' })).toContain('Spindle damping from a peak pair');
    const refused = cli('sheet', 'spindle-decay', '--site', out, '--pdf', join(tmp, 'no.pdf'), '--in', 'x1=1');
    expect(refused.status).toBe(1);
    expect(refused.stderr).toMatch(/uses calculator 'peak-pair', which this tool does not have: give the handbook folder with --content <dir>/);
  }, 240_000);

  it('runs the team calculator live in the built page (its lazy chunk), with no console error', async () => {
    const served = await serveStatic(out, '/');
    const browser = await launch();
    try {
      const w = await watchedPage(browser, served.origin);
      await w.page.goto(`${served.origin}/machines/spindle-decay/`);
      const calc = w.page.locator('db-calculator[data-calc="peak-pair"]');
      await calc.locator('input[name="x1"]').waitFor();
      // the page shows x₁ in mm: 40 mm against the default x₂ = 12 µm → δ = ln(40/0.012) = 8.112 (closed form)
      await calc.locator('input[name="x1"]').fill('40');
      await calc.locator('input[name="x1"]').dispatchEvent('input');
      await expect.poll(() => calc.innerText(), { timeout: 10_000 }).toMatch(/Logarithmic decrement δ\s+8\.112/);
      expect([...w.consoleErrors, ...w.pageErrors, ...w.foreignRequests]).toEqual([]);
    } finally {
      await browser.close();
      await served.close();
    }
  }, 60_000);
});
