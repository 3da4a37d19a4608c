import { defineCollection } from 'astro:content';
import { glob } from 'astro/loaders';
import { pageSchemaFor } from './content/schema.ts';
import { topicTitles } from './content/handbookConfig.ts';
import { readHandbookConfig } from './content/readHandbookConfig.ts';

// Handbook pages live in ./content (top level, by topic); files starting with _ are not pages.
// DAMPBOOK_CONTENT builds another content folder (`dampbook build --content dir`, a test's
// deliberately broken copy, the build-scaling benchmark's generated pages). Its topics come from
// its handbook.config.json.
const dir = process.env.DAMPBOOK_CONTENT ?? './content';

export const collections = {
  pages: defineCollection({ loader: glob({ pattern: '**/[^_]*.mdx', base: dir, retainBody: false }), schema: pageSchemaFor(topicTitles(readHandbookConfig(dir))) }),
};
