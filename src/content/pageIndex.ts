/**
 * The handbook's pages, read from the content collection once per build and shared by every
 * component that needs them (calling getCollection on each of hundreds of pages made the build
 * grow with the square of the page count). Sorted by entry id: the glob loader's order follows
 * which file finished reading first, and the page-address and catalogue blocks every page carries
 * should not change from one build of the same content to the next.
 */
import { getCollection, type CollectionEntry } from 'astro:content';

let cached: Promise<CollectionEntry<'pages'>[]> | undefined;

export function handbookPages(): Promise<CollectionEntry<'pages'>[]> {
  return (cached ??= getCollection('pages').then((all: CollectionEntry<'pages'>[]) => all.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0))));
}
