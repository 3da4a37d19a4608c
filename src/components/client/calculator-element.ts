/**
 * <db-calculator>: upgrades a server-rendered calculator (inputs, default results, static
 * charts) into a live one. It loads only its own calculator's definition, re-reads every field on each
 * change, shows a message at a bad field and leaves the rest of the page alone, keeps the
 * inputs in the page URL, and hands charts to the chart element. No calculator logic here:
 * everything comes from the definition.
 */
import { inputOrder, isActive } from '../../calculators/evaluate.ts';
import { feedQuery, urlValue } from '../../calculators/feeds.ts';
import { computeForPage, type PageResult } from '../../calculators/pageCompute.ts';
import { absentOutputsLine } from '../render/absentOutputs.ts';
import type { CalculatorDefinition, ChartSpec, Outputs, Result, Values } from '../../calculators/types.ts';
import { findUnit, fromSI, parseQuantity, toSI, type UnitSystem } from '../../core/units/index.ts';
import { displayUnit, formatInput, formatNumber } from '../render/format.ts';
import { clip, parseTyped, readField, splitTyped, textSum } from '../render/fieldState.ts';
import { describeHeld, holdText, LARGE_TEXT, type HeldText } from '../render/heldText.ts';

import { loadCalculator } from '../../calculators/loaders.ts';
import { offThread } from './off-thread.ts';
import { openingStudy } from './study-fetch.ts';

/** After this long without an answer from the worker the state line says "Computing…". */
const BUSY_MS = 100;
let elements = 0;

export class CalculatorElement extends HTMLElement {
  calc: CalculatorDefinition | undefined;
  system: UnitSystem = 'SI';
  private charts: { update(specs: ReturnType<NonNullable<CalculatorDefinition['charts']>>, system: UnitSystem): void } | undefined;
  private pending = 0;
  /** A result already computed elsewhere for exactly these values (the open study's run of this step), used once. */
  private offered: (PageResult) | undefined;
  /** The last valid inputs (SI) and outputs shown; undefined while a field is bad. */
  values: Values | undefined;
  outputs: Outputs | undefined;
  /** Long texts held out of their textarea (heldText.ts), by input key. */
  private held = new Map<string, HeldText>();
  /** Per text field: the number of the latest file picked, so a slower earlier read cannot land after it. */
  private fileTurn = new Map<string, number>();
  /** Per text field: why the last picked file was refused; the field stays in error until it is edited. */
  private refused = new Map<string, string>();
  /** Number of the latest recompute: a worker answer for an older one is dropped. */
  private ticket = 0;
  /** The latest off-thread computation (resolved at once for one computed here). */
  private current: Promise<void> = Promise.resolve();
  /** Chart specs waiting for their own task (drawCharts). */
  private chartSpecs: ChartSpec[] | undefined;
  private chartTimer = 0;
  private chartsLoading: Promise<void> | undefined;
  /** This element's name to the off-thread computer (its newer request supersedes its older). */
  private readonly owner = `calc-${++elements}`;

  async connectedCallback(): Promise<void> {
    const id = this.dataset.calc ?? '';
    // the study code (runner, every calculator, zod) loads beside this calculator, not after it;
    // with a study open it fills this calculator's step, and `data-study` says when that is done
    const bar = document.querySelector('[data-study-bar]') !== null;
    const opened = bar && openingStudy();
    const study = bar ? import('./study-link.ts').then((m) => m.studySession()) : undefined;
    this.calc = await loadCalculator(id);
    if (!this.calc) return;
    this.applyUrl();
    this.addEventListener('submit', (e) => e.preventDefault());
    this.addEventListener('input', (e) => this.onInput(e));
    this.addEventListener('change', (e) => this.onChange(e));
    // input sets and records: their code (and zod) loads only when the panel is opened
    const rec = this.querySelector<HTMLDetailsElement>('details.calc-records');
    rec?.addEventListener('toggle', () => void import('./record-panel.ts').then((m) => m.attachRecords(this, rec)), { once: true });
    if (study && opened) {
      // a study is open: compute once, with the step's inputs, not first with the page's own
      const s = await study;
      if (!s.attach(this)) void this.recompute();
      await this.current; // `data-study`: the step's values are in and their result shows
      this.dataset.study = '';
    } else {
      void this.recompute();
      if (study) void study.then(async (s) => { s.attach(this); await this.current; this.dataset.study = ''; });
    }
    // ready once the first result shows (a worker's answer arrives a moment later)
    await this.current;
    this.dataset.ready = '';
    // tolerances, result ranges and the sweep chart (generic, from the definition): src/calculators/envelope/
    void import('./calc-tools.ts').then((m) => m.attachTools(this));
  }

  private field(key: string): HTMLElement | null {
    return this.querySelector<HTMLElement>(`.field[data-key="${CSS.escape(key)}"]`);
  }

  private control(key: string): HTMLInputElement | HTMLSelectElement | HTMLTextAreaElement | null {
    return this.querySelector(`[name="${CSS.escape(key)}"]`);
  }

  private unitSelect(key: string): HTMLSelectElement | null {
    return this.querySelector(`select[name="${CSS.escape(key)}.unit"]`);
  }

  /**
   * Fills fields from the page URL (untrusted: every value goes through the same checks as typing),
   * in dependency order: choices first (they decide which fields apply and which take SI only),
   * then the unit system (which converts every number field, shown or hidden), then numbers and
   * text. A plain number is SI; "22 kN/m" keeps its unit. A value the page does not take is said so
   * at its field, never silently replaced by the default.
   */
  private applyUrl(): void {
    const params = new URLSearchParams(location.search);
    const inputs = this.calc!.inputs;
    for (const def of inputs) {
      if (def.kind !== 'choice') continue;
      const raw = params.get(def.key);
      const ctl = this.control(def.key);
      if (raw === null || !ctl) continue;
      if (def.options.some((o) => o.value === raw)) ctl.value = raw;
      else this.showNote(def.key, `The link asked for “${clip(raw)}”, which is not an option here; the page default is shown.`);
    }
    if (params.get('units') === 'US') this.setSystem('US');
    for (const def of inputs) {
      if (def.kind === 'choice') continue;
      const rawAll = params.get(def.key);
      const ctl = this.control(def.key);
      if (!ctl) continue;
      if (def.kind === 'text') {
        const sum = params.get(`${def.key}.sha`);
        if (rawAll === null && sum !== null && sum !== textSum(def.default)) {
          this.showNote(def.key, `This link was made with other data in this field (checksum ${clip(sum)}) than a link can carry; the page's own data is shown. Paste or load that data to reproduce the linked results.`);
        }
        if (rawAll === null) continue;
        const raw = urlValue(def, rawAll);
        if (raw === undefined) { this.showNote(def.key, def.fromUrl ? `The link's value for this field is too long (${rawAll.length} characters, at most ${def.maxLength}); the page's own data is shown.` : 'A link cannot fill this field; the page\'s own data is shown. Paste or load your data.'); continue; }
        this.setText(def.key, raw, 'text from the link');
        continue;
      }
      if (rawAll === null) continue;
      const raw = urlValue(def, rawAll);
      if (raw === undefined) { this.showNote(def.key, `The link's value for this field is too long (${rawAll.length} characters); the page default is shown.`); continue; }
      const sel = this.unitSelect(def.key);
      const typed = splitTyped(raw, def.kind);
      if (typed && sel && typed.unit && [...sel.options].some((o) => o.value === typed.unit)) {
        sel.value = typed.unit;
        sel.dataset.unit = typed.unit;
        this.syncUnitLabel(def.key, sel);
        ctl.value = typed.number;
        continue;
      }
      let si: number;
      try { si = parseQuantity(raw, def.kind); } catch { ctl.value = raw; continue; }
      ctl.value = sel ? formatInput(fromSI(si, findUnit(def.kind, sel.value))) : formatInput(si);
    }
  }

  /** A note at a field about where its value came from (not an error: the field still computes). */
  private showNote(key: string, text: string): void {
    const f = this.field(key);
    if (!f) return;
    let p = f.querySelector<HTMLElement>('.addr-note');
    if (!p) {
      p = document.createElement('p');
      p.className = 'addr-note';
      p.setAttribute('role', 'status');
      const anchor = f.querySelector('.help');
      if (anchor) anchor.before(p); else f.append(p);
    }
    p.textContent = text;
  }

  private onInput(e: Event): void {
    const t = e.target as HTMLElement;
    if (t.closest('.calc-records')) return;
    if (t instanceof HTMLInputElement && t.type === 'file') return;
    if (t instanceof HTMLSelectElement && t.name.endsWith('.unit')) return;
    if (t instanceof HTMLInputElement && t.name) this.showUnitNote(t.name);
    if (t instanceof HTMLTextAreaElement) this.refused.delete(t.name);
    // a long paste leaves the live textarea
    if (t instanceof HTMLTextAreaElement && t.value.length > LARGE_TEXT) this.setText(t.name, t.value, 'pasted text');
    this.schedule();
  }

  /** The text of a text field: the held long text, else the textarea's. */
  private textOf(key: string): string {
    return this.held.get(key)?.text ?? this.control(key)?.value ?? '';
  }

  /**
   * Puts text into a text field. A long text is held by the element and the field shows its
   * summary (name, rows, characters, checksum) with a button to clear it and paste or type another;
   * a short one goes into the textarea. Either way the same text is read and checked on recompute.
   * A held text is never put back into the textarea: Chromium took 20 s to lay out 3 MB there.
   */
  private setText(key: string, text: string, name: string): void {
    const area = this.control(key);
    const f = this.field(key);
    if (!(area instanceof HTMLTextAreaElement) || !f) return;
    this.refused.delete(key); // new text in the field: an earlier refused file no longer speaks for it
    f.querySelector('.text-summary')?.remove();
    if (text.length <= LARGE_TEXT) { this.held.delete(key); area.hidden = false; area.value = text; return; }
    const h = holdText(text, clip(name, 80));
    this.held.set(key, h);
    area.value = '';
    area.hidden = true;
    const p = document.createElement('p');
    p.className = 'text-summary';
    p.setAttribute('role', 'status');
    p.append(`${describeHeld(h)} `);
    const replace = document.createElement('button');
    replace.type = 'button';
    replace.className = 'linkish';
    replace.textContent = 'Clear it to paste or type another';
    replace.addEventListener('click', () => {
      this.setText(key, '', '');
      area.focus();
      this.schedule();
    });
    p.append(replace);
    area.after(p);
  }

  private onChange(e: Event): void {
    const t = e.target as HTMLElement;
    if (t.closest('.calc-records')) return;
    if (t instanceof HTMLSelectElement && t.name.endsWith('.unit')) this.convertField(t, true);
    else if (t instanceof HTMLInputElement && t.name === 'units') this.setSystem(t.value === 'US' ? 'US' : 'SI');
    else if (t instanceof HTMLInputElement && t.type === 'file') { void this.loadFile(t); return; }
    else if (t instanceof HTMLInputElement && t.type === 'text') this.takeTypedUnit(t);
    this.schedule();
  }

  /**
   * A new unit keeps the physical quantity: the number in the field is converted from the unit it
   * was typed in. Pure unit arithmetic on whatever number the field holds — shown or hidden, in
   * range or not — so no field is ever relabelled (a hidden power-law C once kept "980" while its
   * unit changed from N·s/m to lbf·s/in). `note` says so at the field, with a way back.
   */
  private convertField(sel: HTMLSelectElement, note = false): void {
    const key = sel.name.slice(0, -'.unit'.length);
    const def = this.calc!.inputs.find((d) => d.key === key);
    const ctl = this.control(key);
    const prev = sel.dataset.unit ?? sel.value;
    sel.dataset.unit = sel.value;
    this.syncUnitLabel(key, sel);
    if (!def || def.kind === 'choice' || def.kind === 'text' || !ctl || prev === sel.value) return;
    const typed = ctl.value;
    const n = parseTyped(typed);
    if (!Number.isFinite(n)) return;
    const from = findUnit(def.kind, prev);
    const to = findUnit(def.kind, sel.value);
    ctl.value = formatInput(fromSI(toSI(n, from), to));
    if (note) this.showUnitNote(key, typed.trim(), from.symbol, ctl.value, to.symbol);
    else this.showUnitNote(key);
  }

  /** "22 kN/m" typed into a field: the menu switches to kN/m and the field keeps 22 (said at the field). */
  private takeTypedUnit(ctl: HTMLInputElement): void {
    const def = this.calc!.inputs.find((d) => d.key === ctl.name);
    const sel = this.unitSelect(ctl.name);
    if (!def || def.kind === 'choice' || def.kind === 'text' || !sel) return;
    const typed = splitTyped(ctl.value, def.kind);
    if (!typed || typed.unit === '' || ![...sel.options].some((o) => o.value === typed.unit)) return;
    sel.value = typed.unit;
    sel.dataset.unit = typed.unit;
    this.syncUnitLabel(def.key, sel);
    ctl.value = typed.number;
  }

  private syncUnitLabel(key: string, sel: HTMLSelectElement): void {
    const srUnit = this.field(key)?.querySelector('.sr-unit');
    if (srUnit) srUnit.textContent = ` (${sel.selectedOptions[0]?.textContent ?? ''})`;
  }

  /**
   * "250 N/m → 0.25 N/mm" under a field whose unit the reader changed, with a one-click way to keep
   * the number typed and change only the unit. Without arguments: removes the note.
   */
  private showUnitNote(key: string, typed?: string, fromSym?: string, now?: string, toSym?: string): void {
    const f = this.field(key);
    if (!f) return;
    f.querySelector('.unit-note')?.remove();
    if (typed === undefined) return;
    const p = document.createElement('p');
    p.className = 'unit-note';
    p.setAttribute('role', 'status');
    p.append(`Converted: ${typed} ${fromSym ?? ''} → ${now} ${toSym ?? ''}. `.replace(/\s+\./, '.'));
    const keep = document.createElement('button');
    keep.type = 'button';
    keep.className = 'linkish';
    keep.textContent = `Keep ${typed}, change only the unit`;
    keep.addEventListener('click', () => {
      const ctl = this.control(key);
      if (ctl) ctl.value = typed;
      p.remove();
      this.schedule();
    });
    p.append(keep);
    const anchor = f.querySelector('.help');
    if (anchor) anchor.before(p); else f.append(p);
  }

  /** Each number field as typed: its number and its unit id (for records). */
  inputsShown(): Record<string, { value: number; unit: string }> {
    const out: Record<string, { value: number; unit: string }> = {};
    for (const def of this.calc!.inputs) {
      if (def.kind === 'choice' || def.kind === 'text') continue;
      const n = parseTyped(this.control(def.key)?.value ?? '');
      const unit = this.unitSelect(def.key)?.value;
      if (Number.isFinite(n) && unit) out[def.key] = { value: n, unit };
    }
    return out;
  }

  /**
   * Fills every field from SI values (or the typed number and unit in `shown`) and recomputes now.
   * `result`, when given, is the result of exactly these values computed elsewhere (the study
   * runner): shown if the fields read back the same values, else the page computes its own.
   */
  applyInputs(values: Values, shown: Readonly<Record<string, { value: number; unit: string }>>, result?: Result): void {
    this.offered = result ? { ...result, values } : undefined;
    for (const def of this.calc!.inputs) {
      const v = values[def.key];
      const ctl = this.control(def.key);
      if (!ctl) continue;
      if (def.kind === 'text') { if (typeof v === 'string') this.setText(def.key, v, 'loaded text'); continue; }
      if (def.kind === 'choice') { if (typeof v === 'string') ctl.value = v; continue; }
      const sel = this.unitSelect(def.key);
      const want = shown[def.key]?.unit;
      if (sel && want && [...sel.options].some((o) => o.value === want) && sel.value !== want) {
        sel.value = want;
        sel.dataset.unit = want;
        this.syncUnitLabel(def.key, sel);
      }
      // an input that did not apply when the set was saved keeps its field (it has no saved value)
      if (v === undefined && !isActive(def, values)) continue;
      if (typeof v !== 'number') { ctl.value = ''; continue; }
      const typed = shown[def.key];
      // ten significant digits: a computed value (a mean power from another step, a value in hp)
      // stays readable and reads back within 1e-9 of itself, the tolerance of sameValues and of
      // the study's write-back, so it is never taken for a change
      ctl.value = typed && (!sel || sel.value === typed.unit) ? String(typed.value) : formatInput(sel ? fromSI(v, findUnit(def.kind, sel.value)) : v);
    }
    this.recompute();
  }

  private setSystem(system: UnitSystem): void {
    this.system = system;
    const radio = this.querySelector<HTMLInputElement>(`input[name="units"][value="${system}"]`);
    if (radio) radio.checked = true;
    for (const def of this.calc!.inputs) {
      if (def.kind === 'choice' || def.kind === 'text') continue;
      const sel = this.unitSelect(def.key);
      const want = displayUnit(def.kind, system).id;
      if (sel && sel.value !== want && [...sel.options].some((o) => o.value === want)) {
        sel.value = want;
        this.convertField(sel);
      }
    }
  }

  private async loadFile(input: HTMLInputElement): Promise<void> {
    const key = input.dataset.for ?? '';
    const def = this.calc!.inputs.find((d) => d.key === key);
    const file = input.files?.[0];
    const area = this.control(key);
    if (!file || !def || def.kind !== 'text' || !area) return;
    const turn = (this.fileTurn.get(key) ?? 0) + 1;
    this.fileTurn.set(key, turn);
    if (file.size > def.maxLength) {
      // refused, and it stays so: a recompute must not clear the message and show the old text's results as if the file had loaded
      this.refused.set(key, `File too large: ${file.size} bytes; at most ${def.maxLength}. The text shown was not replaced.`);
      this.schedule();
      return;
    }
    const text = await file.text();
    if (this.fileTurn.get(key) !== turn) return; // another file was picked while this one was read
    this.setText(key, text, file.name);
    this.schedule();
  }

  private schedule(): void {
    cancelAnimationFrame(this.pending);
    this.pending = requestAnimationFrame(() => this.recompute());
  }

  private showFieldMessage(key: string, msg: string): void {
    const f = this.field(key);
    if (!f) return;
    const p = f.querySelector('.msg');
    if (p) p.textContent = msg;
    if (msg) f.setAttribute('data-invalid', ''); else f.removeAttribute('data-invalid');
    this.control(key)?.setAttribute('aria-invalid', msg ? 'true' : 'false');
  }

  /** Reads every field; returns SI values, or null when any field is bad (messages shown). */
  readValues(): Values | null {
    const values: Record<string, number | string | undefined> = {};
    let bad = false;
    for (const def of inputOrder(this.calc!)) {
      const f = this.field(def.key);
      const active = isActive(def, values);
      if (f) f.hidden = !active;
      if (!active) { this.showFieldMessage(def.key, ''); continue; }
      const refusedWhy = this.refused.get(def.key);
      if (refusedWhy) { bad = true; this.showFieldMessage(def.key, refusedWhy); continue; }
      const ctl = this.control(def.key);
      const r = readField(def, def.kind === 'text' ? this.textOf(def.key) : ctl?.value ?? '', this.unitSelect(def.key)?.value, values);
      if (r.ok) { values[def.key] = r.value; this.showFieldMessage(def.key, ''); }
      else { bad = true; this.showFieldMessage(def.key, r.message); }
    }
    return bad ? null : values;
  }

  /**
   * Reads every field and shows the result (synchronous here, or from the worker for a calculator
   * marked `offMainThread`); resolves once what it started is shown or superseded.
   */
  recompute(): Promise<void> {
    const calc = this.calc!;
    const ticket = ++this.ticket;
    this.removeAttribute('data-computing');
    const state = this.querySelector<HTMLElement>('.calc-state');
    const values = this.readValues();
    this.values = undefined;
    this.outputs = undefined;
    const offered = this.offered;
    this.offered = undefined;
    this.current = Promise.resolve();
    if (!values) { this.setState(state, 'error', 'Not current: the results and charts below belong to earlier inputs. Fix the highlighted field to update them.'); return Promise.resolve(); }
    const draw = calc.charts !== undefined && this.querySelector('.chart') !== null;
    if (calc.offMainThread) return (this.current = this.computeOff(ticket, values, draw));
    // the study runner computed this step a moment ago with the same values: no second computation
    this.computeHere(values, draw, offered && sameValues(calc, offered.values, values) ? offered : undefined);
    return Promise.resolve();
  }

  private computeHere(values: Values, draw: boolean, offered?: PageResult): void {
    const out = computeForPage(this.calc!, values, draw, offered);
    if (!out.ok) this.showError(out.message, out.known, out.input);
    else this.show(values, out.result, out.charts, out.chartError);
  }

  /** The worker computes; "Computing…" shows after BUSY_MS; an answer for an older ticket is dropped. */
  private async computeOff(ticket: number, values: Values, draw: boolean): Promise<void> {
    const state = this.querySelector<HTMLElement>('.calc-state');
    this.toggleAttribute('data-computing', true);
    const slow = setTimeout(() => { if (ticket === this.ticket) this.setState(state, 'busy', 'Computing…'); }, BUSY_MS);
    const out = await (await offThread()).run(this.owner, this.calc!.id, values, draw);
    clearTimeout(slow);
    if (ticket !== this.ticket || out === 'superseded') return;
    this.removeAttribute('data-computing');
    if (out === 'unavailable') this.computeHere(values, draw);
    else if (!out.ok) this.showError(out.message, out.known, out.input);
    else this.show(values, out.result, out.charts, out.chartError);
  }

  /** A computation refused these inputs: the reason at its field (when it names one) and in the state line. */
  private showError(message: string, known: boolean, input: string | undefined): void {
    // a problem found while computing (e.g. a bad row in a pasted record) is shown at its field too
    if (known && input && this.field(input)) this.showFieldMessage(input, message);
    this.setState(this.querySelector<HTMLElement>('.calc-state'), 'error', `Not current: ${known ? message : 'These inputs could not be computed.'}`);
  }

  private show(values: Values, result: PageResult, charts: ChartSpec[] | undefined, chartError: string | undefined): void {
    const calc = this.calc!;
    this.renderOutputs(result.outputs);
    this.renderFeeds(result);
    this.values = result.values;
    this.outputs = result.outputs;
    const warn = this.querySelector('.calc-warnings');
    if (warn) warn.replaceChildren(...result.warnings.map((w) => { const li = document.createElement('li'); li.textContent = w; return li; }));
    this.setState(this.querySelector<HTMLElement>('.calc-state'), 'ok', chartError ? `Charts not redrawn for these inputs: ${chartError}` : '');
    // the results are current; charts that could not be drawn for them say so
    this.querySelector('.calc-charts')?.toggleAttribute('data-not-current', chartError !== undefined);
    this.writeUrl(values);
    if (charts) this.drawCharts(charts);
    this.dispatchEvent(new CustomEvent('db-computed', { bubbles: true, detail: { id: calc.id, values, outputs: result.outputs } }));
  }

  private setState(el: HTMLElement | null, kind: 'ok' | 'error' | 'busy', text: string): void {
    if (!el) return;
    el.dataset.kind = kind;
    el.textContent = text;
    const stale = kind !== 'ok';
    this.toggleAttribute('data-stale', kind === 'error');
    this.querySelector('.calc-results')?.setAttribute('aria-busy', kind === 'busy' ? 'true' : 'false');
    for (const part of this.querySelectorAll('.calc-results table, .calc-warnings, .calc-charts')) part.toggleAttribute('data-not-current', stale);
    // a hand-off must never carry a value the page no longer shows as current
    if (stale) for (const a of this.querySelectorAll<HTMLAnchorElement>('a[data-feed-out]')) this.disableFeed(a);
  }

  private feedBase(a: HTMLAnchorElement): string {
    if (!a.dataset.base) a.dataset.base = new URL(a.getAttribute('href') ?? '', location.href).pathname;
    return a.dataset.base;
  }

  private disableFeed(a: HTMLAnchorElement): void {
    this.feedBase(a);
    a.removeAttribute('href');
    a.setAttribute('aria-disabled', 'true');
    a.title = 'Not current: fix the highlighted field first.';
  }

  private renderOutputs(outputs: Outputs): void {
    for (const def of this.calc!.outputs) {
      const row = this.querySelector<HTMLElement>(`tr[data-out="${CSS.escape(def.key)}"]`);
      if (!row) continue;
      const v = outputs[def.key];
      const cell = row.querySelector('.value')!;
      const unitCell = row.querySelector('.unit')!;
      row.classList.toggle('absent', v === undefined);
      if (v === undefined) { cell.textContent = '—'; unitCell.textContent = 'n/a'; continue; }
      if (typeof v === 'string' || def.kind === 'text') { cell.textContent = String(v); unitCell.textContent = ''; continue; }
      const u = displayUnit(def.kind, this.system);
      cell.textContent = formatNumber(fromSI(v, u), def.digits ?? 4);
      unitCell.textContent = u.symbol;
    }
    const absent = this.querySelector('.calc-absent');
    if (absent) absent.textContent = absentOutputsLine(this.calc!, outputs);
  }

  /**
   * Rewrites each feed link from the new result (feedQuery); hides it while a source is absent.
   * The values travel in SI; the reader's unit system travels with them, so a reader in US units
   * does not land on the next page in SI.
   */
  private renderFeeds(result: PageResult): void {
    for (const a of this.querySelectorAll<HTMLAnchorElement>('a[data-feed-out]')) {
      const out = a.dataset.feedOut ?? '';
      const feed = this.calc!.outputs.find((o) => o.key === out)?.feeds?.[Number(a.dataset.feedIndex)];
      const query = feed ? feedQuery(feed, out, result) : undefined;
      const base = this.feedBase(a);
      a.hidden = query === undefined;
      if (query === undefined) continue;
      a.href = `${base}?${query}${this.system === 'US' ? '&units=US' : ''}`;
      a.removeAttribute('aria-disabled');
      a.removeAttribute('title');
    }
  }

  private writeUrl(values: Values): void {
    const params = new URLSearchParams(location.search);
    for (const def of this.calc!.inputs) {
      const v = values[def.key];
      if (def.kind === 'text' && !def.fromUrl) {
        // the data itself cannot travel in a link: its checksum says on the other end that it differed
        params.delete(def.key);
        // a held long text has its checksum already (no 5 MB loop on every keystroke)
        if (typeof v === 'string' && v !== def.default) params.set(`${def.key}.sha`, this.held.get(def.key)?.sum ?? textSum(v)); else params.delete(`${def.key}.sha`);
        continue;
      }
      if (v === undefined) { params.delete(def.key); continue; }
      if (typeof v !== 'number' || def.kind === 'choice' || def.kind === 'text') { params.set(def.key, String(v)); continue; }
      // a number keeps the unit it was typed in ("22 kN/m"); in the SI base unit it is a plain number
      const unit = this.unitSelect(def.key)?.value;
      const u = unit ? findUnit(def.kind, unit) : undefined;
      const typed = parseTyped(this.control(def.key)?.value ?? '');
      params.set(def.key, u && (u.factor !== 1 || u.offset) && Number.isFinite(typed) ? `${formatInput(typed)} ${u.id}` : formatInput(v));
    }
    if (this.system === 'US') params.set('units', 'US'); else params.delete('units');
    history.replaceState(history.state, '', `${location.pathname}?${params.toString()}${location.hash}`);
  }

  /**
   * Draws in a task of its own, the newest specs only: the results, the address and the chart
   * together made one 60–80 ms task per keystroke on the heavier pages; apart, each stays under
   * the 50 ms a long task starts at (test/browser/mainThread.test.ts).
   */
  private drawCharts(specs: ChartSpec[]): void {
    this.chartSpecs = specs;
    if (this.chartTimer) return;
    this.chartTimer = window.setTimeout(() => {
      this.chartTimer = 0;
      const next = this.chartSpecs;
      this.chartSpecs = undefined;
      if (next) void this.drawNow(next);
    }, 0);
  }

  /** One chart per task (a 60 s simulation's four charts took 70–100 ms together); newer specs stop the rest. */
  private async drawNow(specs: ChartSpec[]): Promise<void> {
    this.chartsLoading ??= import('./chart-view.ts').then(({ ChartGroup }) => { this.charts = new ChartGroup(this); });
    await this.chartsLoading;
    for (const [i, spec] of specs.entries()) {
      if (i > 0) await new Promise((r) => setTimeout(r, 0));
      if (this.chartSpecs) return; // a newer result's charts are waiting: draw those instead
      this.charts?.update([spec], this.system);
    }
  }
}

if (!customElements.get('db-calculator')) customElements.define('db-calculator', CalculatorElement);

/**
 * The page reads the same input values as `given`: every value it reads equal (text exactly,
 * numbers within 1e-12 relative: a field's unit round trip), and every input it does not read is
 * one that does not apply (a choice of another mode the runner keeps).
 */
function sameValues(calc: CalculatorDefinition, given: Values, read: Values): boolean {
  // 1e-9: a field holds ten significant digits (formatInput), so a value filled in reads back within 5e-10
  const same = (x: unknown, y: unknown) => typeof x === 'number' && typeof y === 'number' ? Math.abs(x - y) <= 1e-9 * Math.max(Math.abs(x), Math.abs(y)) : x === y;
  return calc.inputs.every((d) => read[d.key] === undefined
    ? given[d.key] === undefined || !isActive(d, read)
    : same(read[d.key], given[d.key]));
}
