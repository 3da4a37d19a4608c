/**
 * The study open in this browser: one study file kept in localStorage, re-validated on every read
 * (storage is as untrusted as any file). Pages read it on load; a page that changes a value writes
 * the whole study back. Other tabs see the change on their next load (the "storage" event is not
 * followed: a page never changes under the reader's hands).
 */
import { parseStudy, STUDY_STORE, type Study } from '../../studies/schema.ts';
import { STUDY_STORED_EVENT } from '../../studies/storeKey.ts';

export { STUDY_STORE };

export type StoredStudy = { ok: true; study: Study } | { ok: false; message: string } | undefined;

/** The open study; undefined when none is open; a message when the stored text is not a valid study. */
export function readOpenStudy(): StoredStudy {
  let text: string | null = null;
  try { text = localStorage.getItem(STUDY_STORE); } catch { return undefined; }
  if (text === null) return undefined;
  return parseStudy(text);
}

/** Keeps the study; false when the browser refuses (storage full or disabled). */
export function saveOpenStudy(study: Study): boolean {
  try { localStorage.setItem(STUDY_STORE, JSON.stringify(study, null, 1)); } catch { return false; }
  document.dispatchEvent(new Event(STUDY_STORED_EVENT));
  return true;
}

export function closeOpenStudy(): void {
  try { localStorage.removeItem(STUDY_STORE); } catch { /* storage blocked: nothing is open */ }
  document.dispatchEvent(new Event(STUDY_STORED_EVENT));
}
