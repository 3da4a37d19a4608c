/**
 * Links between pages, both ends: the query string a feed link carries (built once here for the
 * server render and the live widget alike), and which address values a page accepts into a field.
 */
import type { FeedDef, InputDef, Outputs, Values } from './types.ts';

/** Address values longer than this are ignored for number and choice inputs (no field needs more). */
export const MAX_URL_PARAM = 200;

/** What a feed draws on: this calculator's validated inputs, outputs and hand-offs. */
export interface FeedSources {
  readonly values: Values;
  readonly outputs: Outputs;
  readonly handoff?: Readonly<Record<string, string>> | undefined;
}

/** A number as an address carries it: SI, 10 significant digits (enough to round-trip a typed value). */
function asParam(v: number | string): string {
  return typeof v === 'number' ? String(Number(v.toPrecision(10))) : v;
}

/** The value of a source key: an output, else an input, else a hand-off; undefined when absent or not finite. */
export function feedSource(key: string, s: FeedSources): number | string | undefined {
  const own = (o: object | undefined) => o !== undefined && Object.prototype.hasOwnProperty.call(o, key);
  const v = own(s.outputs) ? s.outputs[key] : own(s.values) ? s.values[key] : own(s.handoff) ? s.handoff![key] : undefined;
  return typeof v === 'number' ? (Number.isFinite(v) ? v : undefined) : v;
}

/**
 * The query (without '?') of a feed link from output `out`: `input` = the output's value, then
 * each `with` target = its source, then each `set` constant. Undefined while any source is absent
 * (the widget hides the link).
 *
 * @example feedQuery({ page: 'warm-up', input: 'P', label: '…', set: { power: 'steady' } }, 'P', { values: {}, outputs: { P: 41.6 } }) // 'P=41.6&power=steady'
 */
export function feedQuery(feed: FeedDef, out: string, s: FeedSources): string | undefined {
  const q = new URLSearchParams();
  const first = feedSource(out, s);
  if (first === undefined) return undefined;
  q.set(feed.input, asParam(first));
  for (const [target, source] of Object.entries(feed.with ?? {})) {
    const v = feedSource(source, s);
    if (v === undefined) return undefined;
    q.set(target, asParam(v));
  }
  for (const [target, v] of Object.entries(feed.set ?? {})) q.set(target, v);
  return q.toString();
}

/**
 * The address value a page puts into an input's field, or undefined to ignore it. Text goes in
 * only where the definition allows it (`fromUrl`) and within its maxLength; the field then runs it
 * through the same checks as typing.
 */
export function urlValue(def: InputDef, raw: string | null): string | undefined {
  if (raw === null) return undefined;
  if (def.kind === 'text') return def.fromUrl && raw.length <= def.maxLength ? raw : undefined;
  return raw.length <= MAX_URL_PARAM ? raw : undefined;
}
