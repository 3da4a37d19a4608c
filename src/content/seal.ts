/**
 * The seal of a checked or approved page: a SHA-256 over what was signed off — the method text
 * (the MDX body), the calculators listed, their definitions' verification cases and the page's own
 * cases — and never the sign-off fields themselves (status, names, dates, the hashes), so signing
 * a page does not change what it signs. `dampbook approve`/`check-off` write it, `dampbook check`
 * compares it, and the page, the search index and every printed sheet show "changed since
 * approval" when it no longer matches. One module for the CLI and the build, so both hash alike.
 */
import { createHash } from 'node:crypto';
import { getCalculator } from '../calculators/registry.ts';
import type { CalculatorDefinition } from '../calculators/types.ts';
import type { PageMeta } from './schema.ts';

/** Hex characters kept: 16 (64 bits) is far beyond an accidental match between two edits. */
export const SEAL_LENGTH = 16;

/** The frontmatter field that holds the seal of each signed-off status. */
export const SEAL_FIELD = { approved: 'approvalHash', checked: 'checkHash' } as const;

type Signed = Pick<PageMeta, 'calculators' | 'verification'>;

/** JSON with object keys sorted: the same data gives the same text whatever the key order. */
export function canonicalJson(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(canonicalJson).join(',')}]`;
  if (v && typeof v === 'object') {
    const o = v as Record<string, unknown>;
    return `{${Object.keys(o).filter((k) => o[k] !== undefined).sort().map((k) => `${JSON.stringify(k)}:${canonicalJson(o[k])}`).join(',')}}`;
  }
  return JSON.stringify(v) ?? 'null';
}

/** The method text as signed: no byte-order mark, LF line ends (a CRLF checkout is the same page). */
export function methodText(body: string): string {
  return body.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n');
}

/** The MDX body of a page file: everything after the frontmatter block ('' when there is none). */
export function pageBody(fileText: string): string {
  const m = /^\uFEFF?---\r?\n[\s\S]*?\r?\n---(?:\r?\n|$)/.exec(fileText);
  return m ? fileText.slice(m[0].length) : fileText;
}

/** SHA-256 of a text's UTF-8 bytes, the first SEAL_LENGTH hex digits. */
export function shortSha256(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex').slice(0, SEAL_LENGTH);
}

/**
 * The seal of a page: SHA-256 (first SEAL_LENGTH hex) of the canonical JSON of the method text,
 * the calculator ids in page order, each calculator's definition cases (null for an unknown id)
 * and the page's own cases.
 * @example sealOf('m', { calculators: [], verification: [] }).length // 16
 */
export function sealOf(body: string, page: Signed, lookup: (id: string) => CalculatorDefinition | undefined = getCalculator): string {
  const signed = {
    method: methodText(body),
    calculators: page.calculators,
    definitionCases: page.calculators.map((id) => lookup(id)?.verification ?? null),
    pageCases: page.verification,
  };
  return shortSha256(canonicalJson(signed));
}

export type SealState =
  | { readonly state: 'draft' }
  | { readonly state: 'current' | 'changed' | 'unsealed'; readonly status: 'approved' | 'checked'; readonly field: string; readonly recorded?: string; readonly computed: string };

/** Whether a page still matches the seal of its status (a draft has none to match). */
export function sealState(meta: PageMeta, body: string, lookup?: (id: string) => CalculatorDefinition | undefined): SealState {
  if (meta.status === 'draft') return { state: 'draft' };
  const field = SEAL_FIELD[meta.status];
  const recorded = meta[field];
  const computed = sealOf(body, meta, lookup);
  const state = recorded === undefined ? 'unsealed' : recorded === computed ? 'current' : 'changed';
  return { state, status: meta.status, field, ...(recorded === undefined ? {} : { recorded }), computed };
}

/** What a reader sees for the status: the status word, or "changed since approval/check". */
export interface StatusView { readonly label: string; readonly cls: 'draft' | 'checked' | 'approved' | 'changed' }

export function statusView(seal: SealState): StatusView {
  if (seal.state === 'draft') return { label: 'draft', cls: 'draft' };
  // a page with no seal cannot show that it is what was signed: it reads as changed too
  if (seal.state !== 'current') return { label: seal.status === 'approved' ? 'changed since approval' : 'changed since check', cls: 'changed' };
  return { label: seal.status, cls: seal.status };
}
