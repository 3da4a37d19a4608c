/**
 * The page metadata schema: one zod schema is the source of the frontmatter's types, defaults
 * and validation, used by the Astro content collection and by `dampbook check`.
 */
import { z } from 'zod';
import { sources } from '../core/sources/index.ts';

const sourceKeys = Object.keys(sources) as [keyof typeof sources, ...(keyof typeof sources)[]];

export const PROVENANCE = ['published', 'from memory', 'common practice, no source', 'closed form'] as const;

export const sourceRefSchema = z.object({
  key: z.enum(sourceKeys),
  locator: z.string().min(1),
});

export const verificationCaseSchema = z.object({
  name: z.string().min(1),
  calculator: z.string().min(1),
  inputs: z.record(z.union([z.number(), z.string()])),
  expected: z.record(z.union([z.number(), z.string()])),
  /** Relative tolerance (absolute when the expected value is 0). */
  tolerance: z.number().positive().max(0.5),
  source: sourceRefSchema,
  provenance: z.union([z.enum(PROVENANCE), z.string().regex(/^reference library .+/)]),
});

export const TOPICS = ['Oscillators', 'Damping from tests', 'Damper laws', 'Duty cycles', 'Thermal rating', 'Handbook'] as const;

export const pageSchema = z
  .object({
    id: z.string().regex(/^[a-z0-9-]+$/, 'lower-case letters, digits and hyphens'),
    title: z.string().min(3),
    summary: z.string().min(10),
    topic: z.enum(TOPICS),
    order: z.number().int().default(100),
    tags: z.array(z.string()).default([]),
    revision: z.string().regex(/^[A-Z0-9][A-Z0-9.]*$/, 'a revision such as A, B or 2.1'),
    status: z.enum(['draft', 'checked', 'approved']),
    preparedBy: z.string().min(2),
    checkedBy: z.string().optional(),
    approvedBy: z.string().optional(),
    prepared: z.coerce.date(),
    checked: z.coerce.date().optional(),
    approved: z.coerce.date().optional(),
    project: z.string().optional(),
    calculators: z.array(z.string()).default([]),
    references: z.array(sourceRefSchema).default([]),
    verification: z.array(verificationCaseSchema).default([]),
  })
  .superRefine((p, ctx) => {
    if (p.status !== 'draft' && !p.checkedBy) ctx.addIssue({ code: 'custom', path: ['checkedBy'], message: `a ${p.status} page needs checkedBy` });
    if (p.status === 'approved') {
      if (!p.approvedBy) ctx.addIssue({ code: 'custom', path: ['approvedBy'], message: 'an approved page needs approvedBy' });
      if (p.verification.length === 0) ctx.addIssue({ code: 'custom', path: ['verification'], message: 'an approved page needs at least one verification case' });
    }
  });

export type PageMeta = z.infer<typeof pageSchema>;
export type PageVerificationCase = z.infer<typeof verificationCaseSchema>;
