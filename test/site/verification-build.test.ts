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
    // a page's own extra case: ζ = 40 / (2√(4000·20)) = 0.0707107 (closed form, Rao 6th ed. §2.6); the copy claims 0.15
    const extra = "verification:\n  - name: Heavier mount — 20 kg on 4 kN/m with 40 N·s/m\n    calculator: sdof\n    inputs: { m: 20, k: 4000, c: 40 }\n    expected: { zeta: 0.15 }\n    tolerance: 1.0e-12\n    source: { key: rao2017, locator: '§2.6 closed forms' }\n    provenance: closed form\n";
    writeFileSync(f, readFileSync(f, 'utf8').replace('calculators: [sdof]\n', `calculators: [sdof]\n${extra}`));
    const env: NodeJS.ProcessEnv = { ...process.env, DAMPBOOK_CONTENT: content, DAMPBOOK_OUT: out, DAMPBOOK_CACHE: cache, NODE_ENV: 'production' };
    for (const k of ['BASE_URL', 'MODE', 'DEV', 'PROD', 'SSR', 'VITEST', 'TEST', 'VITEST_MODE', 'VITEST_POOL_ID', 'VITEST_WORKER_ID']) delete env[k];
    const r = spawnSync('npx', ['astro', 'build'], { env, encoding: 'utf8' });
    expect(r.status).not.toBe(0);
    const text = `${r.stdout}\n${r.stderr}`;
    expect(text).toMatch(/oscillators\/sdof\.mdx: verification case 'Heavier mount — 20 kg on 4 kN\/m with 40 N·s\/m' \(sdof\): zeta expected 0\.15, computed 0\.0707/);
  });
});
