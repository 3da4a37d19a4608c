/**
 * Build scaling: `npm run bench:build -- --pages N` generates N math-heavy pages (each ~1,500
 * words, 10 display and 20 inline equations, one sdof calculator), builds them with Dampbook
 * (`npm run build`: astro build, search index included) and the same pages without calculators
 * on a plain Astro + MDX + KaTeX project in the same run, and prints as its LAST line
 * {"pages", "dampbookSeconds", "baselineSeconds", "ratio", "peakRssMB", "searchIndexSeconds"}.
 * Peak memory is getrusage maxrss of each build process (exact, no sampling; Pagefind's service
 * is a child process of the build and not counted). `searchIndexSeconds` is the part of the
 * build the index takes after the last page is rendered (it is fed while pages render). `--repeat R`
 * (default 3) interleaves R builds of each and reports medians (times) and maxima (memory).
 */
import { spawn } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { cpus, loadavg, totalmem, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { baselineConfig, baselineLayout, benchPage } from './lib/pages.ts';

const ROOT = resolve('.');

function arg(name: string, fallback: string): string {
  const i = process.argv.indexOf(`--${name}`);
  const eq = process.argv.find((a) => a.startsWith(`--${name}=`));
  return eq ? eq.split('=')[1]! : i >= 0 ? process.argv[i + 1] ?? fallback : fallback;
}

interface ChildRun { seconds: number; cpuSeconds: number; maxRssKB: number; wallSeconds: number; searchIndexSeconds?: number }

/** Runs a node script, returns the JSON it prints last, plus wall time. */
function runNode(script: string, args: string[], env: NodeJS.ProcessEnv, cwd = ROOT): Promise<ChildRun> {
  return new Promise((ok, fail) => {
    const t0 = performance.now();
    const child = spawn(process.execPath, [script, ...args], { cwd, env, stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    let err = '';
    child.stdout.on('data', (d: Buffer) => { out += d.toString(); });
    child.stderr.on('data', (d: Buffer) => { err += d.toString(); });
    child.on('close', (code) => {
      const wallSeconds = (performance.now() - t0) / 1000;
      const last = out.trim().split('\n').pop() ?? '';
      if (code !== 0) { fail(new Error(`${script} exited ${code}:\n${err.slice(-4000)}`)); return; }
      try { ok({ ...(JSON.parse(last) as Omit<ChildRun, 'wallSeconds'>), wallSeconds }); } catch { fail(new Error(`${script}: no result line\n${out.slice(-2000)}\n${err.slice(-2000)}`)); }
    });
  });
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

function cleanEnv(extra: Record<string, string>): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: 'production', ...extra };
  for (const k of ['BASE_URL', 'MODE', 'DEV', 'PROD', 'SSR']) delete env[k];
  return env;
}

async function main(): Promise<void> {
  const n = Number(arg('pages', '100'));
  if (!Number.isInteger(n) || n < 1 || n > 5000) throw new Error('--pages must be an integer in [1, 5000]');
  const keep = process.argv.includes('--keep');
  const repeat = Number(arg('repeat', '3'));
  if (!Number.isInteger(repeat) || repeat < 1 || repeat > 20) throw new Error('--repeat must be an integer in [1, 20]');
  const tmp = mkdtempSync(join(tmpdir(), 'dampbook-bench-'));
  try {
    // the same generated pages, twice: as Dampbook pages and as plain MDX pages
    const content = join(tmp, 'content', 'bench');
    const plain = join(tmp, 'baseline');
    mkdirSync(content, { recursive: true });
    // the demo's settings and topics (a handbook folder needs its handbook.config.json)
    copyFileSync(join(ROOT, 'content', 'handbook.config.json'), join(tmp, 'content', 'handbook.config.json'));
    mkdirSync(join(plain, 'src', 'pages', 'p'), { recursive: true });
    mkdirSync(join(plain, 'src', 'layouts'), { recursive: true });
    symlinkSync(join(ROOT, 'node_modules'), join(plain, 'node_modules'), 'dir');
    writeFileSync(join(plain, 'package.json'), JSON.stringify({ name: 'baseline', private: true, type: 'module' }));
    writeFileSync(join(plain, 'astro.config.mjs'), baselineConfig());
    writeFileSync(join(plain, 'src', 'layouts', 'Plain.astro'), baselineLayout());
    for (let i = 0; i < n; i++) {
      const p = benchPage(i);
      writeFileSync(join(content, `${p.slug}.mdx`), p.dampbook);
      writeFileSync(join(plain, 'src', 'pages', 'p', `${p.slug}.mdx`), p.plain);
    }
    const out = join(tmp, 'dist-dampbook');
    // each build starts cold: its own content cache, removed before every run (baseline: see baselineConfig)
    const cache = join(tmp, 'cache-dampbook');
    const env = cleanEnv({ DAMPBOOK_CONTENT: join(tmp, 'content'), DAMPBOOK_OUT: out, DAMPBOOK_CACHE: cache });
    process.stderr.write(`bench:build: ${n} pages in ${tmp} (load average ${loadavg().map((x) => x.toFixed(1)).join(' ')})\n`);

    // Interleaved repeats (Dampbook, baseline; again …): a shared or throttled machine
    // drifts by ±15 % between single builds; medians of interleaved runs compare like with like.
    const runs: { astro: ChildRun; base: ChildRun }[] = [];
    for (let r = 0; r < repeat; r++) {
      rmSync(out, { recursive: true, force: true });
      rmSync(join(plain, 'dist'), { recursive: true, force: true });
      rmSync(cache, { recursive: true, force: true });
      rmSync(join(plain, '.astro-cache'), { recursive: true, force: true });
      const astro = await runNode(join(ROOT, 'bench/lib/astro-build-child.mjs'), [ROOT], env);
      const base = await runNode(join(ROOT, 'bench/lib/astro-build-child.mjs'), [plain], cleanEnv({}), plain);
      process.stderr.write(`  run ${r + 1}/${repeat}: dampbook build ${astro.wallSeconds.toFixed(1)} s (CPU ${astro.cpuSeconds.toFixed(1)} s, peak ${(astro.maxRssKB / 1024).toFixed(0)} MB; search index ${(astro.searchIndexSeconds ?? 0).toFixed(2)} s after the last page); baseline ${base.wallSeconds.toFixed(1)} s (CPU ${base.cpuSeconds.toFixed(1)} s, peak ${(base.maxRssKB / 1024).toFixed(0)} MB)\n`);
      runs.push({ astro, base });
    }
    const med = (f: (r: typeof runs[number]) => number) => median(runs.map(f));
    const astro = { wallSeconds: med((r) => r.astro.wallSeconds), cpuSeconds: med((r) => r.astro.cpuSeconds), maxRssKB: Math.max(...runs.map((r) => r.astro.maxRssKB)) };
    const base = { wallSeconds: med((r) => r.base.wallSeconds), cpuSeconds: med((r) => r.base.cpuSeconds), maxRssKB: Math.max(...runs.map((r) => r.base.maxRssKB)) };
    const ratios = runs.map((r) => r.astro.wallSeconds / r.base.wallSeconds);

    const dampbookSeconds = astro.wallSeconds;
    const result = {
      pages: n,
      dampbookSeconds: Number(dampbookSeconds.toFixed(2)),
      baselineSeconds: Number(base.wallSeconds.toFixed(2)),
      ratio: Number((dampbookSeconds / base.wallSeconds).toFixed(3)),
      repeats: repeat,
      ratioPerRun: ratios.map((x) => Number(x.toFixed(3))),
      peakRssMB: Math.round(astro.maxRssKB / 1024),
      searchIndexSeconds: Number(med((r) => r.astro.searchIndexSeconds ?? 0).toFixed(2)),
      dampbookAstroSeconds: Number(astro.wallSeconds.toFixed(2)),
      baselinePeakRssMB: Math.round(base.maxRssKB / 1024),
      // CPU time (user + system) compares the two builds fairly when other work shares the machine
      dampbookAstroCpuSeconds: Number(astro.cpuSeconds.toFixed(2)),
      baselineCpuSeconds: Number(base.cpuSeconds.toFixed(2)),
      astroCpuRatio: Number((astro.cpuSeconds / base.cpuSeconds).toFixed(3)),
      loadAverage: loadavg().map((x) => Number(x.toFixed(1))),
      machine: `${cpus().length} × ${cpus()[0]?.model.trim() ?? 'cpu'}, ${(totalmem() / 2 ** 30).toFixed(0)} GiB, Node ${process.version}`,
    };
    mkdirSync(join(ROOT, 'bench', 'results'), { recursive: true });
    writeFileSync(join(ROOT, 'bench', 'results', `build-${n}.json`), `${JSON.stringify({ ...result, date: new Date().toISOString() }, null, 2)}\n`);
    const { pages, dampbookSeconds: d, baselineSeconds, ratio, peakRssMB, searchIndexSeconds } = result;
    console.log(JSON.stringify({ pages, dampbookSeconds: d, baselineSeconds, ratio, peakRssMB, searchIndexSeconds }));
  } finally {
    if (!keep) rmSync(tmp, { recursive: true, force: true });
  }
}

await main();
