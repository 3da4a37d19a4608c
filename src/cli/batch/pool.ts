/**
 * Runs batch rows on `jobs` threads: this thread and `jobs − 1` worker threads take chunks from
 * one queue (several chunks per thread, so a slow chunk does not leave the other cores idle), and
 * the results are put back in input order. This thread works from the start, and a worker gets
 * chunks only once it has loaded the TypeScript sources (tsx, a second or more), so a run with
 * workers is not slower than `--jobs 1` by more than the CPU that start-up takes; the run ends
 * when every chunk is back, without waiting for a worker that is still starting.
 * `jobs` = 1 (or a small batch) runs in this thread only.
 */
import { Worker } from 'node:worker_threads';
import { runChunk, type RowChunk, type RowResult } from './rows.ts';

/** Below this many rows starting threads costs more than it saves. */
export const IN_PROCESS_ROWS = 2000;

type Base = Omit<RowChunk, 'rows' | 'first'>;
type Reply = { ready?: true; seq: number; results?: RowResult[]; fatal?: string };

export async function runRows(base: Base, rows: readonly (readonly string[])[], jobs: number, progress?: (done: number) => void): Promise<RowResult[]> {
  const threads = jobs <= 1 || rows.length < IN_PROCESS_ROWS ? 1 : jobs;
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

  const workers = Array.from({ length: Math.min(threads - 1, Math.max(chunks.length - 1, 0)) }, () => new Worker(new URL('./worker.mjs', import.meta.url)));
  let stopping = false;
  for (const w of workers) {
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
  try {
    while (next < chunks.length) {
      const seq = next++;
      finished(seq, runChunk(chunks[seq]!));
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
