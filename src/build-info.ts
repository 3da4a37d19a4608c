/**
 * Identity of this build, printed in every page footer and sheet: the package version (the core
 * version a result is traceable to) and a hash of the handbook's content and core sources.
 * Server-only (reads files at build time).
 */
import { createHash } from 'node:crypto';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';

function walk(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir).sort()) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) walk(p, out);
    else out.push(p);
  }
  return out;
}

function hashTree(dirs: readonly string[]): string {
  const h = createHash('sha256');
  for (const d of dirs) for (const f of walk(d)) h.update(f).update(readFileSync(f));
  return h.digest('hex').slice(0, 12);
}

const pkg = JSON.parse(readFileSync('package.json', 'utf8')) as { version: string };

export const buildInfo = {
  version: pkg.version,
  contentHash: hashTree(['content', 'src/core', 'src/calculators']),
  built: new Date().toISOString().slice(0, 10),
} as const;
