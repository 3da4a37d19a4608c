/**
 * The status a built page shows, from its source file: the status word while the page matches
 * the seal of its sign-off, "changed since approval" / "changed since check" once it does not.
 * Used by the page, the sheet header, the home page list, the search index and the study
 * package catalogue, so all of them say the same. Build-time only (reads the page file).
 */
import { readFileSync } from 'node:fs';
import type { PageMeta } from './schema.ts';
import { pageBody, sealState, statusView, type SealState, type StatusView } from './seal.ts';

export interface PageStatus extends StatusView { readonly seal: SealState }

const memo = new Map<string, PageStatus>();

export function pageStatus(meta: PageMeta, file: string | undefined): PageStatus {
  const key = `${file ?? ''}\u0000${meta.id}`;
  const hit = memo.get(key);
  if (hit) return hit;
  const seal = sealState(meta, file ? pageBody(readFileSync(file, 'utf8')) : '');
  const v: PageStatus = { ...statusView(seal), seal };
  memo.set(key, v);
  return v;
}
