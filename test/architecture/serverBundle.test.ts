/**
 * The build's server pass takes the pages' own modules from one esbuild bundle
 * (src/build/server-prebundle.ts). A module that reaches Astro or Vite must stay with Vite, or the
 * prerender would import `astro:content` or read `import.meta.env` from a file Vite never saw; the
 * site build (test/site) then shows that the bundled pages are the pages. No outside source: these
 * are the project's own build rules.
 */
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { importSpecifiers } from '../../src/build/importSpecifiers.ts';
import { bundlableModules, needsVite } from '../../src/build/server-prebundle.ts';

const rel = (files: string[]) => files.map((f) => f.slice(resolve('src').length + 1));

describe('what the server bundle takes', () => {
  it('reads static, re-exported, dynamic and bare imports', () => {
    const text = "import { a } from './a.ts';\nimport type { B } from '../b.ts';\nexport { c } from './c.ts';\nimport './side.css';\nconst d = () => import('./d.ts');";
    expect(importSpecifiers(text)).toEqual(['./a.ts', '../b.ts', './c.ts', './side.css', './d.ts']);
  });

  it('leaves to Vite what needs Vite or Astro', () => {
    expect(needsVite("import { getCollection } from 'astro:content';", ['astro:content'])).toBe(true);
    expect(needsVite('const b = import.meta.env.BASE_URL;', [])).toBe(true);
    expect(needsVite('', ['virtual:dampbook/client'])).toBe(true);
    expect(needsVite('', ['./Panel.astro'])).toBe(true);
    expect(needsVite('', ['./raw.txt?raw'])).toBe(true);
    expect(needsVite("import { z } from 'zod';", ['zod'])).toBe(false);
  });

  const taken = rel(bundlableModules(resolve('src')));

  it('takes the core, the calculators and the studies', () => {
    for (const f of ['core/index.ts', 'calculators/registry.ts', 'calculators/evaluate.ts', 'studies/run.ts', 'components/render/svgChart.ts', 'content/verify.ts', 'sheets/pageCss.ts']) expect(taken).toContain(f);
  });

  it('leaves the Astro-bound modules and everything that imports them', () => {
    for (const f of ['content/pageUrl.ts', 'content/pageIndex.ts', 'components/mdx/index.ts', 'team/entryPoints.ts']) expect(taken).not.toContain(f);
    // the study catalogue imports the page index, which reads virtual:dampbook/pages: it stays with Vite too
    expect(taken).not.toContain('pages/studies/_catalogue.ts');
  });
});
