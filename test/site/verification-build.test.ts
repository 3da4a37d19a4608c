/**
 * Executable verification at build time: a copy of the demo content with one broken expected
 * value must fail `astro build`, naming the page, the case, the expected and the computed value.
 */
import { spawnSync } from 'node:child_process';
import { cpSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { TEST_OUT } from '../helpers/site.ts';

const content = join(TEST_OUT, 'broken-content');
const out = join(TEST_OUT, 'broken-build');
const cache = join(TEST_OUT, 'broken-cache');
afterAll(() => { rmSync(content, { recursive: true, force: true }); rmSync(out, { recursive: true, force: true }); rmSync(cache, { recursive: true, force: true }); });

describe('site build with a broken verification value', () => {
  it('fails naming page, case, expected and computed values', () => {
    cpSync('content', content, { recursive: true });
    const f = join(content, 'oscillators/sdof.mdx');
    // ζ = 40 / (2√(4000·10)) = 0.1 exactly (closed form, Rao 6th ed. §2.6); the copy claims 0.15
    writeFileSync(f, readFileSync(f, 'utf8').replace('expected: { wn: 20, zeta: 0.1,', 'expected: { wn: 20, zeta: 0.15,'));
    const env: NodeJS.ProcessEnv = { ...process.env, DAMPBOOK_CONTENT: content, DAMPBOOK_OUT: out, DAMPBOOK_CACHE: cache, NODE_ENV: 'production' };
    for (const k of ['BASE_URL', 'MODE', 'DEV', 'PROD', 'SSR', 'VITEST', 'TEST', 'VITEST_MODE', 'VITEST_POOL_ID', 'VITEST_WORKER_ID']) delete env[k];
    const r = spawnSync('npx', ['astro', 'build'], { env, encoding: 'utf8' });
    expect(r.status).not.toBe(0);
    const text = `${r.stdout}\n${r.stderr}`;
    expect(text).toMatch(/oscillators\/sdof\.mdx: verification case 'Contract case — 10 kg on 4 kN\/m with 40 N·s\/m' \(sdof\): zeta expected 0\.15, computed 0\.1/);
  });
});
