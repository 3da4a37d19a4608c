/**
 * Each built-in study as its file, so a page address `?study=<id>` (and the package page's "open
 * in the handbook" button) can open it in the browser. The file as validated at build time.
 */
import type { APIRoute } from 'astro';
import { readStudies, type StudyFile } from '../../studies/files.ts';

export function getStaticPaths() {
  return readStudies().map((file) => ({ params: { id: file.id }, props: { file } }));
}

export const GET: APIRoute = ({ props }) => {
  const { file } = props as { file: StudyFile };
  return new Response(JSON.stringify(file.study, null, 2), { headers: { 'Content-Type': 'application/json' } });
};
