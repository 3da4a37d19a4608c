/**
 * The study bar above a calculation page: with a study open, its steps (this page marked, a step
 * that cannot compute named), its verdicts and what can be done (add this page as a step, print
 * the package, save the study file, close it); without one, a way to start a study from this page
 * or open a study file. Text only through textContent; every value here may come from a file.
 */
import type { StudyRun } from '../../studies/run.ts';
import type { Study } from '../../studies/schema.ts';
import type { Verdict } from '../../studies/verdicts.ts';
import { MAX_STUDY_CHARS } from '../../studies/schema.ts';

export interface BarState {
  readonly study: Study | undefined;
  readonly run: StudyRun | undefined;
  readonly error: { readonly step?: string | undefined; readonly message: string } | undefined;
  readonly pageId: string;
  readonly pageUrls: Readonly<Record<string, string>>;
  readonly stepsHere: readonly string[];
  readonly calculatorsHere: readonly { readonly id: string; readonly title: string }[];
  readonly verdictLine: (v: Verdict) => string;
  readonly actions: {
    start(calcId: string): void;
    add(calcId: string): void;
    close(): void;
    load(text: string): void;
  };
}

function el<K extends keyof HTMLElementTagNameMap>(tag: K, props: Partial<HTMLElementTagNameMap[K]> = {}, ...kids: (Node | string)[]): HTMLElementTagNameMap[K] {
  const e = Object.assign(document.createElement(tag), props);
  e.append(...kids);
  return e;
}

function button(text: string, onClick: () => void): HTMLButtonElement {
  const b = el('button', { type: 'button', textContent: text });
  b.addEventListener('click', onClick);
  return b;
}

function fileOpener(s: BarState): HTMLElement {
  const input = el('input', { type: 'file', accept: '.json,application/json' });
  input.addEventListener('change', async () => {
    const f = input.files?.[0];
    if (!f) return;
    if (f.size > MAX_STUDY_CHARS * 4) { s.actions.load(''); return; }
    s.actions.load(await f.text());
  });
  return el('label', { className: 'study-open' }, 'Open a study file ', input);
}

function saveLink(study: Study): HTMLAnchorElement {
  const a = el('a', { className: 'study-save', textContent: 'Save the study file', download: `${study.project.calculationNo.replace(/[^A-Za-z0-9._-]+/g, '_')}.study.json` });
  a.href = URL.createObjectURL(new Blob([JSON.stringify(study, null, 2)], { type: 'application/json' }));
  return a;
}

export function renderStudyBar(bar: HTMLElement, s: BarState): void {
  const base = bar.dataset.base ?? '/';
  const parts: Node[] = [];
  if (!s.study) {
    if (s.calculatorsHere.length === 0) { bar.hidden = true; return; }
    const first = s.calculatorsHere[0]!;
    parts.push(el('p', {},
      el('b', { textContent: 'Study: ' }), 'none open. A study carries one damper through several pages with each number typed once. ',
      button(`Start a study from ${s.calculatorsHere.length > 1 ? `“${first.title}”` : 'this page'}`, () => s.actions.start(first.id)), ' ',
      fileOpener(s), ' ',
      el('a', { href: `${base}studies/`, textContent: 'Demo studies' })));
  } else {
    const st = s.study;
    parts.push(el('p', { className: 'study-title' }, el('b', { textContent: 'Study: ' }), st.title, ' ', el('span', { className: 'study-no', textContent: `(${st.project.calculationNo})` })));
    const ran = new Map((s.run?.steps ?? []).map((r) => [r.id, r]));
    const list = el('ol', { className: 'study-steplist' });
    for (const step of st.steps) {
      // own keys only: a step page named like an Object member ("constructor") has no address
      const url = Object.hasOwn(s.pageUrls, step.page) && typeof s.pageUrls[step.page] === 'string' ? s.pageUrls[step.page] : undefined;
      const name = step.title ?? ran.get(step.id)?.title ?? step.calculator;
      const li = el('li');
      li.dataset.step = step.id;
      const here = s.stepsHere.includes(step.id);
      li.append(url && !here ? el('a', { href: url, textContent: name }) : el('span', { textContent: name }));
      if (here) li.setAttribute('aria-current', 'step');
      const state = ran.has(step.id) ? 'computed' : s.error?.step === step.id ? 'cannot compute' : 'not computed';
      li.dataset.state = state;
      li.append(' ', el('span', { className: 'study-state', textContent: here ? `${state} · this page` : state }));
      list.append(li);
    }
    parts.push(list);
    const verdicts = s.run?.verdicts ?? [];
    if (verdicts.length) {
      const failed = verdicts.filter((v) => !v.pass).length;
      // the count is always in view; the lines (long, with margins and what they rest on) open on demand
      const summary = el('summary', { className: 'study-summary', textContent: failed ? `${failed} of ${verdicts.length} verdicts fail.` : `All ${verdicts.length} verdicts pass.` });
      summary.dataset.verdicts = failed ? 'fail' : 'pass';
      parts.push(el('details', { className: 'study-verdict-list', open: verdicts.length <= 3 }, summary, el('ul', { className: 'study-verdicts' }, ...verdicts.map((v) => {
        const li = el('li', { textContent: `${st.steps.findIndex((x) => x.id === v.step) + 1}. ${s.verdictLine(v)}` });
        li.dataset.pass = String(v.pass);
        return li;
      }))));
    }
    const actions = el('p', { className: 'study-actions' });
    for (const c of s.calculatorsHere) {
      if (!st.steps.some((x) => x.page === s.pageId && x.calculator === c.id)) actions.append(button(`Add “${c.title}” as step ${st.steps.length + 1}`, () => s.actions.add(c.id)), ' ');
    }
    actions.append(el('a', { href: `${base}studies/open/`, textContent: 'Print the calculation package' }), ' ', saveLink(st), ' ', fileOpener(s), ' ', button('Close the study', () => s.actions.close()));
    parts.push(actions);
  }
  if (s.error) parts.push(el('p', { className: 'study-error', role: 'alert', textContent: s.error.step ? `Step ${s.error.step}: ${s.error.message}` : s.error.message } as Partial<HTMLParagraphElement>));
  bar.replaceChildren(...parts);
  bar.hidden = false;
}
