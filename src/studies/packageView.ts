/**
 * The calculation package of a study as one element tree: the cover sheet (project, damper, steps
 * with page revision and status, every verdict, sign-off) and one compact sheet per step (inputs
 * actually used with their origin, key formulas, results, warnings, verification summary, method
 * reference). Pure. The built package pages serialise it to HTML (`toHtml`), the page that prints
 * the study open in a browser builds it into the DOM (components/client/study-package.ts), so
 * the two can never differ.
 */
import type { StudyRun } from './run.ts';
import type { CalculatorLookup } from './lookup.ts';
import { stepSheets, verdictLine } from './package.ts';

/** An element: tag, attributes, children; `html` is trusted markup made at build time (KaTeX). */
export type VNode = string | { readonly t: string; readonly a?: Readonly<Record<string, string>>; readonly k?: readonly VNode[]; readonly html?: string };

/** What the package needs to know of each handbook page, taken from the pages when the handbook is built. */
export interface PageInfo {
  readonly url: string;
  readonly title: string;
  readonly revision: string;
  /** The status as the page shows it: draft, checked, approved, or "changed since approval/check". */
  readonly status: string;
  /** One line: how many verification checks of the page pass. */
  readonly verification: string;
}

export interface Catalogue {
  readonly pages: Readonly<Record<string, PageInfo>>;
  /** Key formulas per calculator id, rendered by KaTeX at build time. */
  readonly formulas: Readonly<Record<string, readonly string[]>>;
}

export interface PackageText {
  readonly organisation: string;
  /** The built-in study's id (data-study on the package), when it has one. */
  readonly id?: string;
  /** Screen-only lines under the cover title (how to print, other paper, open in the pages). */
  readonly screen: readonly VNode[];
}

const e = (t: string, a: Record<string, string> | undefined, ...k: VNode[]): VNode => ({ t, ...(a ? { a } : {}), k });
const row = (...cells: VNode[]) => e('tr', undefined, ...cells.map((c) => e('td', undefined, c)));
const headRow = (...cells: string[]) => e('thead', undefined, e('tr', undefined, ...cells.map((c) => e('th', { scope: 'col' }, c))));

/** The badge class of a catalogue status: a page changed since its sign-off is marked like a draft. */
export const statusClass = (status: string): string => (status.startsWith('changed since ') ? 'changed' : status);

export function packageView(run: StudyRun, cat: Catalogue, text: PackageText, calcs: CalculatorLookup): VNode {
  const { study } = run;
  const sheets = stepSheets(run, calcs);
  const page = (id: string): PageInfo => cat.pages[id] ?? { url: '', title: id, revision: '—', status: 'draft', verification: 'Not a page of this handbook.' };
  const failed = run.verdicts.filter((v) => !v.pass).length;
  const no = (step: string) => sheets.find((s) => s.id === step)?.no ?? 0;
  const cover = e('section', { class: 'study-cover', 'aria-labelledby': 'cover-title' },
    e('p', { class: 'study-head' }, e('span', undefined, text.organisation), ' ', e('span', undefined, 'Calculation package'), ' ', e('span', undefined, study.project.calculationNo)),
    e('h1', { id: 'cover-title' }, study.title),
    ...text.screen,
    e('table', { class: 'study-grid' }, e('tbody', undefined,
      ...([['Project', `${study.project.number} ${study.project.name}`], ['Damper', study.project.damper], ['Calculation no.', study.project.calculationNo], ['Date', study.project.date ?? '']] as const)
        .map(([h, v]) => e('tr', undefined, e('th', { scope: 'row' }, h), e('td', undefined, v))))),
    e('h2', undefined, 'Steps'),
    e('table', { class: 'study-steps' }, headRow('Step', 'Calculation', 'Handbook page', 'Revision', 'Status'),
      e('tbody', undefined, ...sheets.map((s) => {
        const p = page(s.page);
        return row(`${s.no} (${s.id})`, s.title, p.url ? e('a', { href: p.url }, s.page) : s.page, p.revision, e('span', { class: `status status-${statusClass(p.status)}` }, p.status));
      }))),
    e('h2', undefined, 'Verdicts'),
    e('p', { class: 'study-summary', 'data-verdicts': failed === 0 ? 'pass' : 'fail' }, failed === 0 ? `All ${run.verdicts.length} verdicts pass.` : `${failed} of ${run.verdicts.length} verdicts fail.`),
    e('ul', { class: 'study-verdicts' }, ...run.verdicts.map((v) => e('li', { 'data-pass': String(v.pass) }, `Step ${no(v.step)} (${v.step}): ${verdictLine(v)}`))),
    e('table', { class: 'study-signoff' }, headRow('Role', 'Name', 'Signature', 'Date'),
      e('tbody', undefined, row('Prepared', study.project.preparedBy ?? '', '', ''), row('Checked', study.project.checkedBy ?? '', '', ''), row('Approved', '', '', ''))),
    e('p', { class: 'study-caution' }, 'Results hold only for the inputs and limits listed. Dampers run hot and may hold gas under pressure; a damper is part of the vehicle\'s or machine\'s safety. Follow local codes and have the design checked by a licensed engineer.'),
  );
  const steps = sheets.map((s) => {
    const p = page(s.page);
    const formulas = cat.formulas[s.calculator] ?? [];
    return e('section', { class: 'study-sheet', 'aria-labelledby': `step-${s.id}`, 'data-step': s.id },
      e('p', { class: 'study-head' }, e('span', undefined, study.project.calculationNo), ' ', e('span', undefined, `step ${s.no} of ${sheets.length}`), ' ', e('span', undefined, study.project.number)),
      e('h2', { id: `step-${s.id}` }, `Step ${s.no}: ${s.title}`),
      e('p', { class: 'study-method' }, 'Method: handbook page ', e('b', undefined, s.page), ` (${p.title}), revision `, e('b', undefined, p.revision), `, ${p.status}; calculator ${s.calculator}.`),
      e('h3', undefined, 'Inputs used'),
      e('table', { class: 'study-table' }, headRow('Input', 'Value', 'Origin'),
        e('tbody', undefined, ...s.inputs.map((r) => e('tr', { 'data-in': r.key }, e('td', undefined, r.label), e('td', undefined, r.value), e('td', undefined, r.origin ?? ''))))),
      ...(formulas.length ? [e('h3', undefined, 'Key formulas'), e('div', { class: 'study-formulas' }, ...formulas.map((html) => ({ t: 'div', html })))] : []),
      e('h3', undefined, 'Results'),
      e('table', { class: 'study-table' }, headRow('Result', 'Value'),
        e('tbody', undefined, ...s.outputs.map((r) => e('tr', { 'data-out': r.key }, e('td', undefined, r.label), e('td', undefined, r.value))))),
      ...(s.verdicts.length ? [e('h3', undefined, 'Verdicts'), e('ul', { class: 'study-verdicts' }, ...s.verdicts.map((v) => e('li', undefined, v)))] : []),
      ...(s.warnings.length ? [e('h3', undefined, 'Warnings'), e('ul', { class: 'study-warnings' }, ...s.warnings.map((w) => e('li', undefined, w)))] : []),
      e('p', { class: 'study-verification' }, `Verification: ${p.verification}`),
    );
  });
  return e('article', { class: 'study-package', ...(text.id ? { 'data-study': text.id } : {}), 'data-calc-no': study.project.calculationNo }, cover, ...steps);
}

const ESC: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };
const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ESC[c]!);

/** HTML of a tree: every text and attribute escaped; only `html` (build-time KaTeX) goes in as markup. */
export function toHtml(v: VNode): string {
  if (typeof v === 'string') return esc(v);
  const attrs = Object.entries(v.a ?? {}).map(([k, x]) => ` ${k}="${esc(x)}"`).join('');
  return `<${v.t}${attrs}>${v.html ?? (v.k ?? []).map(toHtml).join('')}</${v.t}>`;
}
