/** The built demo handbook: pages, KaTeX output, search index, server-rendered numbers, no foreign hosts. */
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT_BUILD, SUB_BUILD } from '../helpers/site.ts';

function files(dir: string, out: string[] = []): string[] {
  for (const n of readdirSync(dir)) {
    const p = join(dir, n);
    if (statSync(p).isDirectory()) files(p, out); else out.push(p);
  }
  return out;
}

/**
 * Absolute URLs that are identifiers or documentation strings inside libraries, never fetched:
 * XML namespaces in SVG/MathML, chart.js's documentation link in an error message, and the
 * placeholder origin Pagefind uses to parse relative URLs.
 */
const NOT_REQUESTS = [/^https?:\/\/www\.w3\.org\//, /^https:\/\/www\.chartjs\.org/, /^https:\/\/example\.com/];

describe('built handbook', () => {
  const sdof = readFileSync(join(ROOT_BUILD, 'oscillators/sdof/index.html'), 'utf8');

  it('has the home page, the oscillator page and the about page', () => {
    for (const p of ['index.html', 'oscillators/sdof/index.html', 'about/index.html', '404.html']) expect(existsSync(join(ROOT_BUILD, p)), p).toBe(true);
  });

  it('renders formulas with KaTeX at build time (no TeX left for the browser)', () => {
    expect(sdof).toContain('class="katex"');
    expect(sdof).toContain('class="katex-display"');
    expect(sdof).not.toMatch(/\$\$\s*m\\ddot/);
  });

  it('renders the default results on the server (search and print see numbers without JS)', () => {
    expect(sdof).toMatch(/data-out="zeta"[^>]*>\s*<th[^>]*>[^<]*<\/th>\s*<td class="value">0\.1<\/td>/);
    expect(sdof).toMatch(/data-out="regime"[\s\S]*?underdamped/);
    expect(sdof).toContain('<svg viewBox');
  });

  it('shows every signed-off demo page as signed: the build computes the hash approve wrote (src/content/seal.ts)', () => {
    // common practice, no source: the build (Astro's frontmatter parse) and the CLI (yaml) must hash alike
    const pages = files(ROOT_BUILD).filter((f) => f.endsWith('index.html'));
    const seals = pages.map((f) => /data-status="(\w+)" data-seal="(\w+)"/.exec(readFileSync(f, 'utf8'))).filter((m) => m !== null);
    expect(seals.filter((m) => m[1] !== 'draft').length).toBeGreaterThanOrEqual(15);
    expect(seals.filter((m) => m[1] !== 'draft' && m[2] !== 'current').map((m) => m[0])).toEqual([]);
    expect(sdof).toMatch(/<span class="status status-approved" data-pagefind-meta="status:approved">approved<\/span>/);
    expect(sdof).not.toContain('changed since');
  });

  it('builds a search index', () => {
    expect(existsSync(join(ROOT_BUILD, 'pagefind/pagefind.js'))).toBe(true);
    expect(existsSync(join(ROOT_BUILD, 'pagefind/pagefind-entry.json'))).toBe(true);
  });

  it('bundles every asset locally: no URL to another host in built HTML, JS or CSS', () => {
    const offenders: string[] = [];
    for (const f of files(ROOT_BUILD).filter((p) => /\.(html|js|mjs|css)$/.test(p))) {
      const text = readFileSync(f, 'utf8');
      // plain reference links an author wrote in page prose are allowed: <a href="https://…">
      // and licence banners in block comments are text, not requests
      const stripped = text.replace(/<a\s[^>]*href="https?:[^"]*"/g, '<a').replace(/\/\*[\s\S]*?\*\//g, '');
      for (const m of stripped.matchAll(/https?:\/\/[^\s"'`)<>\\]+/g)) {
        if (!NOT_REQUESTS.some((r) => r.test(m[0]))) offenders.push(`${relative(ROOT_BUILD, f)}: ${m[0]}`);
      }
    }
    expect(offenders).toEqual([]);
  });

  it('ships KaTeX fonts with the site', () => {
    expect(files(ROOT_BUILD).some((f) => /KaTeX_Main-Regular.*\.woff2$/.test(f))).toBe(true);
  });

  it('prefixes every internal link with the sub-path in the sub-path build', () => {
    const html = readFileSync(join(SUB_BUILD, 'oscillators/sdof/index.html'), 'utf8');
    const hrefs = [...html.matchAll(/(?:href|src)="(\/[^"]*)"/g)].map((m) => m[1]!);
    expect(hrefs.length).toBeGreaterThan(3);
    expect(hrefs.filter((h) => !h.startsWith('/handbook/'))).toEqual([]);
  });
});
