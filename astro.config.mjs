// Site configuration. DAMPBOOK_BASE hosts the handbook under a sub-path (e.g. /handbook/);
// DAMPBOOK_OUT builds into another folder (tests and benchmarks use it).
import { defineConfig } from 'astro/config';
import mdx from '@astrojs/mdx';
import remarkMath from 'remark-math';
import rehypeKatex from 'rehype-katex';

const base = process.env.DAMPBOOK_BASE ?? '/';

export default defineConfig({
  base,
  outDir: process.env.DAMPBOOK_OUT ?? './dist',
  // DAMPBOOK_CACHE: a separate content cache, so a test build of other content leaves this one alone
  cacheDir: process.env.DAMPBOOK_CACHE ?? './node_modules/.astro',
  trailingSlash: 'always',
  build: { format: 'directory' },
  markdown: { remarkPlugins: [remarkMath], rehypePlugins: [[rehypeKatex, { output: 'htmlAndMathml', strict: 'warn' }]] },
  // optimize: without it, math-heavy sites exhaust the heap (hundreds of KaTeX trees per page)
  integrations: [mdx({ optimize: true })],
  devToolbar: { enabled: false },
  vite: {
    // never inline scripts or assets: the Content-Security-Policy allows only same-origin files
    build: { assetsInlineLimit: 0 },
  },
});
