import type { ParsedArgs } from './args.ts';

/**
 * The content folder a command reads: `--content <dir>`, else DAMPBOOK_CONTENT (as the site build
 * reads it), else `content/`. The one place that rule lives for the CLI.
 */
export function contentDirOf(args: ParsedArgs): string {
  const flag = args.flags.get('content');
  if (typeof flag === 'string') return flag;
  return process.env.DAMPBOOK_CONTENT ?? 'content';
}
