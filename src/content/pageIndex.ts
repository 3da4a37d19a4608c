/**
 * The handbook's pages, read once per build and shared by every component that needs them
 * (reading them again on each of hundreds of pages made the build grow with the square of the
 * page count). The files come from `virtual:dampbook/pages` (src/build/handbook-pages.ts), sorted
 * by id, so the page-address and catalogue blocks every page carries are the same from one build
 * of the same content to the next. Each page's frontmatter is checked here by the page schema
 * `dampbook check` uses; a page that fails stops the build naming its file and every field.
 */
import files from 'virtual:dampbook/pages';
import { site } from '../site.config.ts';
import { pageFromModule, type HandbookPage } from './pageModule.ts';

export type { HandbookPage };

let cached: Promise<readonly HandbookPage[]> | undefined;

export function handbookPages(): Promise<readonly HandbookPage[]> {
  return (cached ??= Promise.resolve().then(() => files.map((f) => pageFromModule(f, site.topics))));
}
