/**
 * One handbook page from the MDX module Astro compiled it to: its frontmatter checked by the page
 * schema (the one `dampbook check` uses), its body and headings. Pure: the page index
 * (pageIndex.ts) hands it the modules of `virtual:dampbook/pages`.
 */
import type { MarkdownHeading } from 'astro';
import type { AstroComponentFactory } from 'astro/runtime/server/index.js';
import { pageSchemaFor, type PageMeta } from './schema.ts';

export interface HandbookPage {
  /** The page's address under the site base, e.g. `thermal/warm-up`. */
  readonly id: string;
  /** The validated frontmatter. */
  readonly data: PageMeta;
  /** The source file relative to the project root (sheet header, seal, error messages). */
  readonly filePath: string;
  /** The compiled page body. */
  readonly Content: AstroComponentFactory;
  /** The page's headings, in order. */
  readonly headings: readonly MarkdownHeading[];
}

/** A page file's MDX module, as `virtual:dampbook/pages` lists it (src/build/handbook-pages.ts). */
export interface PageModuleFile {
  readonly id: string;
  readonly filePath: string;
  readonly module: { default: AstroComponentFactory; frontmatter?: unknown; getHeadings?: () => MarkdownHeading[] };
}

/** One page from its MDX module. @throws Error naming the file and each field the schema refuses */
export function pageFromModule(f: PageModuleFile, topics: readonly string[]): HandbookPage {
  const parsed = pageSchemaFor(topics).safeParse(f.module.frontmatter ?? {});
  if (!parsed.success) {
    const fields = parsed.error.issues.map((i) => `${i.path.join('.') || '(frontmatter)'}: ${i.message}`);
    throw new Error(`${f.filePath}: frontmatter does not match the page schema\n  ${fields.join('\n  ')}`);
  }
  return { id: f.id, data: parsed.data, filePath: f.filePath, Content: f.module.default, headings: f.module.getHeadings?.() ?? [] };
}

