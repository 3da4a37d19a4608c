/**
 * A calculator page inside the open study. Loaded only when a study is open (or being started):
 * the page's calculators that are steps of the study take their inputs from the study run, each
 * bound field says where its value comes from, and a change on the page is written back
 * (src/studies/edit.ts decides where). The whole study is re-run on open and after every change,
 * so no later step is ever shown stale; the study bar above the page lists the steps and verdicts.
 * No calculator logic here: the study runner and the calculator definitions do the work.
 */
import type { Values } from '../../calculators/types.ts';
import { applyPageValues, addStep, clearOverride, startStudy, studyKnows } from '../../studies/edit.ts';
import { runStudyUntilError, type Origin, type StudyRun } from '../../studies/run.ts';
import { parseStudy, type Study } from '../../studies/schema.ts';
import { verdictLine } from '../../studies/package.ts';
import type { CalculatorElement } from './calculator-element.ts';
import { closeOpenStudy, readOpenStudy, saveOpenStudy } from './study-store.ts';
import { renderStudyBar } from './study-bar.ts';
import { fetchNamedStudy } from './study-fetch.ts';
import { pageData } from './chunk-hints.ts';
import { LoadedCalculators } from './study-calculators.ts';

// `npm run bench` reads these marks: when the study code ran, read the study, loaded its calculators
performance.mark('db-study-code');

interface Attached { readonly el: CalculatorElement; readonly stepId: string | undefined }

/** camelCase study quantity name → words ("airTemperature" → "air temperature"). */
export const words = (name: string) => name.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();

class StudySession {
  study: Study | undefined;
  run: StudyRun | undefined;
  error: { step?: string | undefined; message: string } | undefined;
  private attached: Attached[] = [];
  /** Only the definitions this study and page use (the registry would load every calculator). */
  private calcs = new LoadedCalculators();
  private pageId = document.querySelector<HTMLElement>('article[data-page-id]')?.dataset.pageId ?? '';
  private bar = document.querySelector<HTMLElement>('[data-study-bar]');

  /** Reads the open study (or the one the address names) and runs it. */
  async open(): Promise<void> {
    const params = new URLSearchParams(location.search);
    const named = params.get('study');
    if (named !== null) {
      params.delete('study');
      history.replaceState(history.state, '', `${location.pathname}${params.size ? `?${params}` : ''}${location.hash}`);
      // the study just fetched and checked is the one now kept: no second parse of the stored copy
      const fetched = await this.fetchBuiltIn(named);
      if (fetched) { this.study = fetched; if (await this.loadCalculators(fetched)) this.rerun(); return; }
    }
    const stored = readOpenStudy();
    if (stored && !stored.ok) this.error = { message: `The study kept in this browser is not valid and was not opened (${stored.message}).` };
    this.study = stored?.ok ? stored.study : undefined;
    if (await this.loadCalculators(this.study)) this.rerun();
  }

  private async fetchBuiltIn(id: string): Promise<Study | undefined> {
    const got = await fetchNamedStudy();
    if (!got?.text) { this.error = { message: /^[a-z0-9-]{1,80}$/.test(id) ? `The study '${id}' named in the address is not part of this handbook.` : 'The address names no study of this handbook.' }; return undefined; }
    const parsed = parseStudy(got.text);
    if (parsed.ok) { saveOpenStudy(parsed.study); return parsed.study; }
    this.error = { message: `The study named in the address could not be opened: ${parsed.message}` };
    return undefined;
  }

  /** Loads the study's calculators; false (and a message) when the browser could not fetch them. */
  private async loadCalculators(study: Study | undefined): Promise<boolean> {
    performance.mark('db-study-read');
    try {
      await this.calcs.forStudy(study);
      performance.mark('db-study-calculators');
      return true;
    } catch {
      this.error = { message: 'The calculators of this study could not be loaded; reload the page.' };
      return false;
    }
  }

  private rerun(): void {
    this.run = undefined;
    if (!this.study) return;
    const t0 = performance.now();
    try {
      const r = runStudyUntilError(this.study, this.calcs.lookup);
      // `npm run bench` reads these marks (open and recompute time in a real browser)
      performance.measure('db-study-run', { start: t0 });
      this.run = r.run;
      this.error = r.error ? { step: r.failedStep, message: r.error.message } : undefined;
    } catch (e) {
      this.error = { message: e instanceof Error ? e.message : 'The study could not be run.' };
    }
  }

  /** Joins a calculator element: fills its step's inputs from the study (true: filled and recomputed) and follows its changes. */
  attach(el: CalculatorElement): boolean {
    if (el.calc) this.calcs.add(el.calc);
    const step = this.study?.steps.find((s) => s.page === this.pageId && s.calculator === el.calc?.id);
    const a = { el, stepId: step?.id };
    this.attached.push(a);
    if (step) this.fill(a);
    performance.mark('db-study-attached');
    el.addEventListener('db-computed', (e) => this.onComputed(a, (e as CustomEvent<{ values: Values }>).detail.values));
    this.renderBar();
    return step !== undefined && this.stepRun(a) !== undefined;
  }

  private stepRun(a: Attached) {
    return this.run?.steps.find((s) => s.id === a.stepId);
  }

  private fill(a: Attached): void {
    const s = this.stepRun(a);
    if (s) a.el.applyInputs(s.inputs, {}, { outputs: s.outputs, warnings: s.warnings, ...(s.handoff ? { handoff: s.handoff } : {}) });
    this.markOrigins(a);
  }


  private onComputed(a: Attached, values: Values): void {
    if (!this.study || !this.run || !a.stepId || !this.stepRun(a)) return;
    const edit = applyPageValues(this.study, this.run, a.stepId, values, this.calcs.lookup);
    if (edit.refused.length) this.say(`Not kept in the study: ${edit.refused.join(', ')} (longer than a study value may be; save the data as a file and paste it on this page).`);
    if (edit.study === this.study) return;
    this.study = edit.study;
    if (!saveOpenStudy(this.study)) this.say('This browser refused to keep the study (storage full or disabled); export it before leaving the page.');
    this.rerun();
    this.markOrigins(a);
    this.renderBar();
  }

  private say(text: string): void {
    this.error = { message: text };
    this.renderBar();
  }

  /** Writes beside each bound field where its value comes from (data-origin for the mark). */
  private markOrigins(a: Attached): void {
    const s = this.stepRun(a);
    const calc = a.el.calc!;
    const bindings = calc.study?.inputs ?? {};
    for (const def of calc.inputs) {
      const f = a.el.querySelector<HTMLElement>(`.field[data-key="${CSS.escape(def.key)}"]`);
      if (!f) continue;
      f.querySelector('.study-note')?.remove();
      const origin: Origin | undefined = s?.origins[def.key];
      if (!s || !origin) { delete f.dataset.origin; continue; }
      const q = bindings[def.key];
      const overriding = origin.kind === 'typed' && q !== undefined && this.study !== undefined && studyKnows(this.study, q, this.calcs.lookup);
      const kind = overriding ? 'override' : origin.kind;
      if (kind === 'default' && q === undefined) { delete f.dataset.origin; continue; }
      f.dataset.origin = kind;
      const p = document.createElement('p');
      p.className = 'study-note';
      p.append(this.originText(origin, q, overriding));
      if (overriding) {
        const back = document.createElement('button');
        back.type = 'button';
        back.className = 'linkish';
        back.textContent = 'Follow the study again';
        back.addEventListener('click', () => this.follow(a, def.key));
        p.append(' ', back);
      }
      const anchor = f.querySelector('.help');
      if (anchor) anchor.before(p); else f.append(p);
    }
  }

  private originText(o: Origin, q: string | undefined, overriding: boolean): string {
    const no = (id: string) => (this.run?.steps.findIndex((r) => r.id === id) ?? -1) + 1;
    const title = (id: string) => this.run?.steps.find((r) => r.id === id)?.title ?? id;
    switch (o.kind) {
      case 'step': return `Study: from step ${no(o.step)} (${title(o.step)}), result ${o.output}${o.explicit ? ' (bound in the study file)' : ''}. A change here holds for this step only.`;
      case 'study': return `Study: ${words(o.quantity)}, shared by every step.`;
      case 'limit': return `Study limit: ${words(o.quantity)}, shared by every step.`;
      case 'typed': return overriding ? `Study: typed on this step, in place of the study's ${words(q!)}.` : 'Study: typed on this step.';
      case 'default': return `Page default; a change here adds “${words(q!)}” to the study.`;
    }
  }

  private follow(a: Attached, key: string): void {
    if (!this.study || !a.stepId) return;
    this.study = clearOverride(this.study, a.stepId, key);
    saveOpenStudy(this.study);
    this.rerun();
    this.fill(a);
    this.renderBar();
  }

  renderBar(): void {
    if (!this.bar) return;
    const here = this.attached.map((a) => a.el.calc!).filter(Boolean);
    renderStudyBar(this.bar, {
      study: this.study, run: this.run, error: this.error, pageId: this.pageId, pageUrls: pageUrls(),
      stepsHere: this.attached.flatMap((a) => (a.stepId ? [a.stepId] : [])),
      calculatorsHere: here.map((c) => ({ id: c.id, title: c.title })),
      verdictLine,
      actions: {
        start: (calcId) => this.start(calcId),
        add: (calcId) => this.add(calcId),
        close: () => { closeOpenStudy(); location.reload(); },
        load: (text) => void this.load(text),
      },
    });
  }

  private start(calcId: string): void {
    const a = this.attached.find((x) => x.el.calc?.id === calcId);
    if (!a?.el.values) { this.say('Fix the highlighted fields first: a study starts from the values the page computes with.'); return; }
    const core = document.querySelector<HTMLElement>('article[data-core-version]')?.dataset.coreVersion;
    this.study = startStudy(this.pageId, calcId, a.el.values, new Date().toISOString().slice(0, 10), this.calcs.lookup, core);
    this.commit();
  }

  private add(calcId: string): void {
    if (!this.study) return;
    const a = this.attached.find((x) => x.el.calc?.id === calcId);
    if (!a?.el.values) { this.say('Fix the highlighted fields first: the step starts from the values the page computes with.'); return; }
    const r = addStep(this.study, this.pageId, calcId, a.el.values, this.calcs.lookup);
    this.study = r.study;
    if (a) (a as { stepId: string | undefined }).stepId = r.id;
    this.commit();
  }

  private async load(text: string): Promise<void> {
    const p = parseStudy(text);
    if (!p.ok) { this.say(p.message); return; }
    if (!(await this.loadCalculators(p.study))) { this.renderBar(); return; }
    this.study = p.study;
    this.commit();
  }

  /** Saves, re-runs and refills every attached calculator. */
  private commit(): void {
    if (this.study && !saveOpenStudy(this.study)) this.error = { message: 'This browser refused to keep the study (storage full or disabled).' };
    for (const a of this.attached) (a as { stepId: string | undefined }).stepId = this.study?.steps.find((s) => s.page === this.pageId && s.calculator === a.el.calc?.id)?.id;
    this.rerun();
    for (const a of this.attached) if (a.stepId) this.fill(a); else this.markOrigins(a);
    this.renderBar();
  }
}

/** Page id → address (a build-time data block; its values are checked where they are used). */
const pageUrls = (): Readonly<Record<string, string>> => pageData('db-page-urls') as Record<string, string>;

let session: Promise<StudySession> | undefined;

/** The page's one study session (opened once, shared by every calculator on the page). */
export function studySession(): Promise<StudySession> {
  return (session ??= (async () => {
    const s = new StudySession();
    await s.open();
    return s;
  })());
}

