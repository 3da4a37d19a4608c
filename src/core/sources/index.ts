/**
 * The typed bibliography. Formula doc comments, fixtures, calculator definitions and printed
 * sheets refer to a key plus a locator ("Eq. 9.34"); a typo in a key fails the type check and
 * each sheet's reference list is built from this table.
 */
import { general } from './general.ts';
import { vibration } from './vibration.ts';
import { duty } from './duty.ts';
import { thermal } from './thermal.ts';
import type { Source } from './source.ts';

export type { Source };

/**
 * Joins per-domain source lists; a key defined in two lists is refused (a spread would silently
 * keep the second citation).
 * @throws Error naming the key
 */
export function joinSources<T extends readonly Record<string, Source>[]>(...lists: T): UnionToIntersection<T[number]> {
  const out: Record<string, Source> = {};
  for (const list of lists) {
    for (const [key, src] of Object.entries(list)) {
      if (Object.prototype.hasOwnProperty.call(out, key)) throw new Error(`source key '${key}' defined twice in the bibliography`);
      out[key] = src;
    }
  }
  return out as UnionToIntersection<T[number]>;
}

type UnionToIntersection<U> = (U extends unknown ? (x: U) => void : never) extends (x: infer I) => void ? I : never;

/** All sources, joined from the per-domain lists (split so parallel work does not collide). */
export const sources = joinSources(general, vibration, duty, thermal);

export type SourceKey = keyof typeof sources;

/** A citation with a locator inside the source: equation, table, example or section. */
export interface SourceRef {
  readonly key: SourceKey;
  readonly locator: string;
}

/** How a reference value came to be; carried into every fixture row and verification case. */
export type Provenance =
  | 'published'
  | 'from memory'
  | 'common practice, no source'
  | 'closed form'
  | `reference library ${string}`;

/** Formats a reference for a sheet or a test name: full citation followed by the locator. */
export function cite(ref: SourceRef): string {
  return `${sources[ref.key].citation} ${ref.locator}`;
}
