/**
 * Where the build's search indexer (search-index.ts) and the page middleware that feeds it
 * (search-feed.ts) meet: a global slot, because the middleware runs inside Astro's server bundle
 * and cannot import the integration's instance. Empty outside `astro build` (dev, preview).
 */
export const SEARCH_FEED = Symbol.for('dampbook:search-feed');
export const SEARCH_STATS = Symbol.for('dampbook:search-stats');

/** Hands one rendered page to the indexer: its path in the output folder and its HTML. */
export type SearchFeed = (sourcePath: string, html: string) => void;

/** What the last build's index took: pages, and seconds spent after the last page was rendered. */
export interface SearchStats { pages: number; seconds: number }
