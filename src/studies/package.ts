/**
 * The calculation package of a study as plain rows for the built page: cover (project, steps with
 * page revision and status, verdicts) and one sheet per step (inputs used with their origin,
 * results, warnings). Pure formatting of a StudyRun; numbers shown in SI-family units (°C for
 * temperatures, with kelvin alongside).
 */
import type { CalculatorLookup } from './lookup.ts';
import type { InputDef, OutputDef } from '../calculators/types.ts';
import { siSymbol } from '../core/units/index.ts';
import type { Origin, StudyRun } from './run.ts';
import type { Verdict } from './verdicts.ts';

export interface Row { readonly key: string; readonly label: string; readonly value: string; readonly origin?: string }

const sig = (v: number, d = 4) => String(Number(v.toPrecision(d)));

/** A value of a kind for print: temperatures in °C with K, differences in K, else SI. */
export function showValue(kind: InputDef['kind'] | OutputDef['kind'], v: number | string | undefined | null, digits = 4): string {
  if (v === undefined || v === null) return '—';
  if (typeof v === 'string') return v;
  if (kind === 'temperature') return `${(v - 273.15).toFixed(1)} °C (${sig(v, 5)} K)`;
  if (kind === 'choice' || kind === 'text') return String(v);
  const unit = siSymbol(kind);
  return `${sig(v, digits)}${unit ? ` ${unit}` : ''}`;
}

function originText(o: Origin, stepNo: ReadonlyMap<string, number>): string {
  switch (o.kind) {
    case 'typed': return 'typed';
    case 'step': return `from step ${stepNo.get(o.step)} (${o.step}.${o.output})`;
    case 'study': return `study: ${o.quantity}`;
    case 'limit': return `limit: ${o.quantity}`;
    case 'default': return 'default';
  }
}

export interface StepSheet {
  readonly no: number;
  readonly id: string;
  readonly title: string;
  readonly calculator: string;
  readonly page: string;
  readonly inputs: readonly Row[];
  readonly outputs: readonly Row[];
  readonly warnings: readonly string[];
  readonly verdicts: readonly string[];
}

const CHECK_KIND: Record<Verdict['check'], InputDef['kind']> = {
  'steady-temperature': 'temperature', surroundings: 'temperature', 'time-to-limit': 'time', fade: 'fraction', 'power-rating': 'power',
  'tyre-load': 'fraction', travel: 'length', 'stroke-energy': 'energy', 'hourly-energy': 'energy',
};

/** One line per verdict: PASS/FAIL, what, value against limit, margin, inputs it rests on. */
export function verdictLine(v: Verdict): string {
  const k = CHECK_KIND[v.check];
  const value = v.value === null ? (v.check === 'time-to-limit' ? 'never reached' : '—') : showValue(k, v.value);
  const margin = v.margin === null ? '' : `; margin ${showValue(k === 'temperature' ? 'temperatureDifference' : k, v.margin, 3)}`;
  return `${v.pass ? 'PASS' : 'FAIL'} — ${v.what}: ${value} against ${showValue(k, v.limit)}${margin}. Rests on: ${v.restsOn.join(', ')}.`;
}

export function stepSheets(run: StudyRun, calcs: CalculatorLookup): StepSheet[] {
  const stepNo = new Map(run.steps.map((s, i) => [s.id, i + 1]));
  return run.steps.map((s, i) => {
    const calc = calcs(s.calculator)!;
    const inputs = calc.inputs.filter((d) => s.inputs[d.key] !== undefined).map((d) => ({
      key: d.key, label: d.label, value: d.kind === 'text' ? `${String(s.inputs[d.key]).split('\n').length} lines of text` : showValue(d.kind, s.inputs[d.key]), origin: originText(s.origins[d.key]!, stepNo),
    }));
    const outputs = calc.outputs.filter((o) => s.outputs[o.key] !== undefined).map((o) => ({ key: o.key, label: o.label, value: showValue(o.kind, s.outputs[o.key], o.digits ?? 4) }));
    return {
      no: i + 1, id: s.id, title: s.title, calculator: s.calculator, page: s.page, inputs, outputs, warnings: s.warnings,
      verdicts: run.verdicts.filter((v) => v.step === s.id).map(verdictLine),
    };
  });
}

/** The package's page rules: calculation number and title in every page header, "page x of y" over the whole package. */
export function packageCss(o: { paper: 'a4' | 'letter'; calcNo: string; title: string; build: string; cssString: (s: string) => string }): string {
  const box = 'font: 8pt system-ui, sans-serif; color: #444;';
  return `@media print { @page { size: ${o.paper === 'letter' ? 'letter' : 'A4'};` +
    ` @top-left { content: ${o.cssString(`${o.calcNo} · ${o.title}`)}; ${box} }` +
    ` @bottom-left { content: ${o.cssString(o.build)}; ${box} }` +
    ` @bottom-right { content: "page " counter(page) " of " counter(pages); ${box} }` +
    ' } }';
}
