/**
 * Builds the calculation package of the study open in this browser into /studies/open/: the same
 * element tree as the built packages (src/studies/packageView.ts), the page rules of the chosen
 * paper (`?paper=letter`), "page x of y" over the whole package. A study that cannot be run says
 * which step and input, and nothing is printed.
 */
import { packageCss } from '../../studies/package.ts';
import { packageView, type Catalogue, type VNode } from '../../studies/packageView.ts';
import { runStudy } from '../../studies/run.ts';
import { cssString } from '../../sheets/pageCss.ts';
import { readOpenStudy } from './study-store.ts';
import { LoadedCalculators } from './study-calculators.ts';

function toDom(v: VNode): Node {
  if (typeof v === 'string') return document.createTextNode(v);
  const el = document.createElement(v.t);
  for (const [k, x] of Object.entries(v.a ?? {})) el.setAttribute(k, x);
  // `html` is KaTeX markup rendered when the handbook was built (the catalogue), never study text
  if (v.html !== undefined) el.innerHTML = v.html;
  else el.append(...(v.k ?? []).map(toDom));
  return el;
}

function show(host: HTMLElement, text: string): void {
  const p = document.createElement('p');
  p.className = 'open-error';
  p.setAttribute('role', 'alert');
  p.textContent = text;
  host.replaceChildren(p);
}

async function render(): Promise<void> {
  const host = document.querySelector<HTMLElement>('[data-open-package]');
  if (!host) return;
  const stored = readOpenStudy();
  if (!stored) { host.dataset.ready = 'empty'; return; }
  if (!stored.ok) { show(host, `The study kept in this browser is not valid: ${stored.message}`); host.dataset.ready = 'error'; return; }
  let catalogue: Catalogue;
  try { catalogue = JSON.parse(document.getElementById('db-study-catalogue')?.textContent ?? '') as Catalogue; } catch { show(host, 'This page is damaged: its handbook catalogue is missing.'); return; }
  const calcs = new LoadedCalculators();
  try { await calcs.forStudy(stored.study); } catch { show(host, 'The calculators of this study could not be loaded; reload the page.'); host.dataset.ready = 'error'; return; }
  let run;
  try { run = runStudy(stored.study, calcs.lookup); } catch (e) { show(host, `The package cannot be printed: ${(e as Error).message}`); host.dataset.ready = 'error'; return; }
  const paper = new URLSearchParams(location.search).get('paper') === 'letter' ? 'letter' : 'a4';
  const css = document.getElementById('study-package-css');
  if (css) css.textContent = packageCss({ paper, calcNo: stored.study.project.calculationNo, title: stored.study.project.number, build: host.dataset.build ?? '', cssString });
  const screen: VNode[] = [
    { t: 'p', a: { class: 'screen-only' }, k: ['The study open in this browser, printed as one document: this cover, then one sheet per step. Print from the browser (', paper === 'a4' ? 'A4' : 'US Letter', '). ', { t: 'a', a: { href: `?paper=${paper === 'a4' ? 'letter' : 'a4'}` }, k: [paper === 'a4' ? 'US Letter version' : 'A4 version'] }, '.'] },
  ];
  host.replaceChildren(toDom(packageView(run, catalogue, { organisation: host.dataset.organisation ?? '', screen }, calcs.lookup)));
  document.title = `${stored.study.title} — calculation package`;
  host.dataset.ready = 'package';
}

void render();
