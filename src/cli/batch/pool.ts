/**
 * Runs batch rows on `jobs` worker threads: the rows are cut into chunks (several per worker, so a
 * slow chunk does not leave the other cores idle), each idle worker takes the next chunk, and the
 * results are put back in input order. `jobs` = 1 (or a small batch) runs in this thread.
 */
import { Worker } from 'node:worker_threads';
import { runChunk, type RowChunk, type RowResult } from './rows.ts';

/** Below this many rows starting threads costs more than it saves. */
export const IN_PROCESS_ROWS = 2000;

export async function runRows(base: Omit<RowChunk, 'rows' | 'first'>, rows: readonly (readonly string[])[], jobs: number, progress?: (done: number) => void): Promise<RowResult[]> {
  if (jobs <= 1 || rows.length < IN_PROCESS_ROWS) {
    const out: RowResult[] = [];
    const step = 1000;
    for (let i = 0; i < rows.length; i += step) {
      out.push(...runChunk({ ...base, rows: rows.slice(i, i + step), first: i + 1 }));
      progress?.(out.length);
    }
    return out;
  }
  const size = Math.max(500, Math.ceil(rows.length / (jobs * 8)));
  const chunks: RowChunk[] = [];
  for (let i = 0; i < rows.length; i += size) chunks.push({ ...base, rows: rows.slice(i, i + size), first: i + 1 });
  const results: RowResult[][] = new Array(chunks.length);
  const workers = Array.from({ length: Math.min(jobs, chunks.length) }, () => new Worker(new URL('./worker.mjs', import.meta.url)));
  let next = 0;
  let done = 0;
  try {
    await Promise.all(workers.map((w) => new Promise<void>((resolve, reject) => {
      const send = () => {
        if (next >= chunks.length) { resolve(); return; }
        const seq = next++;
        w.postMessage({ ...chunks[seq], seq });
      };
      w.on('message', (m: { seq: number; results?: RowResult[]; fatal?: string }) => {
        if (m.fatal !== undefined || !m.results) { reject(new Error(`batch worker: ${m.fatal ?? 'no results'}`)); return; }
        results[m.seq] = m.results;
        done += m.results.length;
        progress?.(done);
        send();
      });
      w.on('error', reject);
      w.on('exit', (code) => { if (code !== 0) reject(new Error(`batch worker stopped (exit ${code})`)); });
      send();
    })));
  } finally {
    await Promise.all(workers.map((w) => w.terminate()));
  }
  return results.flat();
}
