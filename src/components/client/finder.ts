/**
 * Search loader (kept tiny: it ships on every page). The index engine is fetched from the
 * site's own /pagefind/ folder on first focus; results are built with DOM calls, never innerHTML
 * of untrusted text: the only markup kept from an excerpt is <mark>.
 */
interface Hit { url: string; excerpt: string; meta: { title?: string; status?: string } }
interface Engine {
  options(o: object): Promise<void>;
  search(q: string): Promise<{ results: { data(): Promise<Hit> }[] }>;
}

const input = document.querySelector<HTMLInputElement>('#finder-q');
const box = document.querySelector<HTMLElement>('#finder-results');
let engine: Promise<Engine> | undefined;
let seq = 0;

function load(): Promise<Engine> {
  engine ??= (import(/* @vite-ignore */ input!.dataset.index!) as Promise<Engine>).then(async (m) => {
    await m.options({ baseUrl: input!.dataset.base, excerptLength: 24 });
    return m;
  });
  return engine;
}

/** Appends excerpt text to `el`, turning only <mark>…</mark> into elements. */
function appendExcerpt(el: HTMLElement, excerpt: string): void {
  const parts = excerpt.split(/(<mark>|<\/mark>)/);
  let marked = false;
  for (const p of parts) {
    if (p === '<mark>') { marked = true; continue; }
    if (p === '</mark>') { marked = false; continue; }
    const text = p.replace(/<[^>]*>/g, '').replace(/&amp;/g, '&').replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&#39;/g, "'");
    if (!text) continue;
    if (marked) { const m = document.createElement('mark'); m.textContent = text; el.append(m); } else el.append(text);
  }
}

async function run(q: string): Promise<void> {
  const mine = ++seq;
  if (!box) return;
  if (q.trim().length < 2) { box.hidden = true; box.replaceChildren(); return; }
  const status = document.createElement('p');
  status.className = 'finder-status';
  status.textContent = 'Searching…';
  box.replaceChildren(status);
  box.hidden = false;
  try {
    const pf = await load();
    const res = await pf.search(q.slice(0, 200));
    const hits = await Promise.all(res.results.slice(0, 8).map((r) => r.data()));
    if (mine !== seq) return;
    if (hits.length === 0) { status.textContent = `No page mentions “${q}”.`; return; }
    const ol = document.createElement('ol');
    for (const h of hits) {
      const li = document.createElement('li');
      const a = document.createElement('a');
      a.href = h.url;
      a.textContent = h.meta.title ?? h.url;
      li.append(a);
      // drafts and pages changed since their sign-off carry their status in the result
      if (h.meta.status === 'draft' || h.meta.status?.startsWith('changed since ')) {
        const s = document.createElement('span');
        s.className = h.meta.status === 'draft' ? 'status status-draft' : 'status status-changed';
        s.textContent = h.meta.status;
        li.append(' ', s);
      }
      const p = document.createElement('p');
      appendExcerpt(p, h.excerpt);
      li.append(p);
      ol.append(li);
    }
    box.replaceChildren(ol);
  } catch {
    if (mine === seq) status.textContent = 'Search is unavailable here (open the handbook from its web server, not from a file).';
  }
}

if (input && box) {
  input.addEventListener('focus', () => void load().catch(() => undefined), { once: true });
  input.addEventListener('input', () => void run(input.value));
  input.addEventListener('keydown', (e) => { if (e.key === 'Escape') { box.hidden = true; input.blur(); } });
  document.addEventListener('click', (e) => { if (!(e.target instanceof Node) || !box.parentElement?.contains(e.target)) box.hidden = true; });
}
