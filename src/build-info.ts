/**
 * Identity of this build, printed in every page footer and sheet: the package version (the core
 * version a result is traceable to) and a hash of the handbook's content and core sources.
 * The content hashed is the folder actually built (`DAMPBOOK_CONTENT`, as src/build/handbook-pages.ts
 * reads it; default ./content). Server-only (reads files at build time).
 */
import { createHash } from 'node:crypto';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';

/** The content folder a build reads (the same rule as src/build/handbook-pages.ts and src/site.config.ts). */
export function contentDir(): string {
  return process.env.DAMPBOOK_CONTENT ?? './content';
}

function walk(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir).sort()) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) walk(p, out);
    else out.push(p);
  }
  return out;
}

/**
 * SHA-256 (first 12 hex) over each folder's files: the name `label/relative-path` and the bytes,
 * so the same files give the same hash wherever the folder is.
 */
function hashTree(dirs: readonly (readonly [label: string, dir: string])[]): string {
  const h = createHash('sha256');
  for (const [label, d] of dirs) for (const f of walk(d)) h.update([label, ...relative(d, f).split(sep)].join('/')).update(readFileSync(f));
  return h.digest('hex').slice(0, 12);
}

const pkg = JSON.parse(readFileSync('package.json', 'utf8')) as { version: string };

export const buildInfo = {
  version: pkg.version,
  contentHash: hashTree([['content', contentDir()], ['src/core', 'src/core'], ['src/calculators', 'src/calculators']]),
  built: new Date().toISOString().slice(0, 10),
} as const;
