import { defineCollection } from 'astro:content';
import { glob } from 'astro/loaders';
import { pageSchema } from './content/schema.ts';

// Handbook pages live in ./content (top level, by topic); files starting with _ are not pages.
// DAMPBOOK_CONTENT builds another content folder (a test builds a deliberately broken copy; the
// build-scaling benchmark builds generated pages).
export const collections = {
  pages: defineCollection({ loader: glob({ pattern: '**/[^_]*.mdx', base: process.env.DAMPBOOK_CONTENT ?? './content', retainBody: false }), schema: pageSchema }),
};
