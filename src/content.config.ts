import { defineCollection } from 'astro:content';
import { glob } from 'astro/loaders';
import { pageSchema } from './content/schema.ts';

// Handbook pages live in ./content (top level, by topic); files starting with _ are not pages.
export const collections = {
  pages: defineCollection({ loader: glob({ pattern: '**/[^_]*.mdx', base: './content' }), schema: pageSchema }),
};
