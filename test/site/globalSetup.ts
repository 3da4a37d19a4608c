/**
 * Builds the demo handbook twice for the site and browser tests: at the root and under a
 * sub-path, exactly as `npm run build` does (astro build, which writes the search index too).
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, rmSync } from 'node:fs';
import { ROOT_BUILD, SUB_BASE, SUB_BUILD, TEST_OUT } from '../helpers/site.ts';

function build(out: string, base: string): void {
  // vitest exports BASE_URL/MODE/DEV/PROD/SSR into process.env; Astro would let them override its own
  const env: NodeJS.ProcessEnv = { ...process.env, DAMPBOOK_OUT: out, DAMPBOOK_BASE: base, NODE_ENV: 'production' };
  for (const k of ['BASE_URL', 'MODE', 'DEV', 'PROD', 'SSR', 'VITEST', 'TEST', 'VITEST_MODE', 'VITEST_POOL_ID', 'VITEST_WORKER_ID']) delete env[k];
  execFileSync('npx', ['astro', 'build', '--silent'], { env, stdio: ['ignore', 'ignore', 'inherit'] });
}

export default function setup(): void {
  if (process.env.DAMPBOOK_REUSE_BUILD === '1' && existsSync(ROOT_BUILD) && existsSync(SUB_BUILD)) return;
  rmSync(TEST_OUT, { recursive: true, force: true });
  mkdirSync(TEST_OUT, { recursive: true });
  build(ROOT_BUILD, '/');
  build(SUB_BUILD, SUB_BASE);
}
