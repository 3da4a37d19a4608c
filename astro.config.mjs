// Site configuration. DAMPBOOK_BASE hosts the handbook under a sub-path (e.g. /handbook/);
// DAMPBOOK_OUT builds into another folder (tests and benchmarks use it).
import { defineConfig } from 'astro/config';
import mdx from '@astrojs/mdx';
import remarkMath from 'remark-math';
import rehypeKatex from 'rehype-katex';
import { clientScripts } from './src/build/client-scripts.ts';
import { serverModules } from './src/build/server-prebundle.ts';
import { searchIndex } from './src/build/search-index.ts';
import { handbookPages } from './src/build/handbook-pages.ts';

const base = process.env.DAMPBOOK_BASE ?? '/';

/**
 * Display equations scroll sideways when wider than the column; a scrollable region must be
 * reachable by keyboard, so each display gets tabindex="0" and a label (WCAG 2.1.1).
 */
function focusableDisplays() {
  const walk = (node) => {
    const cls = node.properties?.className;
    if (node.type === 'element' && Array.isArray(cls)) {
      if (cls.includes('katex-display')) {
        node.properties.tabIndex = 0;
        node.properties.role = 'group';
        node.properties.ariaLabel = 'equation';
        return;
      }
      // KaTeX's own tree (thousands of nodes on a math-heavy page) holds no display of its own
      if (cls.includes('katex')) return;
    }
    for (const child of node.children ?? []) walk(child);
  };
  return (tree) => walk(tree);
}

export default defineConfig({
  base,
  outDir: process.env.DAMPBOOK_OUT ?? './dist',
  // DAMPBOOK_CACHE: a separate content cache, so a test build of other content leaves this one alone
  cacheDir: process.env.DAMPBOOK_CACHE ?? './node_modules/.astro',
  trailingSlash: 'always',
  build: { format: 'directory', concurrency: 4 },
  markdown: { remarkPlugins: [remarkMath], rehypePlugins: [[rehypeKatex, { output: 'htmlAndMathml', strict: 'warn' }], focusableDisplays] },
  // optimize: without it, math-heavy sites exhaust the heap (hundreds of KaTeX trees per page)
  // clientScripts: browser code is bundled by esbuild in one pass (src/build/client-scripts.ts)
  // serverModules: the pages' own TypeScript too, for the server pass (src/build/server-prebundle.ts)
  // searchIndex: the offline search index, fed each page as it is rendered (src/build/search-index.ts)
  // handbookPages: the content folder's pages as one module (src/build/handbook-pages.ts)
  integrations: [mdx({ optimize: true }), handbookPages(), clientScripts(), serverModules(), searchIndex()],
  devToolbar: { enabled: false },
  vite: {
    // never inline scripts or assets: the Content-Security-Policy allows only same-origin files.
    // No tree-shaking: the server bundle only runs once to prerender the pages and is then thrown
    // away, and the browser code is bundled by esbuild (src/build/client-scripts.ts); rollup's
    // tree-shaking pass was ~1.3 s of a 100-page build for nothing (the built pages are identical).
    build: { assetsInlineLimit: 0, rollupOptions: { treeshake: false } },
  },
});
