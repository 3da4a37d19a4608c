import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { cpSync, existsSync, readdirSync, rmSync } from 'node:fs';
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
 * search index included — the folder may sit anywhere (a team's own repository). The config and
 * the team calculators were checked before the build starts (main.ts loads them), so a bad file
 * is a one-line message, not a minute of build output. Each folder gets its own content cache.
 *
 * Astro stages a build whose output folder lies outside its working directory in the project's
 * `.astro/` folder (and then deletes that folder, generated types and all), so the site is built
 * into a staging folder under node_modules and copied to `--out` afterwards. An existing `--out`
 * is replaced only when it is empty or holds an earlier build (an index.html).
 */
export function build(args: ParsedArgs, out: (s: string) => void, err: (s: string) => void = () => {}): number {
  if (args.positionals.length > 1) throw new UsageError(`build takes no positional arguments; given: ${args.positionals.slice(1).join(' ')}`);
  const str = (k: string) => { const v = args.flags.get(k); if (v === true) throw new UsageError(`--${k} needs a value`); return v; };
  const content = resolve(str('content') ?? join(TOOL_ROOT, 'content'));
  if (!existsSync(content)) throw new UsageError(`no content folder '${content}'`);
  readHandbookConfig(content);
  const site = resolve(str('out') ?? 'dist');
  if (existsSync(site) && readdirSync(site).length > 0 && !existsSync(join(site, 'index.html'))) throw new UsageError(`--out ${site}: the folder holds files but no earlier build; give an empty or new folder`);
  const base = checkBase(str('base') ?? '/');
  const cache = join(TOOL_ROOT, 'node_modules', '.astro-content', createHash('sha256').update(content).digest('hex').slice(0, 12));
  const staging = join(TOOL_ROOT, 'node_modules', '.dampbook-build', `${process.pid}`);
  const env = childEnv({ DAMPBOOK_CONTENT: content, DAMPBOOK_OUT: staging, DAMPBOOK_BASE: base, DAMPBOOK_CACHE: cache });
  // one step: the search index is written by the build itself (src/build/search-index.ts)
  const r = spawnSync(process.execPath, [join(TOOL_ROOT, 'node_modules', 'astro', 'astro.js'), 'build', '--silent'], { cwd: TOOL_ROOT, env, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  if (r.status !== 0) {
    for (const l of `${r.stdout ?? ''}\n${r.stderr ?? ''}`.split('\n').filter((l) => l.trim()).slice(-30)) err(l);
    rmSync(staging, { recursive: true, force: true });
    err(`dampbook: build of ${content} failed (exit ${r.status ?? r.signal}); the lines above say why`);
    return 1;
  }
  rmSync(site, { recursive: true, force: true });
  cpSync(staging, site, { recursive: true });
  rmSync(staging, { recursive: true, force: true });
  out(`built ${content} into ${site} (base ${base})`);
  return 0;
}
