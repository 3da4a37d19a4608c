/**
 * The worker side of off-thread computing (off-thread.ts): evaluates a calculator and its chart
 * data for one set of SI values and answers with plain data.
 *
 * Why a chunk of the page's own bundle and not a separately built worker: the page starts a module
 * worker (public/compute-worker.js) and tells it to import this chunk by its URL (`selfUrl`), so it runs the
 * very same calculator and core chunks the page already loaded (from the HTTP cache), and the build
 * has no second bundle of every calculator to make. Nothing here touches the DOM.
 */
import { loadCalculator } from '../../calculators/loaders.ts';
import { computeForPage } from '../../calculators/pageCompute.ts';
import type { ChartSpec, Outputs, Values } from '../../calculators/types.ts';

/** The URL of the chunk this module is bundled in: what the worker imports. */
export const selfUrl: string = import.meta.url;

export interface Job {
  readonly seq: number;
  readonly id: string;
  /** Validated SI values, as the page read them. */
  readonly values: Values;
  /** Whether the page draws charts (chart data is computed only then). */
  readonly charts: boolean;
}

export interface Computed {
  readonly outputs: Outputs;
  readonly warnings: readonly string[];
  readonly handoff?: Readonly<Record<string, string>>;
  readonly values: Values;
}

export type Reply =
  | { readonly seq: number; readonly ok: true; readonly result: Computed; readonly charts?: ChartSpec[]; readonly chartError?: string }
  /** `known`: a typed error whose message is for the reader; `input`: the field it names. */
  | { readonly seq: number; readonly ok: false; readonly message: string; readonly known: boolean; readonly input?: string };

/** Evaluates one job: the result as data (only what crosses to the page), or the error's message. */
export async function answer(job: Job): Promise<Reply> {
  const calc = await loadCalculator(job.id);
  if (!calc) return { seq: job.seq, ok: false, known: false, message: `no calculator '${job.id}'` };
  const out = computeForPage(calc, job.values, job.charts);
  if (!out.ok) return { seq: job.seq, ...out };
  const { outputs, warnings, values, handoff } = out.result;
  const result: Computed = { outputs, warnings, values, ...(handoff ? { handoff } : {}) };
  return { seq: job.seq, ok: true, result, ...(out.charts ? { charts: out.charts } : {}), ...(out.chartError !== undefined ? { chartError: out.chartError } : {}) };
}

/** What a dedicated worker's global scope offers here (typed without the webworker lib). */
export interface WorkerScope {
  onmessage: ((e: MessageEvent<Job>) => void) | null;
  postMessage(message: Reply): void;
}

/** Answers every job posted to the worker, one at a time in order. */
export function serve(scope: WorkerScope): void {
  scope.onmessage = (e) => {
    void answer(e.data).then((r) => scope.postMessage(r), (err: unknown) => {
      scope.postMessage({ seq: e.data.seq, ok: false, known: false, message: err instanceof Error ? err.message : String(err) });
    });
  };
}
