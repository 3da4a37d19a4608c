/**
 * The handbook's pages, read from the content collection once per build and shared by every
 * component that needs them (calling getCollection on each of hundreds of pages made the build
 * grow with the square of the page count).
 */
import { getCollection, type CollectionEntry } from 'astro:content';

let cached: Promise<CollectionEntry<'pages'>[]> | undefined;

export function handbookPages(): Promise<CollectionEntry<'pages'>[]> {
  return (cached ??= getCollection('pages'));
}
