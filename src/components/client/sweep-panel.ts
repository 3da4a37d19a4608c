/**
 * A sweep chart on any calculator: choose one number input, a range (in the field's unit) and one
 * result, and the chart shows the result against the input with the nominal point marked, drawn
 * by the shared chart element. Generic: the sweep and its chart data come from
 * src/calculators/envelope/sweep.ts; the other inputs stay at the page's current values.
 */
import { sweep, sweepChart, SWEEP_POINTS } from '../../calculators/envelope/index.ts';
import { isActive } from '../../calculators/evaluate.ts';
import type { NumberInput } from '../../calculators/types.ts';
import { DampbookError } from '../../core/errors.ts';
import { findUnit, fromSI, siUnit } from '../../core/units/index.ts';
import { formatInput } from '../render/format.ts';
import { convertTolerance, endSI } from '../render/toleranceField.ts';
import type { VaryHost } from './vary-panel.ts';

type Group = { update(specs: ReturnType<typeof sweepChart>[], system: VaryHost['system']): void };

function make<K extends keyof HTMLElementTagNameMap>(tag: K, cls: string, text?: string): HTMLElementTagNameMap[K] {
  const e = document.createElement(tag);
  e.className = cls;
  if (text !== undefined) e.textContent = text;
  return e;
}

function labelled(text: string, control: HTMLElement): HTMLLabelElement {
  const l = make('label', 'sweep-field');
  l.append(`${text} `, control);
  return l;
}

export function attachSweep(host: VaryHost): void {
  const calc = host.calc!;
  const numbers = calc.inputs.filter((d): d is NumberInput => d.kind !== 'choice' && d.kind !== 'text');
  const results = calc.outputs.filter((o) => o.kind !== 'text');
  if (!numbers.length || !results.length) return;
  const box = make('details', 'calc-sweep');
  box.dataset.pagefindIgnore = 'all';
  box.append(make('summary', '', 'Sweep chart: one result against one input'));
  const controls = make('div', 'sweep-controls no-print');
  const input = make('select', 'sweep-in');
  const lo = make('input', 'sweep-lo');
  const hi = make('input', 'sweep-hi');
  const unit = make('span', 'sweep-unit');
  const output = make('select', 'sweep-out');
  const draw = make('button', 'sweep-draw', 'Draw');
  draw.type = 'button';
  for (const t of [lo, hi]) { t.type = 'text'; t.autocomplete = 'off'; t.inputMode = 'decimal'; }
  for (const o of results) output.append(new Option(o.label, o.key));
  controls.append(labelled('Input', input), labelled('from', lo), labelled('to', hi), unit, labelled('Result', output), draw);
  const msg = make('p', 'sweep-msg');
  msg.setAttribute('role', 'status');
  // the figure is made on the first Draw: a sheet printed before waits for every chart canvas to be drawn
  const fig = make('figure', 'chart');
  fig.dataset.chart = 'sweep';
  box.append(controls, msg);
  host.querySelector('details.calc-records')?.before(box);
  // these controls change only the sweep: the element need not recompute
  for (const t of ['input', 'change']) controls.addEventListener(t, (e) => e.stopPropagation());

  let group: Group | undefined;
  let drawn = false;
  const unitOf = (def: NumberInput) => host.querySelector<HTMLSelectElement>(`select[name="${CSS.escape(def.key)}.unit"]`)?.value ?? siUnit(def.kind).id;
  const chosen = () => numbers.find((d) => d.key === input.value);

  /** The inputs that apply now; a new input fills the range with ±50 % of its value (inside its valid range). */
  function fillInputs(): void {
    const values = host.values ?? {};
    const keep = input.value;
    input.replaceChildren(...numbers.filter((d) => isActive(d, values) && typeof values[d.key] === 'number').map((d) => new Option(d.label, d.key)));
    if ([...input.options].some((o) => o.value === keep)) input.value = keep;
  }
  function fillRange(): void {
    const def = chosen();
    const x = def ? host.values?.[def.key] : undefined;
    if (!def || typeof x !== 'number') return;
    const u = findUnit(def.kind, unitOf(def));
    const a = x === 0 ? -1 : x - 0.5 * Math.abs(x);
    const b = x === 0 ? 1 : x + 0.5 * Math.abs(x);
    const clampLo = def.minExclusive ? def.min + (x - def.min) * 1e-3 : def.min;
    const clampHi = def.maxExclusive ? def.max - (def.max - x) * 1e-3 : def.max;
    lo.value = formatInput(fromSI(Math.max(a, clampLo), u));
    hi.value = formatInput(fromSI(Math.min(b, clampHi), u));
    lo.dataset.unit = hi.dataset.unit = u.id;
    unit.textContent = u.symbol;
  }
  input.addEventListener('change', () => { fillRange(); drawn = false; });
  box.addEventListener('toggle', () => { if (box.open && !input.options.length) { fillInputs(); fillRange(); } });
  draw.addEventListener('click', () => { drawn = true; void render(); });
  host.addEventListener('db-computed', () => { fillInputs(); if (drawn && box.open) void render(); });

  async function render(): Promise<void> {
    const def = chosen();
    const values = host.values;
    if (!def || !values) { msg.textContent = values ? 'Choose an input.' : 'Not current: fix the highlighted field first.'; return; }
    const id = unitOf(def);
    // the field's unit changed since the range was typed: its numbers convert the same way
    for (const t of [lo, hi]) if (t.dataset.unit && t.dataset.unit !== id) t.value = convertTolerance(def, `${t.value}..0`, t.dataset.unit, id).split('..')[0]!;
    lo.dataset.unit = hi.dataset.unit = id;
    unit.textContent = findUnit(def.kind, id).symbol;
    let spec;
    try {
      const a = endSI(def, lo.value, id);
      const b = endSI(def, hi.value, id);
      if (!Number.isFinite(a) || !Number.isFinite(b)) throw new DampbookError('Type numbers for both ends of the range.');
      spec = sweepChart(calc, sweep(calc, values, def.key, Math.min(a, b), Math.max(a, b), output.value));
    } catch (e) {
      msg.textContent = e instanceof DampbookError ? e.message : 'This sweep could not be drawn.';
      host.removeAttribute('data-sweep');
      return;
    }
    msg.textContent = `${SWEEP_POINTS} points and the nominal value; the other inputs as entered above.`;
    if (!fig.isConnected) { fig.append(make('figcaption', ''), make('div', 'chart-canvas'), make('p', 'chart-summary')); box.append(fig); }
    fig.querySelector('figcaption')!.textContent = spec.title;
    if (!group) {
      const { ChartGroup } = await import('./chart-view.ts');
      group = new ChartGroup(box);
    }
    group.update([spec], host.system);
    host.setAttribute('data-sweep', '');
  }
}
