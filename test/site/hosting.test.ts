/**
 * Team hosting guarantees checked on the built files: one Content-Security-Policy (the meta tag
 * in every page equals the header documented in README, and allows no 'unsafe-eval'); the search
 * index holds prose, not KaTeX internals; a page without a calculator loads no JS beyond the
 * search loader (≤ 5 KB gzip).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gunzipSync, gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { builtPages, fileFor, loadedScripts } from '../helpers/crawl.ts';
import { prosePages } from '../helpers/calcPages.ts';
import { ROOT_BUILD, SUB_BASE, SUB_BUILD } from '../helpers/site.ts';

const readme = readFileSync('README.md', 'utf8');
const layout = readFileSync('src/layouts/Base.astro', 'utf8');
const documented = /^Content-Security-Policy: (.+)$/m.exec(readme)?.[1]?.trim();
const inLayout = /const csp = "([^"]+)"/.exec(layout)?.[1];

describe('Content-Security-Policy', () => {
  it('is documented in README as a header identical to the meta tag of the layout', () => {
    expect(documented).toBeDefined();
    expect(inLayout).toBe(documented);
  });

  it("allows no 'unsafe-eval' and no inline scripts", () => {
    const scriptSrc = /script-src ([^;]+)/.exec(documented ?? '')?.[1] ?? '';
    expect(documented).not.toMatch(/'unsafe-eval'/);
    expect(scriptSrc).not.toMatch(/'unsafe-inline'/);
    expect(documented).toMatch(/object-src 'none'/);
  });

  it.each([['root', ROOT_BUILD, '/'], ['sub-path', SUB_BUILD, SUB_BASE]])('is the meta tag of every page of the %s build, and no page has an inline script', (_n, root, base) => {
    for (const path of builtPages(root, base)) {
      const html = readFileSync(fileFor(root, base, path)!, 'utf8');
      const meta = /<meta http-equiv="Content-Security-Policy" content="([^"]+)"/.exec(html)?.[1]?.replace(/&#39;/g, "'");
      expect(meta, path).toBe(documented);
      // a JSON data block (type="application/json") is never run, so the policy does not apply to it
      const inline = [...html.matchAll(/<script(?![^>]*\ssrc=)(?![^>]*type="application\/json")[^>]*>([\s\S]*?)<\/script>/g)].filter((m) => m[1]!.trim() !== '');
      expect(inline.map((m) => `${path}: ${m[0].slice(0, 80)}`)).toEqual([]);
    }
  });
});

describe('search index', () => {
  const dir = join(ROOT_BUILD, 'pagefind/fragment');
  const fragments = readdirSync(dir).map((f) => {
    const text = gunzipSync(readFileSync(join(dir, f))).toString('utf8').replace(/^pagefind_dcd/, '');
    return JSON.parse(text) as { url: string; content: string };
  });

  it('holds one record per handbook page', () => {
    expect(fragments.length).toBeGreaterThan(0);
  });

  it('holds prose, not KaTeX internals: no TeX commands, MathML or KaTeX class names in any page text', () => {
    for (const f of fragments) {
      expect(f.content, f.url).not.toMatch(/\\[a-zA-Z]{2,}|\\[()[\]]|katex|\$\$|<math|mathrm|\\frac/);
    }
  });
});

describe('JavaScript a prose page loads', () => {
  it('is counted with the modules its scripts import statically (the counter follows imports)', () => {
    const calc = builtPages(ROOT_BUILD, '/').find((p) => readFileSync(fileFor(ROOT_BUILD, '/', p)!, 'utf8').includes('<db-calculator'));
    expect(calc).toBeDefined();
    const html = readFileSync(fileFor(ROOT_BUILD, '/', calc!)!, 'utf8');
    const tags = [...html.matchAll(/<script[^>]*\ssrc="([^"]+)"/g)].length;
    expect(loadedScripts(ROOT_BUILD, '/', calc!).length).toBeGreaterThan(tags);
  });


  it('is only the search loader, at most 5 KB gzip', () => {
    const pages = prosePages(ROOT_BUILD, '/');
    expect(pages.length).toBeGreaterThan(0);
    for (const path of pages) {
      const scripts = loadedScripts(ROOT_BUILD, '/', path);
      let gz = 0;
      for (const s of scripts) gz += gzipSync(readFileSync(fileFor(ROOT_BUILD, '/', s)!)).length;
      expect(gz, `${path}: ${scripts.join(', ')}`).toBeLessThanOrEqual(5 * 1024);
    }
  });
});
