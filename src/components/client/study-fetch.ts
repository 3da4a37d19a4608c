/**
 * A built-in study named in the page address (`?study=<id>`), fetched as soon as the page's first
 * script runs, while the calculator and the study code are still loading (it used to wait for
 * them: one more round trip before the page could fill). Tiny on purpose: every calculator page
 * loads it. The text is untrusted until the study schema has checked it (study-link.ts).
 */
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
