/**
 * A built-in study named in the page address (`?study=<id>`), fetched as soon as the page's first
 * script runs, while the calculator and the study code are still loading (it used to wait for
 * them: one more round trip before the page could fill). Tiny on purpose: every calculator page
 * loads it. The text is untrusted until the study schema has checked it (study-link.ts).
 */
import { loadCalculator } from '../../calculators/loaders.ts';
import { STUDY_STORE } from '../../studies/storeKey.ts';
import { announceChunks, stepCalculators } from './chunk-hints.ts';

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

/** Starts loading these calculators now (their chunks announced at once); the study code finds them loaded. */
function warm(ids: readonly string[]): void {
  announceChunks(ids);
  for (const id of new Set(ids)) void loadCalculator(id).catch(() => undefined);
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
