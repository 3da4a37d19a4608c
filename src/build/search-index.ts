/**
 * The offline search index (Pagefind), fed page by page while Astro renders the site.
 *
 * Why: indexing after the build (a second process reading every written page back from disk)
 * added about 0.8 s to a 100-page build — Node start-up, Pagefind's start-up, reading 19 MB of
 * HTML, then parsing it while nothing else ran. Here the Pagefind service starts with the build,
 * `search-feed.ts` (a middleware, so it sees exactly the HTML Astro writes) hands it each page as
 * it is rendered, and the service parses on the second core while Node renders the next page;
 * only writing the index files is left for the end of the build.
 *
 * KaTeX markup is excluded, or the index fills with TeX source and MathML; so are the calculator
 * inputs and the live chart areas (their text is widget chrome, not handbook content).
 */
import { rmSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { AstroIntegration } from 'astro';
import * as pagefind from 'pagefind';
import { SEARCH_FEED, SEARCH_STATS, type SearchFeed, type SearchStats } from './search-feed-key.ts';

export const SEARCH_EXCLUDE = ['.katex', '.calc-inputs', '.chart-canvas'];

/** The stock search UI files: the handbook has its own search box. */
const STOCK_UI = /^pagefind-((component-|modular-)?ui|highlight)\./;

export function searchIndex(): AstroIntegration {
  let starting: Promise<pagefind.PagefindIndex> | undefined;
  const pending: Promise<pagefind.NewFileResponse>[] = [];
  const fed = new Set<string>();
  const slot = globalThis as { [SEARCH_FEED]?: SearchFeed; [SEARCH_STATS]?: SearchStats };
  return {
    name: 'dampbook:search-index',
    hooks: {
      'astro:config:setup': ({ command, config, addMiddleware }) => {
        // outermost ('pre'), so it sees the HTML exactly as written
        if (command === 'build') addMiddleware({ entrypoint: new URL('src/build/search-feed.ts', config.root), order: 'pre' });
      },
      'astro:build:start': () => {
        // not awaited: the service starts (a process of its own) while Vite bundles the pages;
        // the first page fed, long after, waits for it if it must
        starting = pagefind.createIndex({ excludeSelectors: SEARCH_EXCLUDE }).then((created) => {
          if (!created.index) throw new Error(`search index: ${created.errors.join('; ')}`);
          return created.index;
        });
        starting.catch(() => undefined); // the failure surfaces where the build awaits it
        const ready = starting;
        slot[SEARCH_FEED] = (sourcePath, content) => {
          // a page rendered twice (it cannot be, but a second copy would be a second result)
          if (fed.has(sourcePath)) return;
          fed.add(sourcePath);
          const added = ready.then((index) => index.addHTMLFile({ sourcePath, content }));
          added.catch(() => undefined); // awaited, with its failure, in astro:build:done
          pending.push(added);
        };
      },
      'astro:build:done': async ({ dir, logger }) => {
        delete slot[SEARCH_FEED];
        if (!starting) return;
        const t0 = performance.now();
        try {
          const index = await starting;
          const added = await Promise.all(pending);
          const errors = added.flatMap((r) => r.errors);
          if (errors.length) throw new Error(`search index: ${errors.join('; ')}`);
          const site = fileURLToPath(dir);
          const written = await index.writeFiles({ outputPath: join(site, 'pagefind') });
          if (written.errors.length) throw new Error(`search index: ${written.errors.join('; ')}`);
          for (const f of readdirSync(join(site, 'pagefind'))) if (STOCK_UI.test(f)) rmSync(join(site, 'pagefind', f));
        } finally {
          await pagefind.close();
        }
        const seconds = (performance.now() - t0) / 1000;
        slot[SEARCH_STATS] = { pages: fed.size, seconds };
        logger.info(`search index: ${fed.size} pages (${seconds.toFixed(2)} s after the last page)`);
      },
    },
  };
}
