/**
 * Off-thread computing for calculators marked `offMainThread` (the ones whose evaluate plus chart
 * data can take longer than a frame): one module worker per page answers jobs from every such
 * calculator, so typing never waits for a computation.
 *
 * Only the newest request of each calculator element matters: while a job runs, later requests
 * wait in a one-place queue, each replacing the one before (which resolves `superseded`); a job
 * still running after RESTART_MS when the same element's newer one arrives is abandoned by terminating the worker
 * (a 5-second worst case must not delay the next keystroke's answer). The worker's entry is the
 * plain file public/compute-worker.js (the pages' CSP allows scripts from 'self' only, no blob:),
 * told by its first message which chunk to import. When a module worker cannot start (an old browser) every job resolves `unavailable` and the page computes
 * on the main thread, as before.
 */
import type { Job, Reply } from './off-thread-worker.ts';

export type Outcome = Reply | 'superseded' | 'unavailable';

/** How long a running job may hold the worker once a newer request waits. */
const RESTART_MS = 250;

interface Pending { readonly owner: string; readonly job: Job; readonly settle: (o: Outcome) => void }

class OffThread {
  private worker: Worker | undefined;
  private running: (Pending & { readonly started: number }) | undefined;
  private waiting = new Map<string, Pending>();
  private seq = 0;
  private broken = false;

  constructor(private readonly url: string) {}

  /** Computes `id` for `values` off the main thread; a newer call for the same `owner` supersedes this one. */
  run(owner: string, id: string, values: Job['values'], charts: boolean): Promise<Outcome> {
    if (this.broken) return Promise.resolve('unavailable');
    return new Promise<Outcome>((settle) => {
      const job: Job = { seq: ++this.seq, id, values, charts };
      this.waiting.get(owner)?.settle('superseded');
      this.waiting.set(owner, { owner, job, settle });
      // only the same element's newer request may abandon a long job: another element still wants its answer
      if (this.running?.owner === owner && performance.now() - this.running.started > RESTART_MS) this.restart();
      this.pump();
    });
  }

  private start(): Worker | undefined {
    if (this.worker) return this.worker;
    try {
      // the chunks live in <site>/_db/ (src/build/client-scripts.ts), public/ files at <site>/
      const w = new Worker(new URL('../compute-worker.js', this.url), { type: 'module' });
      w.postMessage({ load: this.url }); // public/compute-worker.js imports the chunk, then serves
      w.addEventListener('message', (e: MessageEvent<Reply>) => this.done(e.data));
      w.addEventListener('error', (e) => { e.preventDefault(); this.fail(e.message); });
      this.worker = w;
      return w;
    } catch (e) {
      this.fail(e instanceof Error ? e.message : String(e));
      return undefined;
    }
  }

  private pump(): void {
    if (this.running || this.broken) return;
    const first = this.waiting.entries().next();
    if (first.done) return;
    const [owner, next] = first.value;
    this.waiting.delete(owner);
    const w = this.start();
    if (!w) { next.settle('unavailable'); return; }
    this.running = { ...next, started: performance.now() };
    w.postMessage(next.job);
  }

  private done(reply: Reply): void {
    const r = this.running;
    if (!r || r.job.seq !== reply.seq) return; // an answer from a worker already abandoned
    this.running = undefined;
    r.settle(reply);
    this.pump();
  }

  /** Abandons the running job: a fresh worker takes the queue. */
  private restart(): void {
    this.worker?.terminate();
    this.worker = undefined;
    this.running?.settle('superseded');
    this.running = undefined;
  }

  /** The worker could not start or died: every job now runs on the main thread. */
  private fail(why: string): void {
    // said once in the console: the page still computes, only on its own thread
    if (!this.broken) console.warn(`Dampbook: computing on the page's own thread (the compute worker did not start: ${why})`);
    this.broken = true;
    this.worker?.terminate();
    this.worker = undefined;
    this.running?.settle('unavailable');
    this.running = undefined;
    for (const p of this.waiting.values()) p.settle('unavailable');
    this.waiting.clear();
  }
}

let shared: Promise<OffThread> | undefined;

/** The page's one off-thread computer (its worker starts on the first job). */
export function offThread(): Promise<OffThread> {
  shared ??= import('./off-thread-worker.ts').then((m) => new OffThread(m.selfUrl));
  return shared;
}
