/**
 * Runs batch rows on up to `threads` threads: this thread and worker threads take chunks from one
 * queue (several chunks per thread, so a slow chunk does not leave the other cores idle), and the
 * results are put back in input order.
 *
 * Why the default decides by measuring: a worker thread first loads the TypeScript sources (tsx,
 * about 0.7 s of CPU on this project's 2-core reference machine, more on a busy one), and while it
 * loads it competes with this thread for the cores. On 20,000 sdof rows (under a second of work)
 * starting one made the whole run 1.5× slower. So by default (`measure`) this thread works alone
 * for the first PROBE_S, estimates from its own rate how long the rest would take it, and starts
 * workers only when that is more than WORKERS_PAY_S; an explicit `--jobs N` (`measure: false`)
 * starts N − 1 workers at once. Either way a worker gets chunks only once it says it is ready, and
 * the run ends when every chunk is back, without waiting for a worker that is still starting.
 */
import { Worker } from 'node:worker_threads';
import { runChunk, type RowChunk, type RowResult } from './rows.ts';

/** Below this many rows starting threads costs more than it saves, whatever was asked. */
export const IN_PROCESS_ROWS = 2000;
/** How long this thread works alone before the default estimates the rest (seconds). */
export const PROBE_S = 0.15;
/**
 * Remaining one-thread work (seconds) above which the default starts workers: measured on the
 * reference machine, 2 threads were slower than 1 up to about 2 s of work (50,000 sdof rows:
 * 2.25 s with a worker, 2.08 s without) — see bench/batch.bench.ts.
 */
export const WORKERS_PAY_S = 3;

type Base = Omit<RowChunk, 'rows' | 'first'>;
type Reply = { ready?: true; seq: number; results?: RowResult[]; fatal?: string };

export interface ThreadPlan {
  /** Most threads to use, this one included. */
  readonly threads: number;
  /** Start workers only when the measured rate says they pay (the default without --jobs). */
  readonly measure: boolean;
}

/** What a run did with its threads (for the benchmark and tests). */
export interface RunStats {
  workersStarted: number;
}

export async function runRows(base: Base, rows: readonly (readonly string[])[], plan: ThreadPlan, progress?: (done: number) => void, stats?: RunStats): Promise<RowResult[]> {
  const threads = plan.threads <= 1 || rows.length < IN_PROCESS_ROWS ? 1 : plan.threads;
  const size = threads === 1 ? 1000 : Math.max(250, Math.ceil(rows.length / (threads * 16)));
  const chunks: RowChunk[] = [];
  for (let i = 0; i < rows.length; i += size) chunks.push({ ...base, rows: rows.slice(i, i + size), first: i + 1 });
  const results: RowResult[][] = new Array(chunks.length);
  let next = 0;
  let back = 0;
  let done = 0;
  let settle!: { resolve: () => void; reject: (e: unknown) => void };
  const all = new Promise<void>((resolve, reject) => { settle = { resolve, reject }; });
  const finished = (seq: number, r: RowResult[]) => {
    results[seq] = r;
    done += r.length;
    progress?.(done);
    if (++back === chunks.length) settle.resolve();
  };
  if (chunks.length === 0) settle.resolve();

  const workers: Worker[] = [];
  let stopping = false;
  const startWorkers = (n: number) => {
    for (let i = 0; i < n; i++) {
      const w = new Worker(new URL('./worker.mjs', import.meta.url));
      workers.push(w);
      // a worker that fails before it holds a chunk is dropped (this thread does its share)
      let holding = false;
      const send = () => { holding = next < chunks.length; if (holding) { const seq = next++; w.postMessage({ ...chunks[seq], seq }); } };
      w.on('message', (m: Reply) => {
        if (m.ready) { send(); return; }
        if (m.fatal !== undefined || !m.results) { settle.reject(new Error(`batch worker: ${m.fatal ?? 'no results'}`)); return; }
        finished(m.seq, m.results);
        send();
      });
      w.on('error', (e) => { if (holding) settle.reject(e); });
      w.on('exit', (code) => { if (!stopping && holding) settle.reject(new Error(`batch worker stopped (exit ${code})`)); });
    }
    if (stats) stats.workersStarted = n;
  };
  const wanted = Math.min(threads - 1, Math.max(chunks.length - 1, 0));
  let decided = wanted === 0 || !plan.measure;
  if (!plan.measure) startWorkers(wanted);
  try {
    const t0 = performance.now();
    let mine = 0;
    while (next < chunks.length) {
      const seq = next++;
      const c0 = performance.now();
      finished(seq, runChunk(chunks[seq]!));
      mine += chunks[seq]!.rows.length;
      const now = performance.now();
      if (!decided && (now - t0) / 1000 >= PROBE_S) {
        decided = true;
        // the last chunk's rate, not the first's: the first one pays for the JIT warming up
        const perRow = (now - c0) / 1000 / chunks[seq]!.rows.length;
        if (perRow * (rows.length - mine) > WORKERS_PAY_S) startWorkers(wanted);
      }
      // let the workers' replies in between chunks
      if (workers.length) await new Promise((r) => setImmediate(r));
    }
    await all;
  } finally {
    stopping = true;
    await Promise.all(workers.map((w) => w.terminate()));
  }
  return results.flat();
}
