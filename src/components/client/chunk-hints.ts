/**
 * The page's JSON data blocks and the loading hints for a study's step calculators, shared by the
 * classic script that runs while the page is read (study-hint.ts) and the study code
 * (study-fetch.ts, study-link.ts). Depends on nothing, so the classic script stays small.
 */

/** A JSON object from a data block of the page (`<script type="application/json" id=…>`); {} when absent or damaged. */
export function pageData(id: string): Record<string, unknown> {
  try {
    const v: unknown = JSON.parse(document.getElementById(id)?.textContent ?? '{}');
    return v && typeof v === 'object' ? (v as Record<string, unknown>) : {};
  } catch {
    return {};
  }
}

/** The step calculators a study text names, read without validating it (a loading hint only). */
export function stepCalculators(text: string | null | undefined): string[] {
  try {
    const v: unknown = JSON.parse(text ?? '');
    const steps: unknown = v && typeof v === 'object' ? (v as { steps?: unknown }).steps : undefined;
    return Array.isArray(steps) ? steps.map((s: unknown) => (s && typeof s === 'object' ? (s as { calculator?: unknown }).calculator : undefined)).filter((c): c is string => typeof c === 'string') : [];
  } catch {
    return [];
  }
}

/**
 * Adds a `<link rel=modulepreload>` to the head once per address. The head is the record of what
 * was asked for: the classic script and the modules are separate bundles with no shared state.
 * (Normal priority on purpose: at low priority the early study session waited up to 0.26 s.)
 */
function preloadModule(href: string): void {
  if (document.querySelector(`link[rel="modulepreload"][href="${CSS.escape(href)}"]`)) return;
  const link = document.createElement('link');
  link.rel = 'modulepreload';
  link.href = href;
  document.head.append(link);
}

/**
 * Asks the browser for every chunk of these calculators at once, from the build's map of each
 * calculator's chunks (src/build/client-scripts.ts; empty in dev). Only a hint: the imports load
 * them anyway, but a chunk found level by level costs a round trip per level.
 */
export function announceChunks(ids: Iterable<string>): void {
  const map = pageData('db-calculator-chunks');
  for (const id of ids) {
    const urls = Object.hasOwn(map, id) ? map[id] : undefined;
    for (const href of Array.isArray(urls) ? urls : []) if (typeof href === 'string' && href.startsWith('/')) preloadModule(href);
  }
}
