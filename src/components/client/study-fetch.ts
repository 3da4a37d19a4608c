/**
 * A built-in study named in the page address (`?study=<id>`), fetched as soon as the page's first
 * script runs, while the calculator and the study code are still loading (it used to wait for
 * them: one more round trip before the page could fill). Tiny on purpose: every calculator page
 * loads it. The text is untrusted until the study schema has checked it (study-link.ts).
 */
import { loadCalculator } from '../../calculators/loaders.ts';
import { STUDY_STORE } from '../../studies/storeKey.ts';

/** True when this browser keeps an open study (not yet validated). */
export function storedStudy(): boolean {
  try { return localStorage.getItem(STUDY_STORE) !== null; } catch { return false; }
}

let started: Promise<{ id: string; text: string | undefined }> | undefined;

export function fetchNamedStudy(): Promise<{ id: string; text: string | undefined }> | undefined {
  if (started) return started;
  const id = new URLSearchParams(location.search).get('study');
  const base = document.querySelector<HTMLElement>('[data-study-bar]')?.dataset.base;
  if (id === null || base === undefined) return undefined;
  started = /^[a-z0-9-]{1,80}$/.test(id)
    ? fetch(`${base}studies/${id}.json`).then(async (r) => ({ id, text: r.ok ? await r.text() : undefined }), () => ({ id, text: undefined }))
    : Promise.resolve({ id, text: undefined });
  return started;
}

/** Build-time map of each calculator's chunks (src/build/client-scripts.ts); empty in dev. */
function chunkMap(): Record<string, unknown> {
  try {
    const v: unknown = JSON.parse(document.getElementById('db-calculator-chunks')?.textContent ?? '{}');
    return v && typeof v === 'object' ? (v as Record<string, unknown>) : {};
  } catch {
    return {};
  }
}

const announced = new Set<string>();

/**
 * Asks the browser for every chunk of these calculators at once. Only a hint: the imports load
 * them anyway, but a chunk found level by level costs a round trip per level.
 */
export function announceChunks(ids: Iterable<string>): void {
  const map = chunkMap();
  for (const id of ids) {
    const urls = Object.hasOwn(map, id) ? map[id] : undefined;
    for (const href of Array.isArray(urls) ? urls : []) {
      if (typeof href !== 'string' || announced.has(href) || !href.startsWith('/')) continue;
      announced.add(href);
      const link = document.createElement('link');
      link.rel = 'modulepreload';
      link.href = href;
      document.head.append(link);
    }
  }
}

/** Starts loading these calculators now (their chunks announced at once); the study code finds them loaded. */
function warm(ids: readonly string[]): void {
  announceChunks(ids);
  for (const id of new Set(ids)) void loadCalculator(id).catch(() => undefined);
}

/** The step calculators a study text names, read without validating it (a loading hint only). */
function stepCalculators(text: string | null | undefined): string[] {
  try {
    const v: unknown = JSON.parse(text ?? '');
    const steps: unknown = v && typeof v === 'object' ? (v as { steps?: unknown }).steps : undefined;
    return Array.isArray(steps) ? steps.map((s: unknown) => (s && typeof s === 'object' ? (s as { calculator?: unknown }).calculator : undefined)).filter((c): c is string => typeof c === 'string') : [];
  } catch {
    return [];
  }
}

/** Whether a study opens on this page, decided once (the first script and the calculator element both ask). */
let opening: boolean | undefined;

/**
 * True when a study will open on this page (named in the address, or kept in this browser); starts
 * fetching the named one and starts loading its step calculators as soon as their ids are known,
 * so they load with the page instead of after the study code has read and checked the study.
 */
export function openingStudy(): boolean {
  opening ??= startOpening();
  return opening;
}

function startOpening(): boolean {
  const named = fetchNamedStudy();
  if (named) { void named.then((r) => warm(stepCalculators(r.text))); return true; }
  if (!storedStudy()) return false;
  try { warm(stepCalculators(localStorage.getItem(STUDY_STORE))); } catch { /* storage blocked: the study code says so */ }
  return true;
}
