/**
 * The calculator's records panel, loaded when the reader first opens it: named input sets kept
 * in this browser per page and calculator, and export/import of a JSON calculation record.
 * Everything read back (files, storage) goes through parseRecord/validateRecord and
 * replayRecord before a field changes; a rejected record changes nothing. Text from a record
 * reaches the page only through textContent.
 */
import { MAX_RECORD_CHARS, parseRecord, validateRecord, type CalcRecord } from '../../records/record.ts';
import { makeRecord, replayRecord, type RecordContext, type Replay } from '../../records/replay.ts';
import type { CalculatorElement } from './calculator-element.ts';

const MAX_SETS = 50;

export function attachRecords(el: CalculatorElement, panel: HTMLElement): void {
  const calc = el.calc;
  if (!calc || panel.dataset.ready !== undefined) return;
  const article = el.closest<HTMLElement>('[data-page-id]');
  const ctx: RecordContext = {
    page: article ? { id: article.dataset.pageId ?? '', revision: article.dataset.revision ?? '' } : undefined,
    coreVersion: article?.dataset.coreVersion ?? '0.0.0',
    contentHash: article?.dataset.contentHash,
  };
  const storeKey = `dampbook:sets:${ctx.page?.id ?? location.pathname}:${calc.id}`;
  const msg = panel.querySelector<HTMLElement>('.rec-msg')!;
  const nameBox = panel.querySelector<HTMLInputElement>('.rec-name')!;
  const list = panel.querySelector<HTMLSelectElement>('.rec-sets')!;
  const file = panel.querySelector<HTMLInputElement>('.rec-file')!;

  const say = (kind: 'ok' | 'warn' | 'error', text: string) => { msg.dataset.kind = kind; msg.textContent = text; };

  function current(name?: string): CalcRecord | undefined {
    if (!el.values || !el.outputs) { say('error', 'Fix the highlighted fields first: there are no valid results to save.'); return undefined; }
    return makeRecord(calc!, el.values, el.outputs, el.inputsShown(), ctx, new Date(), name);
  }

  function readSets(): CalcRecord[] {
    let data: unknown;
    try { data = JSON.parse(localStorage.getItem(storeKey) ?? '[]'); } catch { return []; }
    if (!Array.isArray(data)) return [];
    return data.slice(0, MAX_SETS).flatMap((d) => { const r = validateRecord(d); return r.ok && r.record.name ? [r.record] : []; });
  }

  function writeSets(sets: CalcRecord[]): boolean {
    try { localStorage.setItem(storeKey, JSON.stringify(sets)); return true; } catch { say('error', 'This browser refused to store the set (storage full or disabled).'); return false; }
  }

  function showSets(select?: string): void {
    const sets = readSets();
    list.replaceChildren(...sets.map((s) => { const o = document.createElement('option'); o.value = s.name!; o.textContent = s.name!; return o; }));
    if (select) list.value = select;
    list.disabled = sets.length === 0;
  }

  /** Applies a checked replay to the widget and reports how it went. */
  function apply(rec: CalcRecord, r: Extract<Replay, { ok: true }>, what: string): void {
    el.applyInputs(r.values, r.shown);
    const lines = [`${what}: ${r.matched} of ${Object.keys(rec.outputs).length} recorded outputs reproduced.`];
    for (const d of r.diffs) lines.push(`${d.key}: recorded ${String(d.recorded)}, computed now ${String(d.computed ?? '—')}.`);
    lines.push(...r.warnings);
    say(r.diffs.length ? 'error' : r.warnings.length ? 'warn' : 'ok', lines.join('\n'));
  }

  function load(rec: CalcRecord, what: string): void {
    const r = replayRecord(calc!, rec, ctx);
    if (!r.ok) { say('error', `${r.message} Nothing was changed.`); return; }
    apply(rec, r, what);
  }

  panel.addEventListener('click', (e) => {
    const act = (e.target as HTMLElement).closest<HTMLElement>('[data-rec]')?.dataset.rec;
    if (act === 'save') {
      const name = nameBox.value.trim().slice(0, 80);
      if (!name) { say('error', 'Give the input set a name.'); return; }
      const rec = current(name);
      if (!rec) return;
      const sets = readSets().filter((s) => s.name !== name);
      if (sets.length >= MAX_SETS) { say('error', `At most ${MAX_SETS} saved sets: delete one first.`); return; }
      if (writeSets([...sets, rec])) { showSets(name); say('ok', `Saved input set “${name}” in this browser.`); }
    } else if (act === 'load' || act === 'delete') {
      const name = list.value;
      const rec = readSets().find((s) => s.name === name);
      if (!rec) { say('error', 'No saved set is selected.'); return; }
      if (act === 'load') load(rec, `Loaded “${name}”`);
      else if (writeSets(readSets().filter((s) => s.name !== name))) { showSets(); say('ok', `Deleted input set “${name}”.`); }
    } else if (act === 'export') {
      const rec = current();
      if (!rec) return;
      const blob = new Blob([`${JSON.stringify(rec, null, 2)}\n`], { type: 'application/json' });
      const a = document.createElement('a');
      a.href = URL.createObjectURL(blob);
      a.download = `${ctx.page?.id ?? calc.id}-${calc.id}-${rec.time.slice(0, 19).replace(/[:T]/g, '')}.json`;
      document.body.append(a);
      a.click();
      a.remove();
      setTimeout(() => URL.revokeObjectURL(a.href), 10_000);
      say('ok', `Exported the record as ${a.download}.`);
    }
  });

  file.addEventListener('change', () => {
    const f = file.files?.[0];
    file.value = '';
    if (!f) return;
    if (f.size > MAX_RECORD_CHARS) { say('error', `Not a valid record: the file has ${f.size} bytes; at most ${MAX_RECORD_CHARS}. Nothing was changed.`); return; }
    void f.text().then((text) => {
      const p = parseRecord(text);
      if (!p.ok) { say('error', `${p.message} Nothing was changed.`); return; }
      load(p.record, 'Record imported');
    });
  });

  showSets();
  panel.dataset.ready = '';
}
