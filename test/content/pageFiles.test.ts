/**
 * Which files are pages and what their ids are (src/content/pageFiles.ts), one rule for the site
 * build and the CLI. The ids are checked against Astro's own rule for a content collection's glob
 * loader (`getContentEntryIdAndSlug` of astro 5.18, the rule the handbook's pages were built with
 * before they became one module), so every address of an earlier build still holds.
 */
import { mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { pageFiles, pagesModule } from '../../src/build/handbook-pages.ts';
import { findPageFiles, pageId } from '../../src/content/pageFiles.ts';
import { pageFromModule } from '../../src/content/pageModule.ts';
import { readPages } from '../../src/cli/pages.ts';

// astro's internal module (not in its package exports): the rule its glob loader names entries by
const { getContentEntryIdAndSlug } = await import(pathToFileURL(resolve('node_modules/astro/dist/content/utils.js')).href) as {
  getContentEntryIdAndSlug(a: { entry: URL; contentDir: URL; collection: string }): { slug: string };
};

const tmp = mkdtempSync(join(tmpdir(), 'dampbook-pagefiles-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

/** Astro's id for a file of a glob-loaded collection (its slug; generateIdDefault in astro/loaders). */
function astroId(dir: string, rel: string): string {
  const base = pathToFileURL(`${dir}/`);
  return getContentEntryIdAndSlug({ entry: new URL(encodeURI(rel), base), contentDir: base, collection: '' }).slug;
}

describe('page ids', () => {
  const names = ['thermal/warm-up.mdx', 'oscillators/sdof.mdx', 'Thermal/Warm Up.mdx', 'duty/road_power v2.mdx', 'handbook/index.mdx', 'a/b/c.mdx', 'Ünits/Größe.mdx', 'x/Tarnwick (draft).mdx'];
  it.each(names)('%s gets the id Astro\'s glob loader gave it', (rel) => {
    expect(pageId(rel)).toBe(astroId(tmp, rel));
  });

  it('every demo page keeps the id Astro gave it', () => {
    const dir = join(process.cwd(), 'content');
    for (const p of readPages('content')) expect(p.entry).toBe(astroId(dir, p.file.slice('content/'.length)));
  });
});

describe('page files', () => {
  const dir = join(tmp, 'folder');
  mkdirSync(join(dir, 'thermal'), { recursive: true });
  mkdirSync(join(dir, '.git'), { recursive: true });
  writeFileSync(join(dir, 'thermal', 'a.mdx'), '---\n---\n');
  writeFileSync(join(dir, 'thermal', '_draft.mdx'), '---\n---\n');
  writeFileSync(join(dir, 'thermal', 'notes.md'), 'not a page');
  writeFileSync(join(dir, '.git', 'b.mdx'), '---\n---\n');
  symlinkSync(join(dir, 'nowhere.mdx'), join(dir, 'thermal', 'gone.mdx'));

  it('takes .mdx files, not _ files, other files or anything under a . folder; lists an unreadable one with its reason', () => {
    expect(findPageFiles(dir).map((f) => [f.file.slice(dir.length + 1), f.reason])).toEqual([
      ['thermal/a.mdx', undefined],
      ['thermal/gone.mdx', 'dangling symbolic link (its target does not exist)'],
    ]);
  });

  it('the build refuses an unreadable page file, naming it, instead of leaving the page out', () => {
    expect(() => pageFiles(dir, tmp)).toThrow(/folder\/thermal\/gone\.mdx: dangling symbolic link/);
  });

  it('the build refuses two files that are one page', () => {
    const twin = join(tmp, 'twin');
    mkdirSync(join(twin, 'duty'), { recursive: true });
    writeFileSync(join(twin, 'duty', 'Impact.mdx'), '');
    writeFileSync(join(twin, 'duty', 'impact.mdx'), '');
    expect(() => pageFiles(twin, tmp)).toThrow("twin/duty/Impact.mdx and twin/duty/impact.mdx are both page 'duty/impact'; rename one");
  });

  it('writes one import per page, in id order, with paths relative to the root', () => {
    const only = join(tmp, 'only');
    mkdirSync(join(only, 'b'), { recursive: true });
    mkdirSync(join(only, 'a'), { recursive: true });
    writeFileSync(join(only, 'b', 'x.mdx'), '');
    writeFileSync(join(only, 'a', 'y.mdx'), '');
    const files = pageFiles(only, tmp);
    expect(files.map((f) => [f.id, f.filePath])).toEqual([['a/y', 'only/a/y.mdx'], ['b/x', 'only/b/x.mdx']]);
    const text = pagesModule(files);
    expect(text).toContain(`import * as p0 from ${JSON.stringify(join(only, 'a', 'y.mdx'))};`);
    expect(text).toContain('{ id: "b/x", filePath: "only/b/x.mdx", module: p1 },');
  });
});

describe('a page module', () => {
  const Content = (() => '') as never;
  it('refuses frontmatter the schema refuses, naming the file and every field', () => {
    const f = { id: 'thermal/x', filePath: 'content/thermal/x.mdx', module: { default: Content, frontmatter: { id: 'Bad Id', title: 'Xy' } } };
    expect(() => pageFromModule(f, ['Thermal rating'])).toThrow(/^content\/thermal\/x\.mdx: frontmatter does not match the page schema\n {2}id: lower-case letters, digits and hyphens\n {2}title: String must contain at least 3 character/);
  });

  it('keeps the checked frontmatter (defaults, dates) and the headings', () => {
    const frontmatter = { id: 'x', title: 'Xyz', summary: 'A summary of ten', topic: 'Thermal rating', revision: 'A', status: 'draft', preparedBy: 'WH', prepared: new Date('2026-11-01') };
    const headings = [{ depth: 2, slug: 'a', text: 'A' }];
    const p = pageFromModule({ id: 'thermal/x', filePath: 'content/thermal/x.mdx', module: { default: Content, frontmatter, getHeadings: () => headings } }, ['Thermal rating']);
    expect(p.data.order).toBe(100);
    expect(p.data.calculators).toEqual([]);
    expect(p.data.prepared.toISOString()).toBe('2026-11-01T00:00:00.000Z');
    expect(p.headings).toEqual(headings);
  });
});
