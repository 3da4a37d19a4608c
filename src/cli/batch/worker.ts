/**
 * A batch worker thread: says it is ready once its sources are loaded (the pool sends chunks only
 * then), then evaluates each chunk it is sent and posts the results back.
 */
import { parentPort } from 'node:worker_threads';
import { runChunk, type RowChunk } from './rows.ts';

parentPort!.on('message', (chunk: RowChunk & { seq: number }) => {
  try {
    parentPort!.postMessage({ seq: chunk.seq, results: runChunk(chunk) });
  } catch (e) {
    parentPort!.postMessage({ seq: chunk.seq, fatal: e instanceof Error ? e.message : String(e) });
  }
});

parentPort!.postMessage({ ready: true });
