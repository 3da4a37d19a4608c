/** The built pages that hold calculators, and which calculators each holds (read from the HTML). */
import { readFileSync } from 'node:fs';
import { builtPages, fileFor } from './crawl.ts';

export interface CalcPage {
  readonly path: string;
  readonly calcs: readonly string[];
}

export function calculatorPages(root: string, base: string): CalcPage[] {
  return builtPages(root, base).flatMap((path) => {
    const html = readFileSync(fileFor(root, base, path)!, 'utf8');
    const calcs = [...html.matchAll(/<db-calculator[^>]*\sdata-calc="([^"]+)"/g)].map((m) => m[1]!);
    return calcs.length ? [{ path, calcs }] : [];
  });
}

/** Page paths without any calculator. */
/** Pages that run computations without a calculator panel (the open study's package runs the study runner). */
const APP_PAGES = ['studies/open'];

export function prosePages(root: string, base: string): string[] {
  const withCalc = new Set(calculatorPages(root, base).map((p) => p.path));
  return builtPages(root, base).filter((p) => !withCalc.has(p) && !APP_PAGES.some((a) => p.replace(/\/$/, '').endsWith(a)));
}
