/**
 * The printed sheet's page rules: paper size and the margin-box footer (build identity,
 * calculation number, "page x of y"). Chromium (131 and later) prints CSS page margin boxes and
 * the page/pages counters, so the same rules serve the browser's Print and `dampbook sheet`.
 * Shared by the server render and the sheet-details script (which rewrites them as the reader
 * types). Pure string building; every text goes through cssString().
 */
export type Paper = 'a4' | 'letter';

export interface PageCssOptions {
  readonly paper: Paper;
  /** Left footer text: handbook, build version and content hash. */
  readonly build: string;
  /** Calculation number and project typed on the page (may be empty). */
  readonly reference: string;
  readonly draft: boolean;
}

/** A CSS string literal: anything but plain letters, digits and punctuation is escaped. */
export function cssString(s: string): string {
  return `"${s.replace(/[^A-Za-z0-9 .,:;()/+#_·–—-]/gu, (c) => `\\${c.codePointAt(0)!.toString(16)} `)}"`;
}

export function pageCss(o: PageCssOptions): string {
  const box = 'font: 8pt system-ui, sans-serif; color: #444;';
  const left = [o.build, o.reference].filter(Boolean).join(' · ');
  return `@media print { @page { size: ${o.paper === 'letter' ? 'letter' : 'A4'};` +
    ` @bottom-left { content: ${cssString(left)}; ${box} }` +
    ` @bottom-right { content: "page " counter(page) " of " counter(pages); ${box} }` +
    (o.draft ? ` @top-center { content: ${cssString('DRAFT — not for design records')}; font: 700 9pt system-ui, sans-serif; color: #a12a2a; }` : '') +
    ' } }';
}
