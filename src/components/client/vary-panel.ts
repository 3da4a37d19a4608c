/**
 * Tolerances on any calculator: a "Tolerances" switch under the unit switch reveals a tolerance box
 * under every number field (±15 % or min..max in the field's unit); the results table then shows
 * each output's range (min – max) beside the nominal value and the inputs that set each end, and a
 * line states the method. Generic: everything comes from the definition and the envelope runner
 * (src/calculators/envelope/). Loaded after the calculator is live; no calculator logic here.
 */
import { envelope, type EnvelopeResult, type Variation } from '../../calculators/envelope/index.ts';
import { isActive } from '../../calculators/evaluate.ts';
import type { CalculatorDefinition, NumberInput } from '../../calculators/types.ts';
import { DampbookError, InputRangeError } from '../../core/errors.ts';
import { findUnit, fromSI, siUnit, type UnitSystem } from '../../core/units/index.ts';
import { describeRange } from '../render/fieldState.ts';
import { displayUnit, formatNumber } from '../render/format.ts';
import { convertTolerance, readTolerance, toleranceReason } from '../render/toleranceField.ts';

/** What this panel needs of the <db-calculator> element. */
export interface VaryHost extends HTMLElement {
  calc: CalculatorDefinition | undefined;
  system: UnitSystem;
  values: Readonly<Record<string, number | string | undefined>> | undefined;
}

/** Waits this long after the last change: an envelope costs 100–800 evaluations. */
const SETTLE_MS = 150;

const numberInputs = (calc: CalculatorDefinition) => calc.inputs.filter((d): d is NumberInput => d.kind !== 'choice' && d.kind !== 'text');

function make<K extends keyof HTMLElementTagNameMap>(tag: K, cls: string, text?: string): HTMLElementTagNameMap[K] {
  const e = document.createElement(tag);
  e.className = cls;
  if (text !== undefined) e.textContent = text;
  return e;
}

export function attachVary(host: VaryHost): void {
  const calc = host.calc!;
  const uid = host.id || `c-${calc.id}`;
  const toggle = make('label', 'vary-toggle no-print');
  const on = make('input', 'vary-on');
  on.type = 'checkbox';
  toggle.append(on, ' Tolerances: show the range of every result');
  host.querySelector('.units-switch')?.after(toggle);
  const boxes = new Map<string, { row: HTMLElement; box: HTMLInputElement; unit: HTMLElement; msg: HTMLElement }>();
  for (const def of numberInputs(calc)) {
    const field = host.querySelector<HTMLElement>(`.field[data-key="${CSS.escape(def.key)}"]`);
    if (!field) continue;
    const row = make('div', 'tol-row');
    row.hidden = true;
    const id = `${uid}-${def.key}-tol`;
    const label = make('label', 'tol-label', 'Tolerance');
    label.htmlFor = id;
    const box = make('input', 'tol');
    Object.assign(box, { type: 'text', id, name: `${def.key}.tol`, placeholder: '±15% or min..max', autocomplete: 'off' });
    const unit = make('span', 'tol-unit');
    const msg = make('p', 'tol-msg');
    msg.id = `${id}-msg`;
    msg.setAttribute('aria-live', 'polite');
    box.setAttribute('aria-describedby', msg.id);
    row.append(label, box, unit, msg);
    (field.querySelector('.field-row') ?? field.lastElementChild)?.after(row);
    boxes.set(def.key, { row, box, unit, msg });
  }
  const method = make('p', 'env-method');
  method.setAttribute('role', 'status');
  host.querySelector('.calc-results .out-table')?.after(method);

  let timer: ReturnType<typeof setTimeout> | undefined;
  const later = () => { clearTimeout(timer); host.removeAttribute('data-envelope'); timer = setTimeout(update, SETTLE_MS); };
  // a tolerance changes only the envelope: the nominal result stays, so the element need not recompute
  for (const { box } of boxes.values()) for (const t of ['input', 'change']) box.addEventListener(t, (e) => { e.stopPropagation(); later(); });
  on.addEventListener('change', (e) => {
    e.stopPropagation();
    for (const b of boxes.values()) b.row.hidden = !on.checked;
    host.toggleAttribute('data-vary', on.checked);
    update();
  });
  host.addEventListener('db-computed', later);

  function update(): void {
    host.removeAttribute('data-envelope');
    const values = host.values;
    if (!on.checked) { clear(''); return; }
    if (!values) { clear('Envelope not current: fix the highlighted field first.'); return; }
    const vary: Record<string, Variation> = {};
    let bad = false;
    for (const def of numberInputs(calc)) {
      const b = boxes.get(def.key);
      if (!b) continue;
      const unitId = host.querySelector<HTMLSelectElement>(`select[name="${CSS.escape(def.key)}.unit"]`)?.value ?? siUnit(def.kind).id;
      // the field's unit changed since this box was read: its range numbers convert the same way
      if (b.box.dataset.unit && b.box.dataset.unit !== unitId) b.box.value = convertTolerance(def, b.box.value, b.box.dataset.unit, unitId);
      b.box.dataset.unit = unitId;
      b.unit.textContent = findUnit(def.kind, unitId).symbol;
      b.msg.textContent = '';
      b.row.removeAttribute('data-invalid');
      const nominal = values[def.key];
      if (!isActive(def, values) || b.box.value.trim() === '') continue;
      if (typeof nominal !== 'number') { fail(def, 'Give the field a value first.'); continue; }
      const r = readTolerance(def, b.box.value, unitId, nominal);
      if (!r.ok) fail(def, r.message);
      else if (r.variation) vary[def.key] = r.variation;
    }
    if (bad) { clear('Envelope not computed: correct the tolerance marked.'); return; }
    if (Object.keys(vary).length === 0) { clear('Give any number input a tolerance (±% or min..max) to see the range of every result.'); return; }
    let e: EnvelopeResult;
    try {
      e = envelope(calc, values, vary);
    } catch (err) {
      const def = err instanceof InputRangeError ? numberInputs(calc).find((d) => d.key === err.input) : undefined;
      if (def && err instanceof InputRangeError) { fail(def, toleranceReason(err.message)); clear('Envelope not computed: correct the tolerance marked.'); return; }
      clear(`Envelope not computed: ${err instanceof DampbookError ? err.message : 'these tolerances could not be computed.'}`);
      return;
    }
    render(e);
    host.setAttribute('data-envelope', '');
    host.dispatchEvent(new CustomEvent('db-envelope', { bubbles: true, detail: e }));

    function fail(def: NumberInput, text: string): void {
      const b = boxes.get(def.key)!;
      bad = true;
      const unitId = b.box.dataset.unit ?? siUnit(def.kind).id;
      b.msg.textContent = /valid range/.test(text) ? `${text} Allowed: ${describeRange(def, unitId)}.` : text;
      b.row.setAttribute('data-invalid', '');
    }
  }

  function clear(text: string): void {
    method.textContent = text;
    for (const c of host.querySelectorAll('.out-table td.env, .out-table td.drv, .out-table thead')) c.remove();
  }

  function render(e: EnvelopeResult): void {
    clear('');
    const label = (key: string) => calc.inputs.find((d) => d.key === key)?.label ?? key;
    const ends = (d: Readonly<Record<string, string>>) => Object.entries(d).map(([k, v]) => `${label(k)} ${v}`).join(', ') || 'none (constant)';
    const table = host.querySelector('.calc-results .out-table');
    const head = make('thead', 'env-head');
    const tr = document.createElement('tr');
    for (const t of ['Result', 'Nominal', 'Unit', 'Range (min – max)', 'Set by']) { const th = make('th', '', t); th.scope = 'col'; tr.append(th); }
    head.append(tr);
    table?.prepend(head);
    for (const o of calc.outputs) {
      const row = host.querySelector<HTMLElement>(`tr[data-out="${CSS.escape(o.key)}"]`);
      if (!row) continue;
      const b = e.bounds[o.key];
      const env = make('td', 'env');
      const drv = make('td', 'drv');
      if (b && o.kind !== 'text') {
        const u = displayUnit(o.kind, host.system);
        env.textContent = `${formatNumber(fromSI(b.min, u), o.digits ?? 4)} – ${formatNumber(fromSI(b.max, u), o.digits ?? 4)}`;
        env.dataset.min = String(b.min);
        env.dataset.max = String(b.max);
        // one line per end: "min: Moving mass high, Damping coefficient low"
        drv.append(make('span', 'drv-end', `min: ${ends(b.minDrivers)}`), document.createElement('br'), make('span', 'drv-end', `max: ${ends(b.maxDrivers)}`));
      } else env.textContent = '—';
      row.append(env, drv);
    }
    const failed = e.failed ? ` ${e.failed} point(s) could not be computed and are left out (first: ${e.failures[0]?.message ?? ''}).` : '';
    method.textContent = `Range over ${e.varied.map((v) => label(v.key)).join(', ')}: ${e.method}.${failed}`;
  }
}
