/**
 * A batch worker thread: says it is ready once its sources are loaded (the pool sends chunks only
 * then), then evaluates each chunk it is sent and posts the results back.
 */
import { parentPort } from 'node:worker_threads';
import { loadRegistry } from '../../team/loadRegistry.ts';
import { runChunk, type RowChunk } from './rows.ts';

/** A handbook folder's own calculators, loaded once per thread (the main thread loaded them in main.ts). */
let team: Promise<unknown> | undefined;

parentPort!.on('message', async (chunk: RowChunk & { seq: number }) => {
  try {
    if (chunk.content !== undefined) await (team ??= loadRegistry({ content: chunk.content }));
    parentPort!.postMessage({ seq: chunk.seq, results: runChunk(chunk) });
  } catch (e) {
    parentPort!.postMessage({ seq: chunk.seq, fatal: e instanceof Error ? e.message : String(e) });
  }
});

parentPort!.postMessage({ ready: true });
