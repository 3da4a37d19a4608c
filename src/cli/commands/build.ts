import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { readHandbookConfig } from '../../content/readHandbookConfig.ts';
import { checkBase } from '../../sheets/print.ts';
import { TOOL_ROOT } from '../../team/entryPoints.ts';
import { UsageError, type ParsedArgs } from '../args.ts';

/** Environment of a child build: this process's, minus what a test runner sets for itself. */
function childEnv(extra: Record<string, string>): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: 'production', ...extra };
  for (const k of ['BASE_URL', 'MODE', 'DEV', 'PROD', 'SSR', 'VITEST', 'TEST', 'VITEST_MODE', 'VITEST_POOL_ID', 'VITEST_WORKER_ID']) delete env[k];
  return env;
}

/**
 * `dampbook build [--content dir] [--out dir] [--base /path/]`: builds the handbook of a content
 * folder (topic folders of pages, studies/, calculators/, handbook.config.json) with this tool,
 * then its search index — the folder may sit anywhere (a team's own repository). The config and
 * the team calculators were checked before the build starts (main.ts loads them), so a bad file
 * is a one-line message, not a minute of build output. Each folder gets its own content cache.
 */
export function build(args: ParsedArgs, out: (s: string) => void, err: (s: string) => void = () => {}): number {
  if (args.positionals.length > 1) throw new UsageError(`build takes no positional arguments; given: ${args.positionals.slice(1).join(' ')}`);
  const str = (k: string) => { const v = args.flags.get(k); if (v === true) throw new UsageError(`--${k} needs a value`); return v; };
  const content = resolve(str('content') ?? join(TOOL_ROOT, 'content'));
  if (!existsSync(content)) throw new UsageError(`no content folder '${content}'`);
  readHandbookConfig(content);
  const site = resolve(str('out') ?? 'dist');
  const base = checkBase(str('base') ?? '/');
  const cache = join(TOOL_ROOT, 'node_modules', '.astro-content', createHash('sha256').update(content).digest('hex').slice(0, 12));
  const env = childEnv({ DAMPBOOK_CONTENT: content, DAMPBOOK_OUT: site, DAMPBOOK_BASE: base, DAMPBOOK_CACHE: cache });
  const steps: [string, string[]][] = [
    ['site', [join(TOOL_ROOT, 'node_modules', 'astro', 'astro.js'), 'build', '--silent']],
    ['search index', [join(TOOL_ROOT, 'scripts', 'index-search.mjs')]],
  ];
  for (const [what, argv] of steps) {
    const r = spawnSync(process.execPath, argv, { cwd: TOOL_ROOT, env, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
    if (r.status !== 0) {
      for (const l of `${r.stdout ?? ''}\n${r.stderr ?? ''}`.split('\n').filter((l) => l.trim()).slice(-30)) err(l);
      err(`dampbook: build of ${content} failed at the ${what} step (exit ${r.status ?? r.signal}); the lines above say why`);
      return 1;
    }
  }
  out(`built ${content} into ${site} (base ${base})`);
  return 0;
}
