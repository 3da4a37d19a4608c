/**
 * The one shape of a verification case, as a zod schema: a calculator definition's own cases
 * (checked against it by test/calculators/verification.test.ts) and the extra, page-specific cases
 * a page's frontmatter may add (src/content/schema.ts extends it with the calculator id). Kept out
 * of types.ts so the browser bundles, which import the definitions, never carry zod.
 */
import { z } from 'zod';
import { sources } from '../core/sources/index.ts';

const sourceKeys = Object.keys(sources) as [keyof typeof sources, ...(keyof typeof sources)[]];

export const PROVENANCE = ['published', 'from memory', 'common practice, no source', 'closed form'] as const;

export const sourceRefSchema = z.object({
  key: z.enum(sourceKeys),
  locator: z.string().min(1),
});

export const caseSchema = z.object({
  name: z.string().min(1),
  inputs: z.record(z.union([z.number(), z.string()])),
  expected: z.record(z.union([z.number(), z.string()])),
  /** Relative tolerance (absolute when the expected value is 0); 0 for exact counts and text. */
  tolerance: z.number().nonnegative().max(0.5),
  /** Why the tolerance is what it is (required in a definition; optional on a page's extra case). */
  why: z.string().min(1).optional(),
  source: sourceRefSchema,
  provenance: z.union([z.enum(PROVENANCE), z.string().regex(/^reference library .+/)]),
}).strict();
