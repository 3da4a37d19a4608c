/**
 * What a calculation package needs to know of the handbook, read once per build: each page's
 * address, title, revision, status and verification summary, and each calculator's key formulas
 * rendered by KaTeX. The built packages use it directly; the page that prints the study open in a
 * browser gets it as JSON.
 */
import katex from 'katex';
import { handbookPages } from '../../content/pageIndex.ts';
import { pageUrl } from '../../content/pageUrl.ts';
import { pageStatus } from '../../content/pageStatus.ts';
import { verifyPage } from '../../content/verify.ts';
import { KEY_FORMULAS } from '../../studies/formulas.ts';
import type { Catalogue, PageInfo } from '../../studies/packageView.ts';

let cached: Promise<Catalogue> | undefined;

function verificationLine(rows: ReturnType<typeof verifyPage>['rows']): string {
  if (rows.length === 0) return 'No verification cases on this page.';
  const passed = rows.filter((r) => r.pass).length;
  return `${passed === rows.length ? 'All' : `${passed} of`} ${rows.length} checks of ${new Set(rows.map((r) => r.case)).size} cases pass (recomputed when this handbook was built).`;
}

export function packageCatalogue(): Promise<Catalogue> {
  return (cached ??= (async () => {
    const pages: Record<string, PageInfo> = {};
    for (const p of await handbookPages()) {
      pages[p.data.id] = { url: pageUrl(p.id), title: p.data.title, revision: p.data.revision, status: pageStatus(p.data, p.filePath).label, verification: verificationLine(verifyPage(p.data).rows) };
    }
    const tex = (s: string) => katex.renderToString(s, { displayMode: true, throwOnError: true, output: 'html' });
    const formulas = Object.fromEntries(Object.entries(KEY_FORMULAS).map(([id, fs]) => [id, fs.map(tex)]));
    return { pages, formulas };
  })());
}
