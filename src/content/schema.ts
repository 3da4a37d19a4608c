/**
 * The page metadata schema: one zod schema is the source of the frontmatter's types, defaults
 * and validation, used by the site build (src/content/pageIndex.ts) and by `dampbook check`.
 */
import { z } from 'zod';
import { caseSchema, PROVENANCE, sourceRefSchema } from '../calculators/caseSchema.ts';

export { PROVENANCE, sourceRefSchema };

/**
 * A page's own extra case: the shared case shape plus the calculator it runs. A page runs every
 * case of the calculators it lists (their definitions hold them); its frontmatter names only cases
 * particular to the page, and one that repeats a definition's case is refused (verify.ts).
 */
export const verificationCaseSchema = caseSchema.extend({ calculator: z.string().min(1) });

/** The demo handbook's topics (content/handbook.config.json); another handbook's come from its own config. */
export const TOPICS = ['Oscillators', 'Damping from tests', 'Damper laws', 'Duty cycles', 'Thermal rating', 'Handbook'] as const;

/** The page schema of a handbook whose `topic:` may be one of `topics` (its config's titles). */
export function pageSchemaFor(topics: readonly string[]) {
  return z
  .object({
    id: z.string().regex(/^[a-z0-9-]+$/, 'lower-case letters, digits and hyphens'),
    title: z.string().min(3),
    summary: z.string().min(10),
    topic: z.enum(topics as [string, ...string[]]),
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
    // seals of what was checked / approved (src/content/seal.ts), written by `dampbook check-off` / `approve`
    checkHash: z.string().regex(/^[0-9a-f]{16}$/, '16 hex digits, written by dampbook check-off').optional(),
    approvalHash: z.string().regex(/^[0-9a-f]{16}$/, '16 hex digits, written by dampbook approve').optional(),
    project: z.string().optional(),
    calculators: z.array(z.string()).default([]),
    references: z.array(sourceRefSchema).default([]),
    verification: z.array(verificationCaseSchema).default([]),
  })
  .superRefine((p, ctx) => {
    if (p.status !== 'draft' && !p.checkedBy) ctx.addIssue({ code: 'custom', path: ['checkedBy'], message: `a ${p.status} page needs checkedBy` });
    if (p.status === 'approved') {
      if (!p.approvedBy) ctx.addIssue({ code: 'custom', path: ['approvedBy'], message: 'an approved page needs approvedBy' });
      // every calculator's definition carries sourced cases (test/calculators/verification.test.ts)
      if (p.verification.length === 0 && p.calculators.length === 0) ctx.addIssue({ code: 'custom', path: ['verification'], message: 'an approved page needs at least one verification case (a calculator or a case of its own)' });
    }
  });
}

export const pageSchema = pageSchemaFor(TOPICS);

export type PageMeta = z.infer<typeof pageSchema>;
export type PageVerificationCase = z.infer<typeof verificationCaseSchema>;
