/**
 * <db-calculator>: upgrades a server-rendered calculator (inputs, default results, static
 * charts) into a live one. It loads only its own calculator's definition, re-reads every field on each
 * change, shows a message at a bad field and leaves the rest of the page alone, keeps the
 * inputs in the page URL, and hands charts to the chart element. No calculator logic here:
 * everything comes from the definition.
 */
import { evaluate, inputOrder, isActive, siOnly } from '../../calculators/evaluate.ts';
import { feedQuery, urlValue } from '../../calculators/feeds.ts';
import type { CalculatorDefinition, Outputs, Result, Values } from '../../calculators/types.ts';
import { DampbookError, InputRangeError } from '../../core/errors.ts';
import { findUnit, fromSI, parseQuantity, type UnitSystem } from '../../core/units/index.ts';
import { displayUnit, formatInput, formatNumber } from './format.ts';
import { parseTyped, readField } from './fieldState.ts';

import { calculatorLoaders } from '../../calculators/loaders.ts';

export class CalculatorElement extends HTMLElement {
  calc: CalculatorDefinition | undefined;
  system: UnitSystem = 'SI';
  private charts: { update(specs: ReturnType<NonNullable<CalculatorDefinition['charts']>>, system: UnitSystem): void } | undefined;
  private pending = 0;
  /** The last valid inputs (SI) and outputs shown; undefined while a field is bad. */
  values: Values | undefined;
  outputs: Outputs | undefined;

  async connectedCallback(): Promise<void> {
    const id = this.dataset.calc ?? '';
    this.calc = Object.hasOwn(calculatorLoaders, id) ? await calculatorLoaders[id]!() : undefined;
    if (!this.calc) return;
    this.applyUrl();
    this.addEventListener('submit', (e) => e.preventDefault());
    this.addEventListener('input', (e) => this.onInput(e));
    this.addEventListener('change', (e) => this.onChange(e));
    this.recompute();
    // input sets and records: their code (and zod) loads only when the panel is opened
    const rec = this.querySelector<HTMLDetailsElement>('details.calc-records');
    rec?.addEventListener('toggle', () => void import('./record-panel.ts').then((m) => m.attachRecords(this, rec)), { once: true });
    this.dataset.ready = '';
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

  /** Fills fields from the page URL (untrusted: every value goes through the same checks as typing). */
  private applyUrl(): void {
    const params = new URLSearchParams(location.search);
    if (params.get('units') === 'US') this.setSystem('US');
    for (const def of this.calc!.inputs) {
      // text only where the definition allows it (fromUrl), then checked like typing
      const raw = urlValue(def, params.get(def.key));
      if (raw === undefined) continue;
      const ctl = this.control(def.key);
      if (!ctl) continue;
      if (def.kind === 'text') { ctl.value = raw; continue; }
      if (def.kind === 'choice') {
        if (def.options.some((o) => o.value === raw)) ctl.value = raw;
        continue;
      }
      const sel = this.unitSelect(def.key);
      let si: number;
      try { si = parseQuantity(raw, def.kind); } catch { ctl.value = raw; continue; }
      ctl.value = sel ? formatInput(fromSI(si, findUnit(def.kind, sel.value))) : formatInput(si);
    }
  }

  private onInput(e: Event): void {
    const t = e.target as HTMLElement;
    if (t.closest('.calc-records')) return;
    if (t instanceof HTMLInputElement && t.type === 'file') return;
    if (t instanceof HTMLSelectElement && t.name.endsWith('.unit')) return;
    this.schedule();
  }

  private onChange(e: Event): void {
    const t = e.target as HTMLElement;
    if (t.closest('.calc-records')) return;
    if (t instanceof HTMLSelectElement && t.name.endsWith('.unit')) this.convertField(t);
    else if (t instanceof HTMLInputElement && t.name === 'units') this.setSystem(t.value === 'US' ? 'US' : 'SI');
    else if (t instanceof HTMLInputElement && t.type === 'file') { void this.loadFile(t); return; }
    this.schedule();
  }

  /** A new unit keeps the physical quantity: the number in the field is converted. */
  private convertField(sel: HTMLSelectElement): void {
    const key = sel.name.slice(0, -'.unit'.length);
    const def = this.calc!.inputs.find((d) => d.key === key);
    const ctl = this.control(key);
    const prev = sel.dataset.unit ?? sel.value;
    sel.dataset.unit = sel.value;
    const srUnit = this.field(key)?.querySelector('.sr-unit');
    if (srUnit) srUnit.textContent = ` (${sel.selectedOptions[0]?.textContent ?? ''})`;
    if (!def || def.kind === 'choice' || def.kind === 'text' || !ctl) return;
    const r = readField(def, ctl.value, prev, {});
    if (r.ok && typeof r.value === 'number') ctl.value = formatInput(fromSI(r.value, findUnit(def.kind, sel.value)));
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

  /** Fills every field from SI values (or the typed number and unit in `shown`) and recomputes now. */
  applyInputs(values: Values, shown: Readonly<Record<string, { value: number; unit: string }>>): void {
    for (const def of this.calc!.inputs) {
      const v = values[def.key];
      const ctl = this.control(def.key);
      if (!ctl) continue;
      if (def.kind === 'choice' || def.kind === 'text') { if (typeof v === 'string') ctl.value = v; continue; }
      const sel = this.unitSelect(def.key);
      const want = shown[def.key]?.unit;
      if (sel && want && [...sel.options].some((o) => o.value === want) && sel.value !== want) {
        sel.value = want;
        sel.dataset.unit = want;
        const srUnit = this.field(def.key)?.querySelector('.sr-unit');
        if (srUnit) srUnit.textContent = ` (${sel.selectedOptions[0]?.textContent ?? ''})`;
      }
      if (typeof v !== 'number') { ctl.value = ''; continue; }
      const typed = shown[def.key];
      // String() of a double parses back to the same double: the field reproduces the value exactly
      ctl.value = typed && (!sel || sel.value === typed.unit) ? String(typed.value) : String(sel ? fromSI(v, findUnit(def.kind, sel.value)) : v);
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
      // a field that takes SI base units only for the current choice (siOnlyWhen) stays in SI
      const gate = def.siOnlyWhen;
      const pinned = gate !== undefined && siOnly(def, { [gate.key]: this.control(gate.key)?.value });
      const want = pinned ? displayUnit(def.kind, 'SI').id : displayUnit(def.kind, system).id;
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
    if (file.size > def.maxLength) { this.showFieldMessage(key, `File too large: ${file.size} bytes; at most ${def.maxLength}.`); return; }
    area.value = await file.text();
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
      const ctl = this.control(def.key);
      const r = readField(def, ctl?.value ?? '', this.unitSelect(def.key)?.value, values);
      if (r.ok) { values[def.key] = r.value; this.showFieldMessage(def.key, ''); }
      else { bad = true; this.showFieldMessage(def.key, r.message); }
    }
    return bad ? null : values;
  }

  recompute(): void {
    const calc = this.calc!;
    const state = this.querySelector<HTMLElement>('.calc-state');
    const values = this.readValues();
    this.values = undefined;
    this.outputs = undefined;
    if (!values) { this.setState(state, 'error', 'Results are held until every highlighted field is valid.'); return; }
    let result;
    try {
      result = evaluate(calc, values);
    } catch (e) {
      const msg = e instanceof DampbookError ? e.message : 'These inputs could not be computed.';
      // a problem found while computing (e.g. a bad row in a pasted record) is shown at its field too
      if (e instanceof InputRangeError && this.field(e.input)) this.showFieldMessage(e.input, e.message);
      this.setState(state, 'error', msg);
      return;
    }
    this.renderOutputs(result.outputs);
    this.renderFeeds(result);
    this.values = result.values;
    this.outputs = result.outputs;
    const warn = this.querySelector('.calc-warnings');
    if (warn) warn.replaceChildren(...result.warnings.map((w) => { const li = document.createElement('li'); li.textContent = w; return li; }));
    this.setState(state, 'ok', '');
    this.writeUrl(values);
    if (calc.charts && this.querySelector('.chart')) void this.drawCharts(calc.charts(result.values, result));
    this.dispatchEvent(new CustomEvent('db-computed', { bubbles: true, detail: { id: calc.id, values, outputs: result.outputs } }));
  }

  private setState(el: HTMLElement | null, kind: 'ok' | 'error', text: string): void {
    if (!el) return;
    el.dataset.kind = kind;
    el.textContent = text;
    this.toggleAttribute('data-stale', kind === 'error');
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
  }

  /** Rewrites each feed link from the new result (feedQuery); hides it while a source is absent. */
  private renderFeeds(result: Result & { values: Values }): void {
    for (const a of this.querySelectorAll<HTMLAnchorElement>('a[data-feed-out]')) {
      const out = a.dataset.feedOut ?? '';
      const feed = this.calc!.outputs.find((o) => o.key === out)?.feeds?.[Number(a.dataset.feedIndex)];
      const query = feed ? feedQuery(feed, out, result) : undefined;
      a.hidden = query === undefined;
      if (query === undefined) continue;
      const url = new URL(a.href, location.href);
      url.search = query;
      a.href = url.pathname + url.search;
    }
  }

  private writeUrl(values: Values): void {
    const params = new URLSearchParams(location.search);
    for (const def of this.calc!.inputs) {
      const v = values[def.key];
      if ((def.kind === 'text' && !def.fromUrl) || v === undefined) params.delete(def.key);
      else params.set(def.key, typeof v === 'number' ? formatInput(v) : v);
    }
    if (this.system === 'US') params.set('units', 'US'); else params.delete('units');
    history.replaceState(history.state, '', `${location.pathname}?${params.toString()}${location.hash}`);
  }

  private async drawCharts(specs: ReturnType<NonNullable<CalculatorDefinition['charts']>>): Promise<void> {
    if (!this.charts) {
      const { ChartGroup } = await import('./chart-view.ts');
      this.charts = new ChartGroup(this);
    }
    this.charts.update(specs, this.system);
  }
}

if (!customElements.get('db-calculator')) customElements.define('db-calculator', CalculatorElement);
