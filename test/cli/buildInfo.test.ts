/**
 * The build identity printed on every page and sheet hashes the content folder actually built
 * (DAMPBOOK_CONTENT), not always ./content. No reference values (a hash of files; closed form:
 * the same bytes give the same hash).
 */
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it, vi } from 'vitest';

const tmp = mkdtempSync(join(tmpdir(), 'dampbook-bi-'));
afterAll(() => { rmSync(tmp, { recursive: true, force: true }); vi.unstubAllEnvs(); });

async function hashWith(content: string | undefined): Promise<string> {
  vi.resetModules();
  if (content === undefined) vi.stubEnv('DAMPBOOK_CONTENT', undefined as unknown as string); else vi.stubEnv('DAMPBOOK_CONTENT', content);
  const m = await import('../../src/build-info.ts');
  return m.buildInfo.contentHash;
}

describe('build identity', () => {
  it('hashes the content folder being built', async () => {
    const same = join(tmp, 'same');
    cpSync('content', same, { recursive: true });
    const edited = join(tmp, 'edited');
    cpSync('content', edited, { recursive: true });
    const f = join(edited, 'oscillators', 'sdof.mdx');
    writeFileSync(f, `${readFileSync(f, 'utf8')}\nOne more line.\n`);
    const base = await hashWith(undefined);
    expect(await hashWith(edited)).not.toBe(base);
    // the same files in another folder: the same identity (paths are hashed relative to the folder)
    expect(await hashWith(same)).toBe(base);
  });
});
