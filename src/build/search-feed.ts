/**
 * Middleware of the static build: hands every rendered HTML page to the search indexer
 * (search-index.ts) under the path Astro writes it to, `build.format: 'directory'` with
 * `trailingSlash: 'always'` (astro.config.mjs): `/base/a/b/` → `a/b/index.html`, the 404 page → `404.html`.
 */
import { defineMiddleware } from 'astro:middleware';
import { SEARCH_FEED, type SearchFeed } from './search-feed-key.ts';
import { withoutKatex } from './searchText.ts';

/** The output file of a page address (base already removed; always ends in '/'). */
export function outputPath(route: string, pathname: string): string {
  if (route === '/404') return '404.html';
  return `${pathname.replace(/^\/+/, '')}index.html`;
}

export const onRequest = defineMiddleware(async (context, next) => {
  const response = await next();
  const feed = (globalThis as { [SEARCH_FEED]?: SearchFeed })[SEARCH_FEED];
  if (!feed || !context.isPrerendered || !(response.headers.get('content-type') ?? '').startsWith('text/html')) return response;
  const html = await response.text();
  const base = import.meta.env.BASE_URL;
  const path = context.url.pathname.startsWith(base) ? `/${context.url.pathname.slice(base.length)}` : context.url.pathname;
  feed(outputPath(context.routePattern, path.endsWith('/') ? path : `${path}/`), withoutKatex(html));
  return new Response(html, { status: response.status, statusText: response.statusText, headers: response.headers });
});
