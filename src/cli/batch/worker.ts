/** A batch worker thread: evaluates each chunk it is sent and posts the results back in order. */
import { parentPort } from 'node:worker_threads';
import { runChunk, type RowChunk } from './rows.ts';

parentPort!.on('message', (chunk: RowChunk & { seq: number }) => {
  try {
    parentPort!.postMessage({ seq: chunk.seq, results: runChunk(chunk) });
  } catch (e) {
    parentPort!.postMessage({ seq: chunk.seq, fatal: e instanceof Error ? e.message : String(e) });
  }
});
