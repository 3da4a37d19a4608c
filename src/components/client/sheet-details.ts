/**
 * Sheet details: the project, numbers, names and date the reader types for the printed sheet
 * header, and the paper size. Values come from the page address first, then this browser's
 * storage for THIS page; every change updates the header, the address and the storage. The storage
 * is keyed by the page's path so the details typed on one page's sheet never print on another's
 * (a power-rating sheet once carried the ring-down job's calculation number). Untrusted text only
 * ever reaches the page through textContent and cssString().
 */
import { pageCss, type Paper } from '../../sheets/pageCss.ts';
import { STUDY_STORE, STUDY_STORED_EVENT } from '../../studies/storeKey.ts';

const KEYS = ['project', 'no', 'calc', 'by', 'checker', 'date'] as const;
type Key = (typeof KEYS)[number];
/** The shared key of earlier versions, removed on load so its values cannot reappear anywhere. */
const LEGACY_STORE = 'dampbook:sheet';
const STORE = `dampbook:sheet:${location.pathname}`;
const MAX = 120;

const panel = document.querySelector<HTMLElement>('[data-sheet-panel]');
const style = document.querySelector<HTMLStyleElement>('#sheet-page-css');

function stored(): Partial<Record<Key | 'paper', string>> {
  try {
    const o: unknown = JSON.parse(localStorage.getItem(STORE) ?? '{}');
    if (!o || typeof o !== 'object') return {};
    const out: Partial<Record<Key | 'paper', string>> = {};
    for (const k of [...KEYS, 'paper'] as const) {
      const v = (o as Record<string, unknown>)[k];
      if (typeof v === 'string') out[k] = v.slice(0, MAX);
    }
    return out;
  } catch { return {}; }
}

/**
 * With a study open that has this page as a step, the study's project is this sheet's project (its
 * calculation number on the header), unless details were typed for this page or the address has
 * them. Read without the study schema (this script stays small): only strings are taken, and
 * they reach the page through textContent and cssString() like typed text.
 */
function fromStudy(): Partial<Record<Key, string>> {
  try {
    const o: unknown = JSON.parse(localStorage.getItem(STUDY_STORE) ?? 'null');
    const pageId = document.querySelector<HTMLElement>('article[data-page-id]')?.dataset.pageId;
    if (!o || typeof o !== 'object' || !pageId) return {};
    const { project, steps } = o as { project?: Record<string, unknown>; steps?: unknown };
    if (!project || !Array.isArray(steps) || !steps.some((s) => s && typeof s === 'object' && (s as { page?: unknown }).page === pageId)) return {};
    const map: Record<Key, string> = { project: 'name', no: 'number', calc: 'calculationNo', by: 'preparedBy', checker: 'checkedBy', date: 'date' };
    const out: Partial<Record<Key, string>> = {};
    for (const k of KEYS) { const v = project[map[k]]; if (typeof v === 'string') out[k] = v.slice(0, MAX); }
    return out;
  } catch { return {}; }
}

function field(k: Key): HTMLInputElement | null {
  return panel?.querySelector<HTMLInputElement>(`[data-sheet-field="${k}"]`) ?? null;
}

function current(): { values: Record<Key, string>; paper: Paper } {
  const values = Object.fromEntries(KEYS.map((k) => [k, (field(k)?.value ?? '').trim().slice(0, MAX)])) as Record<Key, string>;
  const sel = panel?.querySelector<HTMLSelectElement>('[data-sheet-paper]');
  return { values, paper: sel?.value === 'letter' ? 'letter' : 'a4' };
}

function render(write: boolean): void {
  const { values, paper } = current();
  const shown = { ...values, date: values.date || new Date().toISOString().slice(0, 10) };
  for (const k of KEYS) for (const el of document.querySelectorAll<HTMLElement>(`[data-sheet="${k}"]`)) el.textContent = shown[k];
  document.documentElement.classList.toggle('paper-letter', paper === 'letter');
  if (style) {
    const ref = [values.no, values.calc && `calc. ${values.calc}`].filter(Boolean).join(' · ');
    style.textContent = pageCss({ paper, build: style.dataset.build ?? '', reference: ref, draft: style.dataset.draft === 'true' });
  }
  if (!write) return;
  try { localStorage.setItem(STORE, JSON.stringify({ ...values, paper })); } catch { /* storage full or blocked: the address still has it */ }
  const params = new URLSearchParams(location.search);
  for (const k of KEYS) if (values[k]) params.set(`sheet-${k}`, values[k]); else params.delete(`sheet-${k}`);
  if (paper === 'letter') params.set('paper', 'letter'); else params.delete('paper');
  history.replaceState(history.state, '', `${location.pathname}?${params.toString()}${location.hash}`);
}

/** Fills the fields: the address first, then details typed for this page, then the open study's. */
function fill(): void {
  const params = new URLSearchParams(location.search);
  const typed = stored();
  const saved = KEYS.some((k) => typed[k]) ? typed : { ...typed, ...fromStudy() };
  const fromUrl = KEYS.some((k) => params.has(`sheet-${k}`));
  for (const k of KEYS) {
    const el = field(k);
    if (el) el.value = (fromUrl ? params.get(`sheet-${k}`) ?? '' : saved[k] ?? '').slice(0, MAX);
  }
  const sel = panel?.querySelector<HTMLSelectElement>('[data-sheet-paper]');
  if (sel) sel.value = (params.get('paper') ?? saved.paper) === 'letter' ? 'letter' : 'a4';
  render(false);
}

if (panel) {
  try { localStorage.removeItem(LEGACY_STORE); } catch { /* storage blocked: nothing to remove */ }
  fill();
  // a study opened (or closed) on this page after it loaded — e.g. from `?study=` — decides the
  // header at once, not only on the next page load
  document.addEventListener(STUDY_STORED_EVENT, fill);
  panel.addEventListener('input', () => render(true));
  panel.addEventListener('change', () => render(true));
  panel.querySelector('[data-sheet-print]')?.addEventListener('click', () => window.print());
  panel.dataset.ready = '';
}
